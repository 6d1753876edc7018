import type { JSONContent } from '@tiptap/core';
import { Window } from 'happy-dom';
import { HtmlValidate } from 'html-validate';
import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { formatMmNumber } from './render-parts';
import { renderDocHtml } from './render-html';
import type { RenderContext, RenderPiece, RenderSupply } from './types';

const t = (text: string, marks?: JSONContent['marks']): JSONContent => ({ type: 'text', text, ...(marks ? { marks } : {}) });
const p = (...content: JSONContent[]): JSONContent => ({ type: 'paragraph', content });
const h = (level: number, text: string): JSONContent => ({ type: 'heading', attrs: { level }, content: [t(text)] });
const step = (title: string, atMs: number | null, ...body: JSONContent[]): JSONContent => ({
  type: 'step',
  attrs: { atMs, chapterId: null },
  content: [{ type: 'stepTitle', content: title ? [t(title)] : [] }, ...body],
});

// A hexagon treat box of our own invention.
const DOC: JSONContent = {
  type: 'doc',
  content: [
    h(1, 'Hexagon treat box'),
    p(
      t('A six-sided box with a '),
      t('lift-off', [{ type: 'italic' }]),
      t(' lid. See '),
      t('the template', [{ type: 'link', attrs: { href: '/t/hexagon#template' } }]),
      t('.'),
    ),
    h(2, 'Supplies'),
    { type: 'supplyList', attrs: { grouped: true } },
    h(2, 'Cut list'),
    { type: 'cutList', attrs: { units: 'both' } },
    h(2, 'Steps'),
    step(
      'Score the wall strip',
      192_000,
      p(t('Score at 2 in, 4 in and 6 in.')),
      {
        type: 'still',
        attrs: { stillId: 's1', src: '/media/stills/s1.jpg', alt: 'Strip on the scoring board', caption: 'Scored strip', width: 1280, height: 720 },
      },
      { type: 'tip', content: [p(t('A bone folder gives a '), t('crisp', [{ type: 'bold' }]), t(' fold.'))] },
    ),
    step('', null, p(t('Glue the base on.'))),
    { type: 'caution', content: [p(t('Hot glue burns.')), { type: 'bulletList', content: [{ type: 'listItem', content: [p(t('Keep fingers clear.'))] }] }] },
  ],
};

const PIECES: RenderPiece[] = [
  // 10 9/16 in = 268.2875 mm and 4 1/4 in = 107.95 mm (1 in = 25.4 mm exactly, NIST SP 811 Appendix B).
  {
    name: 'Wall strip',
    material: 'Kraft cardstock',
    quantity: 1,
    shape: 'rect',
    width: '10 9/16 in',
    height: '4 1/4 in',
    widthMm: 268.2875,
    heightMm: 107.95,
    scoreLines: ['2 in', '4 in', '6 in'],
    notes: 'Grain along the strip',
  },
  { name: 'Lid', material: 'Patterned paper', quantity: 2, shape: 'circle', width: '3 in', height: '3 in', widthMm: 76.2, heightMm: 76.2, scoreLines: [] },
];
const SUPPLIES: RenderSupply[] = [
  { category: 'tool', name: 'Bone folder' },
  { category: 'cardstock', name: 'Kraft cardstock', quantity: '2 sheets', url: 'https://shop.example/kraft', sponsored: true, discountCode: 'KRAFT10' },
  { category: 'adhesive', name: 'Tape runner', url: 'https://other.example/tape', note: 'permanent' },
];
const CTX: RenderContext = { pieces: PIECES, supplies: SUPPLIES, precision: 16, videoUrl: 'https://video.example/watch/hex' };

function parse(html: string) {
  const win = new Window({ settings: { disableJavaScriptEvaluation: true, disableJavaScriptFileLoading: true, disableCSSFileLoading: true } });
  const doc = new win.DOMParser().parseFromString(`<!doctype html><html><body>${html}</body></html>`, 'text/html');
  return doc.body as unknown as HTMLElement;
}

function page(fragment: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Hexagon treat box</title></head><body><main><article>${fragment}</article></main></body></html>`;
}

describe('renderDocHtml', () => {
  const html = renderDocHtml(DOC, CTX);
  const body = parse(html);

  it('passes the html-validate standard rules as a full page', async () => {
    const report = await new HtmlValidate({ extends: ['html-validate:standard'] }).validateString(page(html));
    expect(report.results.flatMap((r) => r.messages.map((m) => `${m.ruleId}: ${m.message}`))).toEqual([]);
    expect(report.valid).toBe(true);
  });

  it('keeps the headings and intro in order', () => {
    expect([...body.querySelectorAll('h1, h2')].map((e) => `${e.tagName}:${e.textContent}`)).toEqual([
      'H1:Hexagon treat box',
      'H2:Supplies',
      'H2:Cut list',
      'H2:Steps',
    ]);
    expect(body.querySelector('p')!.innerHTML).toBe('A six-sided box with a <em>lift-off</em> lid. See <a href="/t/hexagon#template">the template</a>.');
  });

  it('renders the steps as one ordered list, each with its title, photo and time link', () => {
    const items = [...body.querySelectorAll('ol.cw-steps > li')];
    expect(items).toHaveLength(2);
    expect(items.map((li) => li.querySelector('h3')!.textContent)).toEqual(['Score the wall strip', 'Step 2']);
    const img = items[0]!.querySelector('figure > img')!;
    expect([img.getAttribute('src'), img.getAttribute('alt'), img.getAttribute('width'), img.getAttribute('height')]).toEqual([
      '/media/stills/s1.jpg',
      'Strip on the scoring board',
      '1280',
      '720',
    ]);
    expect(items[0]!.querySelector('figcaption')!.textContent).toBe('Scored strip');
    // W3C Media Fragments URI 1.0, temporal dimension: #t=<seconds>; 192 s is 3:12.
    const watch = items[0]!.querySelector('.cw-step-time a')!;
    expect([watch.textContent, watch.getAttribute('href')]).toEqual(['Watch at 3:12', 'https://video.example/watch/hex#t=192']);
    expect(items[1]!.querySelector('.cw-step-time')).toBeNull();
  });

  it('shows tips and cautions as asides with their label', () => {
    expect(body.querySelector('li aside.cw-tip')!.innerHTML).toBe('<p><strong>Tip:</strong> A bone folder gives a <strong>crisp</strong> fold.</p>');
    const caution = body.querySelector('aside.cw-caution')!;
    expect(caution.querySelector('p')!.textContent).toBe('Caution: Hot glue burns.');
    expect(caution.querySelector('ul li')!.textContent).toBe('Keep fingers clear.');
  });

  it('draws the cut list as a table with fractions and millimetres', () => {
    const table = body.querySelector('.cw-cut-list table')!;
    expect([...table.querySelectorAll('thead th')].map((e) => e.textContent)).toEqual(['Piece', 'Material', 'Qty', 'Size', 'Score lines', 'Notes']);
    const rows = [...table.querySelectorAll('tbody tr')].map((r) => [...r.children].map((c) => c.textContent));
    expect(rows).toEqual([
      ['Wall strip', 'Kraft cardstock', '1', '10 9/16 x 4 1/4 in (268.3 x 108 mm)', '2 in, 4 in, 6 in', 'Grain along the strip'],
      ['Lid', 'Patterned paper', '2', '3 in circle (76.2 mm circle)', '', ''],
    ]);
    expect(body.querySelector('.cw-cut-list .cw-note')!.textContent).toBe('Inch sizes are given to the nearest 1/16 in; millimetres to 0.1 mm.');
  });

  it('shows one system only when the node asks for it', () => {
    const only = (units: string) =>
      parse(renderDocHtml({ type: 'doc', content: [{ type: 'cutList', attrs: { units } }] }, CTX)).querySelector('tbody td:nth-child(4)')!.textContent;
    expect(only('in')).toBe('10 9/16 x 4 1/4 in');
    expect(only('mm')).toBe('268.3 x 108 mm');
  });

  it('lists supplies by category with shop links, rel="sponsored" and the disclosure before them', () => {
    const s = body.querySelector('.cw-supplies')!;
    // Category order of DESIGN.md W4: paper, cardstock, embellishment, adhesive, tool.
    expect([...s.querySelectorAll('h3')].map((e) => e.textContent)).toEqual(['Cardstock', 'Adhesives', 'Tools']);
    const sponsored = s.querySelector('a[href="https://shop.example/kraft"]')!;
    // Google Search Central, "Qualify your outbound links": rel="sponsored" for paid links.
    expect(sponsored.getAttribute('rel')).toBe('sponsored noopener');
    // The tag sits beside the item itself, not only in the disclosure above the list.
    expect(sponsored.parentElement!.textContent).toBe('Kraft cardstock (sponsored link) (2 sheets) (discount code KRAFT10)');
    expect(s.querySelector('a[href="https://other.example/tape"]')!.hasAttribute('rel')).toBe(false);
    expect(s.querySelector('a[href="https://other.example/tape"]')!.parentElement!.textContent).toBe('Tape runner — permanent');
    // FTC Endorsement Guides (16 CFR 255): a clear and conspicuous disclosure, here ahead of the links.
    expect(s.firstElementChild!.className).toBe('cw-disclosure');
    expect(parse(renderDocHtml(DOC, { ...CTX, disclosure: 'Kraft cardstock was sent to me by the shop.' })).querySelector('.cw-disclosure')!.textContent).toBe(
      'Kraft cardstock was sent to me by the shop.',
    );
  });

  it('leaves the disclosure out when no link is sponsored, and the live lists out when empty', () => {
    const plain = parse(renderDocHtml(DOC, { ...CTX, supplies: SUPPLIES.map((x) => ({ ...x, sponsored: false })) }));
    expect(plain.querySelector('.cw-disclosure')).toBeNull();
    const empty = parse(renderDocHtml(DOC, {}));
    expect(empty.querySelector('.cw-supplies, .cw-cut-list, .cw-step-time')).toBeNull();
  });

  it('lists supplies in one list when not grouped', () => {
    const out = parse(renderDocHtml({ type: 'doc', content: [{ type: 'supplyList', attrs: { grouped: false } }] }, CTX));
    expect(out.querySelectorAll('h3')).toHaveLength(0);
    expect(out.querySelectorAll('ul > li')).toHaveLength(3);
  });

  it('carries step numbering on across a break between runs of steps', () => {
    const out = parse(renderDocHtml({ type: 'doc', content: [step('One', null), step('Two', null), p(t('Let it dry.')), step('Three', null)] }));
    const lists = [...out.querySelectorAll('ol.cw-steps')];
    expect(lists.map((l) => l.getAttribute('start'))).toEqual([null, '3']);
    expect(lists[1]!.querySelector('li')!.id).toBe('step-3');
  });

  it('escapes every text and attribute', () => {
    const nasty = '<script>alert("x")</script> & "quotes"';
    const out = renderDocHtml(
      {
        type: 'doc',
        content: [
          p(t(nasty)),
          { type: 'still', attrs: { src: '/media/a.jpg', alt: '" onerror="alert(1)', caption: '<b>cap</b>' } },
          { type: 'cutList' },
          { type: 'supplyList' },
        ],
      },
      {
        pieces: [{ ...PIECES[0]!, name: '<img src=x onerror=alert(1)>' }],
        supplies: [{ category: '<i>odd</i>', name: '"><script>', url: 'https://shop.example/?a=1&b=2' }],
      },
    );
    expect(out).not.toMatch(/<script|<img src=x|<b>|<i>/);
    expect(out).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &quot;quotes&quot;');
    expect(out).toContain('alt="&quot; onerror=&quot;alert(1)"');
    expect(out).toContain('href="https://shop.example/?a=1&amp;b=2"');
  });

  it('lets a publisher swap stills for resized copies, still checking the address', () => {
    const d: JSONContent = {
      type: 'doc',
      content: [{ type: 'still', attrs: { stillId: 's1', src: '/media/stills/s1.jpg', alt: 'A', caption: '', width: 1920, height: 1080 } }],
    };
    const resized = parse(renderDocHtml(d, { resolveStill: (s) => ({ ...s, src: '/media/export/s1-800.jpg', width: 800, height: 450 }) })).querySelector(
      'img',
    )!;
    expect([resized.getAttribute('src'), resized.getAttribute('width'), resized.getAttribute('height')]).toEqual(['/media/export/s1-800.jpg', '800', '450']);
    expect(renderDocHtml(d, { resolveStill: (s) => ({ ...s, src: 'javascript:alert(1)' }) })).toBe('');
    expect(renderDocHtml(d, { resolveStill: () => null })).toBe('');
  });
});

describe('formatMmNumber', () => {
  it('rounds to 0.1 mm, half away from zero on the decimal value', () => {
    // 4 1/4 in = 107.95 mm exactly (NIST SP 811); the float is 107.9499999..., still shown as 108.
    expect(formatMmNumber(4.25 * 25.4)).toBe('108');
    expect(formatMmNumber(0.15)).toBe('0.2');
    expect(formatMmNumber(63.5)).toBe('63.5');
    expect(formatMmNumber(-0.04)).toBe('0');
  });

  it('agrees with mathjs unit conversion for the cut-list sizes', () => {
    // Cross-check against a reference library: mathjs converts with its own inch definition.
    for (const [inches, shown] of [
      [10.5625, '268.3'],
      [3, '76.2'],
      [12, '304.8'],
      [8.5, '215.9'],
    ] as const) {
      expect(formatMmNumber(unit(inches, 'inch').toNumber('mm'))).toBe(shown);
    }
  });
});
