/**
 * Which addresses a document may carry. One rule set for the editor, the validator,
 * the importers and the renderers, so a link the editor accepts is one the server keeps.
 * No Node APIs: the browser imports this with the schema.
 */

const MAX_URL_LENGTH = 2048;
const LINK_SCHEMES = new Set(['http:', 'https:', 'mailto:']);
const WEB_SCHEMES = new Set(['http:', 'https:']);
// Browsers drop tab and line breaks inside URLs ("jav\tascript:"), and trim C0 controls and
// spaces at the ends (WHATWG URL Standard, basic URL parser), so any of these is refused
// outright instead of guessing what a browser would make of it.
// eslint-disable-next-line no-control-regex -- matching controls is the point
const CONTROL_OR_EDGE_SPACE = /[\u0000-\u001F\u007F]|^\s|\s$/;
const SCHEME = /^([a-zA-Z][a-zA-Z0-9+.-]*):/;
// Only used to resolve relative references; never fetched.
const BASE = 'https://relative.invalid/';

function parse(value: string, base?: string): URL | null {
  try {
    return new URL(value, base);
  } catch {
    return null;
  }
}

function plain(value: unknown): value is string {
  return typeof value === 'string' && value.length > 0 && value.length <= MAX_URL_LENGTH && !CONTROL_OR_EDGE_SPACE.test(value);
}

/**
 * True for a link address the document may keep: http(s), mailto, or a relative reference
 * ("/tutorials/x", "#step-3", "page.html"). Everything else (javascript:, data:, vbscript:,
 * file:, addresses with control characters) is refused, and so is a "relative" reference that
 * leaves the page's own site ("//host", "/\\host"), as the HTML import refuses it: a link to
 * another site names its scheme.
 */
export function isSafeLinkHref(href: unknown): href is string {
  if (!plain(href)) return false;
  const scheme = SCHEME.exec(href);
  if (scheme && !LINK_SCHEMES.has(`${scheme[1]!.toLowerCase()}:`)) return false;
  // Cross-check with the WHATWG parser the browser itself uses.
  const url = parse(href, BASE);
  if (url === null || !LINK_SCHEMES.has(url.protocol)) return false;
  return scheme !== null || url.origin === new URL(BASE).origin;
}

/**
 * True for an image address a still may show: our own media ("/media/...", no "..", no
 * backslashes) or an absolute http(s) address. Relative paths elsewhere, protocol-relative
 * "//host" and data: are refused, so a published page never points at something unexpected.
 */
export function isSafeImageSrc(src: unknown): src is string {
  if (!plain(src)) return false;
  if (src.startsWith('/media/')) {
    if (src.includes('\\') || src.includes('//')) return false;
    const url = parse(src, BASE);
    if (!url || url.origin !== new URL(BASE).origin) return false;
    // Dot segments are resolved away by the parser: compare before and after.
    const path = src.split(/[?#]/)[0]!;
    return url.pathname === path && !/(^|\/)\.\.?(\/|$)/.test(path);
  }
  if (!/^https?:\/\//i.test(src)) return false;
  const url = parse(src);
  return url !== null && WEB_SCHEMES.has(url.protocol) && url.hostname !== '';
}

/** True for an absolute or root-relative video page address usable for "Watch at" links. */
export function isSafeVideoUrl(url: unknown): url is string {
  return isSafeLinkHref(url) && !/^mailto:/i.test(url);
}
