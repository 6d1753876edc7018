// @vitest-environment happy-dom
import { getEditorSchema } from '@shared/editor';
import { DOMParser, Slice } from '@tiptap/pm/model';
import { describe, expect, it } from 'vitest';
import { dropUnpastableImages, isPastableImageSrc } from './paste';

const schema = getEditorSchema();

function parse(html: string): Slice {
  const el = document.createElement('div');
  el.innerHTML = html;
  return DOMParser.fromSchema(schema).parseSlice(el);
}

const stills = (slice: Slice) => {
  const out: string[] = [];
  slice.content.descendants((n) => {
    if (n.type.name === 'still') out.push(String(n.attrs.src));
  });
  return out;
};

describe('isPastableImageSrc', () => {
  it('allows http(s) addresses and our own media', () => {
    expect(isPastableImageSrc('https://shop.example/photos/kraft.jpg')).toBe(true);
    expect(isPastableImageSrc('http://shop.example/a.png')).toBe(true);
    expect(isPastableImageSrc('/media/stills/abc.jpg')).toBe(true);
  });
  it('refuses data: (RFC 2397), blob: and file: (WHATWG URL schemes), and other relative paths', () => {
    expect(isPastableImageSrc('data:image/png;base64,iVBORw0KGgo=')).toBe(false);
    expect(isPastableImageSrc('blob:https://shop.example/5b7e')).toBe(false);
    expect(isPastableImageSrc('file:///home/me/box.jpg')).toBe(false);
    expect(isPastableImageSrc('images/box.jpg')).toBe(false);
    expect(isPastableImageSrc('//cdn.example/box.jpg')).toBe(false);
    expect(isPastableImageSrc('/media/../secret.jpg')).toBe(false);
  });
});

describe('pasted HTML', () => {
  it('keeps web photos, and drops inline and local ones along with tags the schema does not know', () => {
    const slice = dropUnpastableImages(
      parse(
        '<p>Before</p><img src="https://shop.example/lid.jpg" alt="The lid"><img src="data:image/png;base64,AAAA"><img src="file:///c/box.jpg">' +
          '<script>alert(1)</script><iframe src="https://x.example"></iframe><p>After</p>',
      ),
    );
    expect(stills(slice)).toEqual(['https://shop.example/lid.jpg']);
    const html = JSON.stringify(slice.content.toJSON());
    expect(html).not.toMatch(/script|iframe|data:|file:/);
    expect(html).toMatch(/Before/);
    expect(html).toMatch(/After/);
  });

  it('drops a refused photo inside a list item too, and leaves a clean slice untouched', () => {
    const inner = schema.nodeFromJSON({
      type: 'doc',
      content: [
        {
          type: 'bulletList',
          content: [
            {
              type: 'listItem',
              content: [
                { type: 'paragraph', content: [{ type: 'text', text: 'Glue' }] },
                { type: 'still', attrs: { src: 'blob:x' } },
              ],
            },
          ],
        },
      ],
    });
    const slice = new Slice(inner.content, 0, 0);
    expect(stills(slice)).toEqual(['blob:x']);
    expect(stills(dropUnpastableImages(slice))).toEqual([]);
    const clean = parse('<p>Only words</p>');
    expect(dropUnpastableImages(clean)).toBe(clean);
  });
});
