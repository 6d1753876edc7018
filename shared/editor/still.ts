import { Node } from '@tiptap/core';
import type { StillAttrs } from './types';
import { isSafeImageSrc } from './urls';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    still: {
      /** Inserts a photo (usually one of the tutorial's stills). */
      insertStill: (attrs: Partial<StillAttrs> & { src: string }) => ReturnType;
    };
  }
}

const ID = /^[A-Za-z0-9_-]{1,64}$/;

function imageOf(el: HTMLElement): HTMLElement | null {
  return el.tagName === 'IMG' ? el : el.querySelector('img');
}

function size(el: HTMLElement, name: 'width' | 'height'): number | null {
  const v = imageOf(el)?.getAttribute(name);
  return v && /^\d{1,5}$/.test(v) && Number(v) > 0 ? Number(v) : null;
}

/** A photo with caption and alt text; pasted images become stills too. */
export const Still = Node.create({
  name: 'still',
  group: 'block',
  atom: true,
  draggable: true,
  addAttributes() {
    // Rendered by renderHTML below, since src and alt belong on the inner img.
    return {
      stillId: {
        default: null,
        rendered: false,
        parseHTML: (el: HTMLElement) => {
          const v = el.getAttribute('data-still-id');
          return v !== null && ID.test(v) ? v : null;
        },
      },
      src: { default: '', rendered: false, parseHTML: (el: HTMLElement) => imageOf(el)?.getAttribute('src') ?? '' },
      alt: { default: '', rendered: false, parseHTML: (el: HTMLElement) => imageOf(el)?.getAttribute('alt') ?? '' },
      caption: {
        default: '',
        rendered: false,
        parseHTML: (el: HTMLElement) => (el.tagName === 'IMG' ? '' : (el.querySelector('figcaption')?.textContent ?? '').trim()),
      },
      width: { default: null, rendered: false, parseHTML: (el: HTMLElement) => size(el, 'width') },
      height: { default: null, rendered: false, parseHTML: (el: HTMLElement) => size(el, 'height') },
    };
  },
  parseHTML() {
    const safe = (el: HTMLElement) => (isSafeImageSrc(imageOf(el)?.getAttribute('src')) ? null : false);
    return [
      { tag: 'figure[data-type="still"]', priority: 60, getAttrs: safe },
      { tag: 'figure', getAttrs: safe },
      { tag: 'img[src]', getAttrs: safe },
    ];
  },
  renderHTML({ node }) {
    const a = node.attrs as StillAttrs;
    const img: Record<string, string> = { alt: a.alt ?? '' };
    // An unsafe address never reaches the page, even from a document that skipped validation.
    if (isSafeImageSrc(a.src)) img.src = a.src;
    if (a.width) img.width = String(a.width);
    if (a.height) img.height = String(a.height);
    const figure: Record<string, string> = { 'data-type': 'still' };
    if (a.stillId) figure['data-still-id'] = a.stillId;
    return a.caption ? ['figure', figure, ['img', img], ['figcaption', a.caption]] : ['figure', figure, ['img', img]];
  },
  addCommands() {
    return {
      insertStill:
        (attrs) =>
        ({ commands }) =>
          isSafeImageSrc(attrs.src) && commands.insertContent({ type: this.name, attrs }),
    };
  },
});
