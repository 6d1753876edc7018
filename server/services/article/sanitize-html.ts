import sanitize from 'sanitize-html';
import { isSafeImageSrc, isSafeLinkHref } from '@shared/editor/urls';

// Only what the write-up schema can hold, plus plain containers whose text is worth keeping.
const TAGS = [
  'p',
  'br',
  'h1',
  'h2',
  'h3',
  'h4',
  'h5',
  'h6',
  'strong',
  'b',
  'em',
  'i',
  's',
  'strike',
  'del',
  'a',
  'ul',
  'ol',
  'li',
  'blockquote',
  'hr',
  'figure',
  'figcaption',
  'img',
  'aside',
  'section',
  'div',
  'span',
  'table',
  'thead',
  'tbody',
  'tfoot',
  'tr',
  'th',
  'td',
  'caption',
  'u',
  'sub',
  'sup',
];

// Elements whose content is code, styling, embedded documents or fallback markup, never
// words for the reader: dropped with everything inside.
const DROP_WITH_CONTENT = [
  'script',
  'style',
  'textarea',
  'option',
  'select',
  'xmp',
  'noscript',
  'noembed',
  'noframes',
  'iframe',
  'frame',
  'frameset',
  'object',
  'embed',
  'applet',
  'svg',
  'math',
  'template',
  'title',
  'head',
  'meta',
  'link',
  'base',
  'form',
  'button',
  'input',
];

const OPTIONS: sanitize.IOptions = {
  allowedTags: TAGS,
  allowedAttributes: {
    a: ['href', 'title'],
    img: ['src', 'alt', 'width', 'height'],
    ol: ['start'],
    section: [{ name: 'data-type', multiple: false, values: ['step'] }, 'data-step-id', 'data-at-ms', 'data-chapter-id'],
    h3: [{ name: 'data-type', multiple: false, values: ['step-title'] }],
    figure: [{ name: 'data-type', multiple: false, values: ['still'] }, 'data-still-id'],
    div: [
      { name: 'data-type', multiple: false, values: ['cut-list', 'supply-list'] },
      { name: 'data-units', multiple: false, values: ['both', 'in', 'mm'] },
      { name: 'data-grouped', multiple: false, values: ['true', 'false'] },
    ],
    aside: [{ name: 'data-type', multiple: false, values: ['tip', 'caution'] }],
  },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowedSchemesByTag: { img: ['http', 'https'] },
  allowedSchemesAppliedToAttributes: ['href', 'src', 'cite'],
  allowProtocolRelative: false,
  disallowedTagsMode: 'discard',
  nonTextTags: DROP_WITH_CONTENT,
  allowVulnerableTags: false,
  parseStyleAttributes: false,
  // A second, stricter check with the rules the editor and the renderers use.
  transformTags: {
    a: (tagName, attribs) => {
      const { href, ...rest } = attribs;
      return { tagName, attribs: isSafeLinkHref(href?.trim()) ? { ...rest, href: href!.trim() } : rest };
    },
  },
  exclusiveFilter: (frame) => frame.tag === 'img' && !isSafeImageSrc(frame.attribs.src?.trim()),
};

/**
 * Cleans pasted or imported HTML down to what the write-up can hold: no scripts, styles,
 * event handlers, frames, embeds or SVG; links only to http(s), mailto or relative
 * addresses; images only from our media or http(s). Server-only (sanitize-html).
 */
export function sanitizeHtml(html: string): string {
  return sanitize(String(html ?? ''), OPTIONS);
}
