/**
 * Cross-site scripting: nothing pasted, imported or submitted comes back executable.
 * Vectors follow the OWASP XSS Filter Evasion Cheat Sheet (cheatsheetseries.owasp.org),
 * rewritten with example domains; each is sent through every way content enters the
 * write-up: pasted HTML (sanitizeHtml, htmlToDoc, then renderDocHtml), Markdown import,
 * and document JSON (validateDoc, then renderDocHtml and the editor's own HTML).
 */
import type { JSONContent } from '@tiptap/core';
import { generateHTML } from '@tiptap/html/server';
import { Window } from 'happy-dom';
import { describe, expect, it } from 'vitest';
import { editorExtensions } from '@shared/editor/extensions';
import { markdownToDoc } from '@shared/editor/markdown';
import { renderDocHtml } from '@shared/editor/render-html';
import { validateDoc } from '@shared/editor/validate-doc';
import { htmlToDoc } from './html-to-doc';
import { sanitizeHtml } from './sanitize-html';

const ACTIVE_TAGS = new Set([
  'script',
  'style',
  'iframe',
  'frame',
  'frameset',
  'object',
  'embed',
  'applet',
  'svg',
  'math',
  'link',
  'meta',
  'base',
  'form',
  'input',
  'button',
  'textarea',
  'select',
  'template',
  'noscript',
  'video',
  'audio',
  'source',
]);
const URL_ATTRS = new Set(['href', 'src', 'cite', 'action', 'formaction', 'poster', 'data', 'background', 'dynsrc', 'lowsrc', 'xlink:href', 'srcset']);
const SAFE_PROTOCOLS = new Set(['http:', 'https:', 'mailto:']);

/** Our renderer escapes "<" everywhere, attribute values included, so not even the text "<script" appears. */
function renderedParts(html: string): string[] {
  return [...activeParts(html), ...(/<script/i.test(html) ? ['literal <script'] : [])];
}

/** Problems a browser would act on, found by parsing the HTML the way a browser does (happy-dom). */
function activeParts(html: string): string[] {
  const win = new Window({
    settings: { disableJavaScriptEvaluation: true, disableJavaScriptFileLoading: true, disableCSSFileLoading: true, disableIframePageLoading: true },
  });
  try {
    const doc = new win.DOMParser().parseFromString(`<!doctype html><html><head></head><body>${html}</body></html>`, 'text/html');
    const found: string[] = [];
    // The body itself too: a stray <body onload> lends its attributes to it.
    for (const el of [doc.body, ...doc.body.querySelectorAll('*')]) {
      const tag = el.tagName.toLowerCase();
      if (ACTIVE_TAGS.has(tag)) found.push(`<${tag}>`);
      for (const { name, value } of [...el.attributes]) {
        const n = name.toLowerCase();
        if (n.startsWith('on')) found.push(`${tag}[${n}]`);
        if (n === 'style' || n === 'srcdoc') found.push(`${tag}[${n}]`);
        if (URL_ATTRS.has(n)) {
          // Browsers strip ASCII whitespace and controls from URLs before reading the scheme.
          // eslint-disable-next-line no-control-regex -- the controls are what this strips
          const cleaned = String(value ?? '').replace(/[\u0000-\u0020\u007F]/g, '');
          let protocol: string;
          try {
            protocol = new URL(cleaned, 'https://base.invalid/').protocol;
          } catch {
            /* an unparsable address is not followed */
            protocol = 'https:';
          }
          if (!SAFE_PROTOCOLS.has(protocol)) found.push(`${tag}[${n}=${protocol}]`);
        }
      }
    }
    return found;
  } finally {
    void win.happyDOM.abort();
    win.close();
  }
}

// OWASP XSS Filter Evasion Cheat Sheet, entry by entry (our own payload addresses).
const VECTORS: [string, string][] = [
  ['basic script tag', '<SCRIPT SRC=https://xss.example/xss.js></SCRIPT>'],
  ['script with slash separator', '<SCRIPT/XSS SRC="https://xss.example/xss.js"></SCRIPT>'],
  ['extraneous open brackets', '<<SCRIPT>alert("XSS");//\\<</SCRIPT>'],
  ['malformed img with script', '<IMG """><SCRIPT>alert("XSS")</SCRIPT>"\\>'],
  ['img onerror', '<img src=x onerror=alert(1)>'],
  ['img javascript src', `<IMG SRC="javascript:alert('XSS');">`],
  ['img no quotes, mixed case', `<IMG SRC=JaVaScRiPt:alert('XSS')>`],
  [
    'img decimal entities',
    '<IMG SRC=&#106;&#97;&#118;&#97;&#115;&#99;&#114;&#105;&#112;&#116;&#58;&#97;&#108;&#101;&#114;&#116;&#40;&#39;&#88;&#83;&#83;&#39;&#41;>',
  ],
  [
    'img decimal entities without semicolons, padded',
    '<IMG SRC=&#0000106&#0000097&#0000118&#0000097&#0000115&#0000099&#0000114&#0000105&#0000112&#0000116&#0000058&#0000097&#0000108&#0000101&#0000114&#0000116&#0000040&#0000039&#0000088&#0000083&#0000083&#0000039&#0000041>',
  ],
  ['img hex entities', '<IMG SRC=&#x6A&#x61&#x76&#x61&#x73&#x63&#x72&#x69&#x70&#x74&#x3A&#x61&#x6C&#x65&#x72&#x74&#x28&#x27&#x58&#x53&#x53&#x27&#x29>'],
  ['embedded tab', `<IMG SRC="jav	ascript:alert('XSS');">`],
  ['embedded encoded tab', `<IMG SRC="jav&#x09;ascript:alert('XSS');">`],
  ['embedded newline', `<IMG SRC="jav&#x0A;ascript:alert('XSS');">`],
  ['embedded carriage return', `<IMG SRC="jav&#x0D;ascript:alert('XSS');">`],
  ['spaces and meta chars before javascript', `<IMG SRC=" &#14;  javascript:alert('XSS');">`],
  ['anchor with encoded tab', '<a href="jav&#x09;ascript:alert(1)">click</a>'],
  ['anchor with named colon entity', '<a href="javascript&colon;alert(1)">click</a>'],
  ['anchor with entity-encoded first letter', '<a href="&#x6A;avascript:alert(1)">click</a>'],
  ['anchor with data URL', '<a href="data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==">click</a>'],
  ['anchor with vbscript', '<a href="vbscript:msgbox(1)">click</a>'],
  ['svg onload', '<svg onload=alert(1)>'],
  ['svg slash onload', `<svg/onload=alert('XSS')>`],
  ['body onload', `<BODY ONLOAD=alert('XSS')>`],
  ['iframe javascript', `<IFRAME SRC="javascript:alert('XSS');"></IFRAME>`],
  ['iframe srcdoc', '<iframe srcdoc="<script>alert(1)</script>"></iframe>'],
  ['style import', `<STYLE>@import'https://xss.example/xss.css';</STYLE>`],
  ['style attribute url', `<DIV STYLE="background-image: url(javascript:alert('XSS'))">text</DIV>`],
  ['style expression', `<IMG STYLE="xss:expr/*XSS*/ession(alert('XSS'))" src="/media/a.jpg">`],
  ['meta refresh', `<META HTTP-EQUIV="refresh" CONTENT="0;url=javascript:alert('XSS');">`],
  ['base href', `<BASE HREF="javascript:alert('XSS');//">`],
  ['object', '<OBJECT TYPE="text/x-scriptlet" DATA="https://xss.example/scriptlet.html"></OBJECT>'],
  ['embed svg data', '<EMBED SRC="data:image/svg+xml;base64,PHN2ZyBvbmxvYWQ9YWxlcnQoMSk+" type="image/svg+xml">'],
  ['input image', `<INPUT TYPE="IMAGE" SRC="javascript:alert('XSS');">`],
  ['img dynsrc', `<IMG DYNSRC="javascript:alert('XSS')">`],
  ['table background', `<TABLE BACKGROUND="javascript:alert('XSS')"><tr><td>x</td></tr></TABLE>`],
  ['link stylesheet', '<LINK REL="stylesheet" HREF="javascript:alert(1);">'],
  ['form action', '<form action="javascript:alert(1)"><button>go</button></form>'],
  ['event handler without a tag it fits', '<p onmouseover="alert(1)">hover</p>'],
  ['noscript title break-out (mutation XSS, from memory)', '<noscript><p title="</noscript><img src=x onerror=alert(1)>"></p></noscript>'],
  ['math style mutation (from memory)', '<math><mtext><table><mglyph><style><img src=x onerror=alert(1)>'],
  [
    'our own nodes carrying payloads',
    '<figure data-type="still"><img src="javascript:alert(1)" onerror="alert(1)"><figcaption><script>alert(1)</script></figcaption></figure><section data-type="step" data-at-ms="1 onload=alert(1)"><h3 data-type="step-title" onclick="alert(1)">T</h3></section>',
  ],
];

describe('pasted HTML never comes back executable (OWASP XSS Filter Evasion Cheat Sheet)', () => {
  it('the checker flags every raw vector, so a clean result means something', () => {
    // happy-dom does not recover the <script> after a stray "<" as browsers do; the literal check catches it.
    expect(VECTORS.filter(([, v]) => renderedParts(v).length === 0).map(([n]) => n)).toEqual([]);
  });

  it.each(VECTORS)('%s', (_name, vector) => {
    const clean = sanitizeHtml(vector);
    expect(renderedParts(clean)).toEqual([]);
    const doc = htmlToDoc(vector);
    expect(validateDoc(doc).ok).toBe(true);
    expect(renderedParts(renderDocHtml(doc, { videoUrl: 'https://video.example/v' }))).toEqual([]);
    expect(activeParts(generateHTML(doc, editorExtensions))).toEqual([]);
  });

  it('keeps the harmless words around a payload', () => {
    const doc = htmlToDoc('<p>Score <b>twice</b><script>alert(1)</script> then fold.</p><img src=x onerror=alert(1)>');
    expect(renderDocHtml(doc)).toBe('<p>Score <strong>twice</strong> then fold.</p>');
  });
});

describe('Markdown with the same payloads never comes back executable (OWASP XSS Filter Evasion Cheat Sheet)', () => {
  it.each(VECTORS)('%s', (_name, vector) => {
    const doc = markdownToDoc(`Before.\n\n${vector}\n\nAfter [link](${'javascript:alert(1)'}) ![i](javascript:alert(1))`);
    expect(renderedParts(renderDocHtml(doc))).toEqual([]);
  });

  it('script URLs in Markdown links and images, in every case and with entities', () => {
    const md = [
      '[a](javascript:alert(1))',
      '[b](JaVaScRiPt:alert(1))',
      '[c](jav&#x09;ascript:alert(1))',
      '[d](&#x6A;avascript:alert(1))',
      '[e](data:text/html,x)',
      '![f](data:image/svg+xml,x)',
      '<javascript:alert(1)>',
    ].join('\n\n');
    const html = renderDocHtml(markdownToDoc(md));
    expect(activeParts(html)).toEqual([]);
    // "jav&#x09;ascript:" is decoded and percent-encoded by markdown-it into a harmless relative path.
    expect(html).not.toMatch(/(href|src)="\s*(javascript|data|vbscript):/i);
    expect(html).not.toMatch(/<img /);
  });
});

const link = (href: string): JSONContent => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text: 'click', marks: [{ type: 'link', attrs: { href } }] }] }],
});
const still = (src: string, extra: Record<string, unknown> = {}): JSONContent => ({
  type: 'doc',
  content: [{ type: 'still', attrs: { src, alt: 'x', ...extra } }],
});

// The same address tricks sent as document JSON (OWASP XSS Filter Evasion Cheat Sheet, URL entries).
const JSON_VECTORS: [string, JSONContent][] = [
  ['link javascript:', link('javascript:alert(1)')],
  ['link mixed case', link('JaVaScRiPt:alert(1)')],
  ['link with tab', link('jav\tascript:alert(1)')],
  ['link with newline', link('jav\nascript:alert(1)')],
  ['link with leading control character', link('\u000Ejavascript:alert(1)')],
  ['link with leading space', link(' javascript:alert(1)')],
  ['link data:', link('data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==')],
  ['link vbscript:', link('vbscript:msgbox(1)')],
  ['still javascript:', still('javascript:alert(1)')],
  ['still data: svg', still('data:image/svg+xml;base64,PHN2ZyBvbmxvYWQ9YWxlcnQoMSk+')],
  ['still alt breaking out of the attribute', still('/media/a.jpg', { alt: '"><script>alert(1)</script>', caption: '<img src=x onerror=alert(1)>' })],
  [
    'step time as markup',
    {
      type: 'doc',
      content: [{ type: 'step', attrs: { atMs: '0" onclick="alert(1)' }, content: [{ type: 'stepTitle', content: [{ type: 'text', text: 'x' }] }] }],
    },
  ],
  [
    'heading level as markup',
    { type: 'doc', content: [{ type: 'heading', attrs: { level: '1><script>alert(1)</script' }, content: [{ type: 'text', text: 'x' }] }] },
  ],
  ['unknown script node', { type: 'doc', content: [{ type: 'script', content: [{ type: 'text', text: 'alert(1)' }] }] }],
  [
    'unknown mark',
    { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'x', marks: [{ type: 'onclick', attrs: { handler: 'alert(1)' } }] }] }] },
  ],
];

describe('document JSON never comes back executable (OWASP XSS Filter Evasion Cheat Sheet)', () => {
  it.each(JSON_VECTORS)('%s: refused, stripped or escaped', (_name, json) => {
    const refused = validateDoc(json);
    const stripped = validateDoc(json, { strip: true });
    if (stripped.ok) {
      expect(renderedParts(renderDocHtml(stripped.doc, { videoUrl: 'https://video.example/v' }))).toEqual([]);
      expect(activeParts(generateHTML(stripped.doc, editorExtensions))).toEqual([]);
    }
    // Rendering skips validation here on purpose: the renderer must hold on its own.
    expect(renderedParts(renderDocHtml(json, { videoUrl: 'https://video.example/v' }))).toEqual([]);
    if (refused.ok) expect(renderedParts(renderDocHtml(refused.doc))).toEqual([]);
  });

  it('refuses every unsafe address outright', () => {
    const unsafe = JSON_VECTORS.filter(([n]) => n.startsWith('link') || (n.startsWith('still') && !n.includes('alt')));
    expect(unsafe).toHaveLength(10);
    for (const [name, json] of unsafe) expect(validateDoc(json).ok, name).toBe(false);
  });

  it('refuses an unsafe video address for the "Watch at" links, keeping the step', () => {
    const doc: JSONContent = {
      type: 'doc',
      content: [{ type: 'step', attrs: { atMs: 1000 }, content: [{ type: 'stepTitle', content: [{ type: 'text', text: 'x' }] }] }],
    };
    const html = renderDocHtml(doc, { videoUrl: 'javascript:alert(1)//' });
    expect(activeParts(html)).toEqual([]);
    expect(html).toBe('<ol class="cw-steps"><li class="cw-step" id="step-1"><h3>x</h3></li></ol>');
  });

  it('refuses unsafe supply links from the Supplies section, keeping the name', () => {
    const doc: JSONContent = { type: 'doc', content: [{ type: 'supplyList' }] };
    const html = renderDocHtml(doc, { supplies: [{ category: 'tool', name: 'Trimmer', url: 'javascript:alert(1)', sponsored: true }] });
    expect(activeParts(html)).toEqual([]);
    expect(html).toBe('<div class="cw-supplies"><h3>Tools</h3><ul><li>Trimmer</li></ul></div>');
  });
});
