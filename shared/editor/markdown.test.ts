import type { JSONContent } from '@tiptap/core';
import MarkdownIt from 'markdown-it';
import { describe, expect, it } from 'vitest';
import { docToMarkdown, markdownToDoc } from './markdown';
import type { RenderContext } from './types';
import { validateDoc } from './validate-doc';

// A round gift box of our own, written the way docToMarkdown writes (so the round trip must give it back verbatim).
const SAMPLE = `# Round gift box

A round box with a lift-off lid, *quick* to make and **sturdy** enough for a small gift. Sizes are for a 3 in base; see [the template](/t/round-box#template "Template page").

## Supplies

<!-- supplies grouped="true" -->

<!-- /supplies -->

## Cut list

<!-- cut-list units="both" -->

<!-- /cut-list -->

## Steps

### Step 1: Cut the base and lid

Cut two circles: one at 3 in and one at 3 1/16 in for the lid.\\
Mark the centre of each lightly.

![Two circles on the cutting mat](/media/stills/c1.jpg "The base and the lid")

> **Tip:** Cut the lid a little larger, by about the wall thickness on each side.

Watch at 0:45

### Step 2: Score and wrap the wall

- Score the strip at 1/2 in along one long side.
- Notch the tabs every 1/2 in:
  - not too deep
  - stop at the score line

1. Wrap the strip around the base.
2. Glue the overlap.

> **Caution:** Wet glue slides; hold the seam for a minute.
>
> Use ~~lots of~~ a thin line of glue.

Watch at 2:10

### Step 3

Let it dry.

## Finishing

> A quote from a reader, not a tip.

---

Thanks for making it with me \\*and\\* sharing it!
`;

const CTX: RenderContext = {
  videoUrl: 'https://video.example/v/round',
  precision: 16,
  pieces: [
    {
      name: 'Wall | strip',
      material: 'Kraft cardstock',
      quantity: 1,
      shape: 'rect',
      width: '10 9/16 in',
      height: '2 in',
      widthMm: 268.2875,
      heightMm: 50.8,
      scoreLines: ['1/2 in'],
      notes: '',
    },
  ],
  supplies: [{ category: 'cardstock', name: 'Kraft cardstock', quantity: '1 sheet', url: 'https://shop.example/kraft', sponsored: true }],
};

function find(doc: JSONContent, type: string): JSONContent[] {
  const out: JSONContent[] = [];
  const walk = (n: JSONContent) => {
    if (n.type === type) out.push(n);
    n.content?.forEach(walk);
  };
  walk(doc);
  return out;
}

describe('markdownToDoc', () => {
  const doc = markdownToDoc(SAMPLE);

  it('gives a document the validator accepts', () => {
    expect(validateDoc(doc)).toEqual({ ok: true, doc });
  });

  it('reads "### Step N: Title" headings as steps, with their time from "Watch at m:ss"', () => {
    const steps = find(doc, 'step');
    expect(steps.map((s) => [s.content![0]!.content?.[0]?.text ?? '', s.attrs!.atMs])).toEqual([
      ['Cut the base and lid', 45_000],
      ['Score and wrap the wall', 130_000],
      ['', null],
    ]);
    expect(steps[1]!.content!.map((c) => c.type)).toEqual(['stepTitle', 'bulletList', 'orderedList', 'caution']);
  });

  it('reads tips, cautions, photos and the live-list markers', () => {
    expect(find(doc, 'tip')).toHaveLength(1);
    expect(find(doc, 'caution')[0]!.content![1]!.content!.map((c) => c.text)).toEqual(['Use ', 'lots of', ' a thin line of glue.']);
    expect(find(doc, 'still')[0]!.attrs).toEqual({
      stillId: null,
      src: '/media/stills/c1.jpg',
      alt: 'Two circles on the cutting mat',
      caption: 'The base and the lid',
      width: null,
      height: null,
    });
    expect(find(doc, 'cutList')[0]!.attrs).toEqual({ units: 'both' });
    expect(find(doc, 'supplyList')[0]!.attrs).toEqual({ grouped: true });
    // A plain quote stays a quote.
    expect(find(doc, 'blockquote')).toHaveLength(1);
  });

  it('ignores whatever sits between the markers: the rows live in the Cut list section', () => {
    const d = markdownToDoc('<!-- cut-list units="mm" -->\n\n| Piece | Qty |\n| --- | --- |\n| Lid | 2 |\n\n<!-- /cut-list -->\n\nAfter.\n');
    expect(d.content).toEqual([
      { type: 'cutList', attrs: { units: 'mm' } },
      { type: 'paragraph', content: [{ type: 'text', text: 'After.' }] },
    ]);
  });

  it('drops raw HTML and unsafe addresses (markdown-it reads it; nothing is passed on as markup)', () => {
    const d = markdownToDoc(
      '<script>alert(1)</script>\n\nHello <b onmouseover="alert(1)">there</b> [x](javascript:alert(1)) [y](https://ok.example)\n\n![p](javascript:alert(1))\n\n<div>block</div>\n',
    );
    expect(d.content).toEqual([
      {
        type: 'paragraph',
        content: [
          { type: 'text', text: 'Hello there [x](javascript:alert(1)) ' },
          {
            type: 'text',
            text: 'y',
            marks: [{ type: 'link', attrs: { href: 'https://ok.example', target: null, rel: 'noopener noreferrer nofollow', class: null, title: null } }],
          },
        ],
      },
      // markdown-it refuses the script address, so the image stays as its literal words.
      { type: 'paragraph', content: [{ type: 'text', text: '![p](javascript:alert(1))' }] },
    ]);
  });

  it('turns what the schema lacks into text: tables to lines, code to plain paragraphs, deep headings to level 3', () => {
    const d = markdownToDoc('#### Deep\n\n| a | b |\n| --- | --- |\n| 1 | 2 |\n\n```\nline one\nline two\n```\n');
    expect(d.content).toEqual([
      { type: 'heading', attrs: { level: 3 }, content: [{ type: 'text', text: 'Deep' }] },
      { type: 'paragraph', content: [{ type: 'text', text: 'a | b' }] },
      { type: 'paragraph', content: [{ type: 'text', text: '1 | 2' }] },
      { type: 'paragraph', content: [{ type: 'text', text: 'line one' }, { type: 'hardBreak' }, { type: 'text', text: 'line two' }] },
    ]);
  });

  it('reads an empty file as an empty document', () => {
    expect(markdownToDoc('')).toEqual({ type: 'doc', content: [{ type: 'paragraph' }] });
  });
});

describe('docToMarkdown', () => {
  it('round trip: docToMarkdown(markdownToDoc(md)) gives the sample back, and is stable', () => {
    const once = docToMarkdown(markdownToDoc(SAMPLE));
    expect(once).toBe(SAMPLE);
    expect(docToMarkdown(markdownToDoc(once))).toBe(once);
  });

  it('stays stable with the live lists filled in and a video link', () => {
    const filled = docToMarkdown(markdownToDoc(SAMPLE), CTX);
    expect(docToMarkdown(markdownToDoc(filled), CTX)).toBe(filled);
    expect(markdownToDoc(filled)).toEqual(markdownToDoc(SAMPLE));
    expect(filled).toContain('[Watch at 2:10](https://video.example/v/round#t=130)');
  });

  it('writes the cut list as a GFM table and the supplies with the disclosure (checked with markdown-it as the reference reader)', () => {
    const out = docToMarkdown(markdownToDoc(SAMPLE), CTX);
    const html = new MarkdownIt().render(out);
    expect(out).toContain('| Wall \\| strip | Kraft cardstock | 1 | 10 9/16 x 2 in (268.3 x 50.8 mm) | 1/2 in |');
    expect(html).toContain('<td>Wall | strip</td>');
    expect(html).toContain('<a href="https://shop.example/kraft">Kraft cardstock</a> (sponsored link) (1 sheet)');
    expect(html).toMatch(/<em>Some links in this tutorial are sponsored/);
    expect(html).toContain('<h3>Step 1: Cut the base and lid</h3>');
  });

  it('keeps two lists in a row apart: the second takes the other marker (CommonMark 0.31.2, 5.3: a new bullet or delimiter starts a new list)', () => {
    const md = '- a\n- b\n\n\n* c\n\n1. one\n\n\n2) two\n';
    const doc = markdownToDoc(md);
    expect(doc.content!.map((n) => n.type)).toEqual(['bulletList', 'bulletList', 'orderedList', 'orderedList']);
    expect(markdownToDoc(docToMarkdown(doc))).toEqual(doc);
  });

  it('escapes Markdown syntax in text so it reads back as the same words', () => {
    const words = '# not a heading *not emphasis* [not](a link) <b>not html</b> 1. not a list &amp; _x_ ~~y~~ \\ done';
    const doc: JSONContent = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: words }] }] };
    const back = markdownToDoc(docToMarkdown(doc));
    expect(back.content![0]!.content).toEqual([{ type: 'text', text: words }]);
  });
});

describe('docToMarkdown: link addresses as a Markdown reader sees them', () => {
  // A reader that trusts every address: it shows what the written Markdown itself points at.
  const laxReader = new MarkdownIt();
  laxReader.validateLink = () => true;
  const hrefs = (md: string) => [...laxReader.render(md).matchAll(/href="([^"]*)"/g)].map((m) => laxReader.utils.unescapeAll(m[1]!));
  const linked = (href: string): JSONContent => ({
    type: 'doc',
    content: [{ type: 'paragraph', content: [{ type: 'text', text: 'the shop', marks: [{ type: 'link', attrs: { href } }] }] }],
  });

  // OWASP XSS Filter Evasion Cheat Sheet: character references inside a scheme; CommonMark 0.31.2, 6.3 (entity and
  // numeric character references are decoded in link destinations) and 2.4 (backslash escapes).
  it.each([
    'javascript&colon;alert(1)',
    '&#106;avascript:alert(1)',
    'java&#x73;cript:alert(1)',
    '//evil.example/steal',
    '/\\evil.example/steal',
    '&#47;/evil.example/steal',
    '\\/\\/evil.example',
  ])('refuses %j: the words stay, the link goes, and no reader finds a script or another site', (href) => {
    const md = docToMarkdown(linked(href));
    expect(md).toContain('the shop');
    expect(md).not.toContain('](');
    for (const h of hrefs(md)) expect(h).not.toMatch(/^(javascript:|\/\/|\/\\)/i);
  });

  it('keeps ordinary addresses, percent-encoding only what a reader would otherwise change', () => {
    expect(docToMarkdown(linked('https://shop.example/kraft?colour=brown&size=a4'))).toContain('[the shop](https://shop.example/kraft?colour=brown&size=a4)');
    expect(docToMarkdown(linked('/t/round-box#template'))).toContain('[the shop](/t/round-box#template)');
    const odd = docToMarkdown(linked('https://shop.example/a b(c)?x=1&amp;y=2'));
    expect(hrefs(odd)).toEqual(['https://shop.example/a%20b%28c%29?x=1%26amp;y=2']);
    // No ";": CommonMark leaves it, but a browser reading an attribute would decode "&#58" to ":".
    expect(hrefs(docToMarkdown(linked('javascript&#58alert(1)')))).toEqual(['javascript%26#58alert%281%29']);
  });

  it('applies the same rule to supply links in the live list', () => {
    const doc: JSONContent = { type: 'doc', content: [{ type: 'supplyList', attrs: { grouped: false } }] };
    const ctx: RenderContext = {
      supplies: [
        { category: 'tools', name: 'Bone folder', url: 'java&#x73;cript:alert(1)' },
        { category: 'tools', name: 'Glue', url: 'https://shop.example/glue' },
      ],
    };
    const md = docToMarkdown(doc, ctx);
    expect(md).toContain('- Bone folder');
    expect(hrefs(md)).toEqual(['https://shop.example/glue']);
  });
});
