import { isSafeLinkHref } from '@shared/editor/urls';

/**
 * What a person typed into the link field, as an address the document may keep: "shop.example/kraft"
 * gains https://, an e-mail address gains mailto:, and anything the shared rules refuse
 * (javascript:, data:, spaces) gives null with nothing guessed.
 */
export function linkFromInput(input: string): string | null {
  const v = input.trim();
  if (!v) return null;
  let href = v;
  if (/^[^\s@/:]+@[^\s@/:]+\.[a-z]{2,}$/i.test(v)) href = `mailto:${v}`;
  else if (!/^[a-z][a-z0-9+.-]*:/i.test(v) && !v.startsWith('/') && !v.startsWith('#') && /^[^\s/]+\.[a-z]{2,}(?:[/:?#]|$)/i.test(v)) href = `https://${v}`;
  return isSafeLinkHref(href) ? href : null;
}
