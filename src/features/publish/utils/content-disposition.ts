/**
 * The file name a Content-Disposition header offers, or null. Reads the RFC 6266 forms: the
 * extended `filename*=UTF-8''…` (RFC 8187 percent-encoding), which wins when both are given, then a
 * quoted or bare `filename=`. Path parts are dropped, as RFC 6266 section 4.3 asks of recipients.
 */
export function dispositionFilename(header: string | null | undefined): string | null {
  if (!header) return null;
  const ext = /filename\*\s*=\s*([\w!#$&+.^`|~-]+)'[\w-]*'([^;\s]+)/i.exec(header);
  if (ext) {
    try {
      const charset = ext[1]!.toLowerCase();
      const raw = ext[2]!;
      const name = charset === 'utf-8' ? decodeURIComponent(raw) : unescape(raw);
      return baseName(name);
    } catch {
      // a malformed escape: fall back to the plain parameter below
    }
  }
  const quoted = /(?:^|;)\s*filename\s*=\s*"((?:[^"\\]|\\.)*)"/i.exec(header);
  if (quoted) return baseName(quoted[1]!.replace(/\\(.)/g, '$1'));
  const bare = /(?:^|;)\s*filename\s*=\s*([^;\s]+)/i.exec(header);
  return bare ? baseName(bare[1]!) : null;
}

function baseName(name: string): string | null {
  const last = name.split(/[\\/]/).pop()?.trim() ?? '';
  return last && last !== '.' && last !== '..' ? last : null;
}
