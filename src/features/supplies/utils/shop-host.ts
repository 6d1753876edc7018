/**
 * The shop's host name for a link ("shop.example" for https://www.shop.example/glue), as the
 * table shows it; null when the text is not a web address.
 */
export function shopHost(url: string | null | undefined): string | null {
  if (!url) return null;
  try {
    const u = new URL(url);
    if (u.protocol !== 'https:' && u.protocol !== 'http:') return null;
    return u.hostname.replace(/^www\./, '') || null;
  } catch {
    return null;
  }
}
