/**
 * Markdown out and in, with conventions of our own for the nodes Markdown lacks:
 *
 * - a step is a heading "### Step N: Title" followed by its blocks, up to the next heading
 *   or rule; a paragraph "Watch at m:ss" (or a link with that text) gives its time;
 * - "> **Tip:** ..." is a tip and "> **Caution:** ..." a caution;
 * - a photo is a paragraph holding only `![alt](src "caption")`;
 * - the live lists sit between comment markers, `<!-- cut-list units="both" -->` ...
 *   `<!-- /cut-list -->` and `<!-- supplies grouped="true" -->` ... `<!-- /supplies -->`; what is
 *   between them is written for readers and skipped on reading, since the rows live in the
 *   Cut list and Supplies sections.
 *
 * Reading walks markdown-it's tokens straight into Tiptap JSON: raw HTML is never passed on
 * (only the markers are read), and every address goes through the same checks as the editor.
 * Pure: runs in the browser as well as on the server.
 */
import type { JSONContent } from '@tiptap/core';
import MarkdownIt from 'markdown-it';
import type { Token } from 'markdown-it';
import { parseTimestamp } from '../transcript/timestamp';
import {
  CALLOUT_LABELS,
  DEFAULT_DISCLOSURE,
  groupSupplies,
  inchSize,
  mmSize,
  plainText,
  supplyDetails,
  timeLink,
  TIME_LINE,
} from './render-parts';
import { CUT_LIST_UNITS, type CutListUnits, type RenderContext, type RenderPiece, type StillAttrs } from './types';
import { isSafeImageSrc, isSafeLinkHref } from './urls';
import { validateDoc } from './validate-doc';

// ---------------------------------------------------------------- writing

type Mark = NonNullable<JSONContent['marks']>[number];
const MARK_RANK: Record<string, number> = { link: 0, bold: 1, italic: 2, strike: 3 };
const DELIMS: Record<string, string> = { bold: '**', italic: '*', strike: '~~' };

function escapeText(s: string, inTable = false): string {
  let out = s.replace(/\n/g, ' ').replace(/[\\`*_[\]<~]/g, '\\$&').replace(/&(?=#?[a-z0-9]+;)/gi, '\\&');
  if (inTable) out = out.replace(/\|/g, '\\|');
  return out;
}

// Characters that would start a block at the start of a line.
function escapeLineStarts(s: string): string {
  return s
    .split('\n')
    .map((line) => line.replace(/^([#>+=-])/, '\\$1').replace(/^(\d+)([.)])/, '$1\\$2'))
    .join('\n');
}

function encodeHref(href: string): string {
  return href.replace(/[ ()<>]/g, (c) => encodeURIComponent(c));
}

function quoteTitle(t: string): string {
  return `"${t.replace(/\n/g, ' ').replace(/[\\"]/g, '\\$&').replace(/&(?=#?[a-z0-9]+;)/gi, '\\&')}"`;
}

function sameMark(a: Mark, b: Mark): boolean {
  return a.type === b.type && (a.type !== 'link' || a.attrs?.href === b.attrs?.href);
}

/** Inline content as Markdown; whitespace is moved outside emphasis so the delimiters stay valid. */
function inlineMd(nodes: readonly JSONContent[] | undefined, inTable = false): string {
  type Seg = { text: string; marks: Mark[]; br?: boolean };
  const segs: Seg[] = [];
  const list = [...(nodes ?? [])];
  while (list.length && list[list.length - 1]!.type === 'hardBreak') list.pop();
  for (const n of list) {
    if (n.type === 'hardBreak') {
      segs.push({ text: '', marks: [], br: true });
      continue;
    }
    if (n.type !== 'text' || !n.text) continue;
    const marks = [...(n.marks ?? [])].filter((m) => m.type in MARK_RANK && (m.type !== 'link' || isSafeLinkHref(m.attrs?.href))).sort((a, b) => MARK_RANK[a.type]! - MARK_RANK[b.type]!);
    const m = /^(\s*)([\s\S]*?)(\s*)$/.exec(n.text.replace(/\n/g, ' '))!;
    const outer = marks.filter((k) => k.type === 'link');
    if (m[1]) segs.push({ text: m[1], marks: outer });
    if (m[2]) segs.push({ text: m[2], marks });
    if (m[3]) segs.push({ text: m[3], marks: outer });
  }
  let out = '';
  const stack: Mark[] = [];
  const close = (m: Mark) => (m.type === 'link' ? `](${encodeHref(String(m.attrs!.href))}${m.attrs?.title ? ` ${quoteTitle(String(m.attrs.title))}` : ''})` : DELIMS[m.type]!);
  for (const s of segs) {
    const marks = s.br ? [] : s.marks;
    let keep = 0;
    while (keep < stack.length && keep < marks.length && sameMark(stack[keep]!, marks[keep]!)) keep++;
    while (stack.length > keep) out += close(stack.pop()!);
    for (const m of marks.slice(keep)) {
      out += m.type === 'link' ? '[' : DELIMS[m.type]!;
      stack.push(m);
    }
    out += s.br ? '\\\n' : escapeText(s.text, inTable);
  }
  while (stack.length) out += close(stack.pop()!);
  return out;
}

function indent(text: string, first: string, rest: string): string {
  return text
    .split('\n')
    .map((line, i) => (i === 0 ? first + line : line ? rest + line : line))
    .join('\n');
}

function quote(text: string): string {
  return text
    .split('\n')
    .map((line) => (line ? `> ${line}` : '>'))
    .join('\n');
}

function stillMd(a: StillAttrs): string {
  const alt = escapeText(String(a.alt ?? ''));
  const caption = typeof a.caption === 'string' && a.caption.trim() ? ` ${quoteTitle(a.caption.trim())}` : '';
  return `![${alt}](${encodeHref(a.src)}${caption})`;
}

function attrString(attrs: Record<string, string>): string {
  return Object.entries(attrs)
    .map(([k, v]) => ` ${k}="${v}"`)
    .join('');
}

class MdWriter {
  private stepNumber = 0;

  constructor(private readonly ctx: RenderContext) {}

  blocks(nodes: readonly JSONContent[] | undefined, tight = false): string {
    return (nodes ?? [])
      .map((n) => this.block(n))
      .filter((s): s is string => s !== null && s !== '')
      .join(tight ? '\n' : '\n\n');
  }

  private block(n: JSONContent): string | null {
    switch (n.type) {
      case 'paragraph':
        return escapeLineStarts(inlineMd(n.content));
      case 'heading': {
        const text = inlineMd(n.content);
        const level = [1, 2, 3].includes(n.attrs?.level as number) ? (n.attrs!.level as number) : 2;
        return text ? `${'#'.repeat(level)} ${text}` : null;
      }
      case 'bulletList':
      case 'orderedList':
        return this.list(n);
      case 'blockquote':
        return quote(this.blocks(n.content));
      case 'horizontalRule':
        return '---';
      case 'still': {
        const a = n.attrs as StillAttrs | undefined;
        return a && isSafeImageSrc(a.src) ? stillMd(a) : null;
      }
      case 'tip':
      case 'caution': {
        const label = `**${CALLOUT_LABELS[n.type]}:**`;
        const [first, ...rest] = n.content ?? [];
        const head = first?.type === 'paragraph' && inlineMd(first.content) ? `${label} ${inlineMd(first.content)}` : label;
        const body = first?.type === 'paragraph' ? rest : (n.content ?? []);
        return quote([head, this.blocks(body)].filter(Boolean).join('\n\n'));
      }
      case 'step':
        return this.step(n);
      case 'cutList':
        return this.cutList((n.attrs?.units as CutListUnits) ?? 'both');
      case 'supplyList':
        return this.supplies(n.attrs?.grouped !== false);
      default:
        return null;
    }
  }

  private list(n: JSONContent): string {
    const items = (n.content ?? []).filter((i) => i.type === 'listItem');
    // Tight when every item is one paragraph, perhaps with a nested list after it.
    const tight = items.every((i) => (i.content ?? []).every((b, k) => (k === 0 ? b.type === 'paragraph' : b.type === 'bulletList' || b.type === 'orderedList')));
    const start = n.type === 'orderedList' && Number.isInteger(n.attrs?.start) ? (n.attrs!.start as number) : 1;
    return items
      .map((item, k) => {
        const marker = n.type === 'orderedList' ? `${start + k}. ` : '- ';
        const body = this.blocks(item.content, tight) || '';
        return indent(body, marker, ' '.repeat(marker.length));
      })
      .join(tight ? '\n' : '\n\n');
  }

  private step(n: JSONContent): string {
    const number = ++this.stepNumber;
    const [first, ...rest] = n.content ?? [];
    const hasTitle = first?.type === 'stepTitle';
    const title = hasTitle ? plainText(first).replace(/\s+/g, ' ').trim() : '';
    const parts = [`### Step ${number}${title ? `: ${escapeText(title)}` : ''}`];
    const body = this.blocks(hasTitle ? rest : n.content);
    if (body) parts.push(body);
    const atMs = n.attrs?.atMs;
    if (typeof atMs === 'number' && Number.isFinite(atMs) && atMs >= 0) {
      const link = timeLink(atMs, this.ctx.videoUrl);
      parts.push(link.href ? `[${link.label}](${encodeHref(link.href)})` : link.label);
    }
    return parts.join('\n\n');
  }

  private cutList(units: CutListUnits): string {
    const show = (CUT_LIST_UNITS as readonly string[]).includes(units) ? units : 'both';
    const parts = [`<!-- cut-list${attrString({ units: show })} -->`];
    const pieces = this.ctx.pieces ?? [];
    if (pieces.length) {
      const withScores = pieces.some((p) => p.scoreLines?.length);
      const withNotes = pieces.some((p) => p.notes?.trim());
      const head = ['Piece', 'Material', 'Qty', 'Size', ...(withScores ? ['Score lines'] : []), ...(withNotes ? ['Notes'] : [])];
      const cell = (s: string) => escapeText(s, true);
      const size = (p: RenderPiece) => (show === 'mm' ? mmSize(p) : show === 'in' ? inchSize(p) : `${inchSize(p)} (${mmSize(p)})`);
      const rows = pieces.map((p) => {
        const cells = [p.name, p.material, String(p.quantity), size(p)];
        if (withScores) cells.push((p.scoreLines ?? []).join(', '));
        if (withNotes) cells.push(p.notes?.trim() ?? '');
        return `| ${cells.map(cell).join(' | ')} |`;
      });
      parts.push([`| ${head.join(' | ')} |`, `| ${head.map(() => '---').join(' | ')} |`, ...rows].join('\n'));
      if (this.ctx.precision && show !== 'mm') parts.push(`Inch sizes are given to the nearest 1/${this.ctx.precision} in; millimetres to 0.1 mm.`);
    }
    parts.push('<!-- /cut-list -->');
    return parts.join('\n\n');
  }

  private supplies(grouped: boolean): string {
    const parts = [`<!-- supplies${attrString({ grouped: String(grouped) })} -->`];
    const supplies = this.ctx.supplies ?? [];
    if (supplies.length) {
      const line = (s: (typeof supplies)[number]) => {
        const d = supplyDetails(s);
        const name = s.url && isSafeLinkHref(s.url) ? `[${escapeText(s.name)}](${encodeHref(s.url)})` : escapeText(s.name);
        return `- ${name}${escapeText(d.quantity + d.note)}${d.code ? ` (discount code **${escapeText(d.code)}**)` : ''}`;
      };
      if (supplies.some((s) => s.sponsored && s.url && isSafeLinkHref(s.url))) parts.push(`*${escapeText(this.ctx.disclosure?.trim() || DEFAULT_DISCLOSURE)}*`);
      if (grouped) for (const g of groupSupplies(supplies)) parts.push(`**${escapeText(g.label)}**`, g.items.map(line).join('\n'));
      else parts.push(supplies.map(line).join('\n'));
    }
    parts.push('<!-- /supplies -->');
    return parts.join('\n\n');
  }
}

/**
 * The write-up as Markdown (CommonMark with GFM tables), the live lists filled from `ctx`
 * like the HTML renderer. `markdownToDoc` reads it back to the same document.
 */
export function docToMarkdown(doc: JSONContent, ctx: RenderContext = {}): string {
  if (!doc || doc.type !== 'doc') return '';
  const text = new MdWriter(ctx).blocks(doc.content);
  return text ? `${text}\n` : '';
}

// ---------------------------------------------------------------- reading

// html: true only so the comment markers arrive as tokens; every other HTML token is dropped.
const md = new MarkdownIt({ html: true, linkify: false, typographer: false });

interface TreeNode {
  type: string;
  token: Token;
  children: TreeNode[];
}

function buildTree(tokens: Token[]): TreeNode[] {
  const root: TreeNode[] = [];
  const stack: TreeNode[][] = [root];
  for (const t of tokens) {
    const here = stack[stack.length - 1]!;
    if (t.nesting === 1) {
      const node: TreeNode = { type: t.type.replace(/_open$/, ''), token: t, children: [] };
      here.push(node);
      stack.push(node.children);
    } else if (t.nesting === -1) {
      if (stack.length > 1) stack.pop();
    } else here.push({ type: t.type, token: t, children: [] });
  }
  return root;
}

const MARKER = /^<!--\s*(\/?)(cut-list|supplies)\b([^>]*?)\s*-->\s*$/;
const STEP_HEADING = /^Step\s+\d+\s*(?:[:.)\u2013\u2014-]\s*([\s\S]*))?$/i;
const TEXT_MARKS: Record<string, string> = { strong: 'bold', em: 'italic', s: 'strike' };

type Context = 'doc' | 'step' | 'callout' | 'listItem' | 'blockquote';

function text(t: string, marks: Mark[]): JSONContent {
  return marks.length ? { type: 'text', text: t, marks: marks.map((m) => ({ ...m })) } : { type: 'text', text: t };
}

/** Inline tokens to Tiptap inline nodes; images come out separately as stills. */
function readInline(tokens: Token[] | null): { inline: JSONContent[]; stills: JSONContent[] } {
  const inline: JSONContent[] = [];
  const stills: JSONContent[] = [];
  const marks: (Mark | null)[] = [];
  const live = () => marks.filter((m): m is Mark => m !== null);
  const push = (t: string) => {
    if (!t) return;
    const node = text(t, live());
    const prev = inline[inline.length - 1];
    if (prev?.type === 'text' && JSON.stringify(prev.marks ?? []) === JSON.stringify(node.marks ?? [])) prev.text += t;
    else inline.push(node);
  };
  for (const t of tokens ?? []) {
    if (t.type === 'text' || t.type === 'code_inline') push(t.content);
    else if (t.type === 'softbreak') push(' ');
    else if (t.type === 'hardbreak') inline.push({ type: 'hardBreak' });
    else if (t.type === 'link_open') {
      const href = t.attrGet('href');
      const title = t.attrGet('title');
      marks.push(isSafeLinkHref(href) ? { type: 'link', attrs: title ? { href, title } : { href } } : null);
    } else if (t.type === 'link_close') marks.pop();
    else if (t.type.endsWith('_open') && TEXT_MARKS[t.type.slice(0, -5)]) marks.push({ type: TEXT_MARKS[t.type.slice(0, -5)]! });
    else if (t.type.endsWith('_close') && TEXT_MARKS[t.type.slice(0, -6)]) marks.pop();
    else if (t.type === 'image') {
      const src = t.attrGet('src');
      if (isSafeImageSrc(src)) {
        const alt = (t.children ?? []).map((c) => (c.type === 'text' || c.type === 'code_inline' ? c.content : c.type === 'softbreak' ? ' ' : '')).join('');
        const attrs: StillAttrs = { stillId: null, src, alt, caption: String(t.attrGet('title') ?? ''), width: null, height: null };
        stills.push({ type: 'still', attrs: { ...attrs } });
      }
    }
    // html_inline and anything else: dropped, never passed on as markup.
  }
  // Spaces left at the ends by dropped images or markup.
  const first = inline[0];
  if (first?.type === 'text') first.text = first.text!.replace(/^\s+/, '');
  const last = inline[inline.length - 1];
  if (last?.type === 'text') last.text = last.text!.replace(/\s+$/, '');
  return { inline: inline.filter((n) => n.type !== 'text' || n.text), stills };
}

function paragraph(inline: JSONContent[]): JSONContent {
  return inline.length ? { type: 'paragraph', content: inline } : { type: 'paragraph' };
}

class MdReader {
  private skipping: string | null = null;

  /** Top level: steps, headings, the live-list markers. */
  doc(nodes: TreeNode[]): JSONContent[] {
    const out: JSONContent[] = [];
    let step: JSONContent | null = null;
    for (const n of nodes) {
      if (n.type === 'html_block') {
        const m = MARKER.exec(n.token.content.trim());
        if (!m) continue;
        const [, closing, kind, rest] = m;
        if (closing) {
          if (this.skipping === kind) this.skipping = null;
          continue;
        }
        if (this.skipping) continue;
        step = null;
        this.skipping = kind!;
        const attr = (name: string) => new RegExp(`${name}="([^"]*)"`).exec(rest ?? '')?.[1];
        if (kind === 'cut-list') {
          const units = attr('units');
          out.push({ type: 'cutList', attrs: { units: (CUT_LIST_UNITS as readonly string[]).includes(units ?? '') ? units : 'both' } });
        } else out.push({ type: 'supplyList', attrs: { grouped: attr('grouped') !== 'false' } });
        continue;
      }
      if (this.skipping) continue;
      if (n.type === 'heading') {
        const title = readInline(n.children[0]?.token.children ?? null).inline.map(plainText).join('').trim();
        const s = STEP_HEADING.exec(title);
        if (s) {
          step = { type: 'step', attrs: { atMs: null, chapterId: null }, content: [{ type: 'stepTitle', content: s[1]?.trim() ? [{ type: 'text', text: s[1].trim() }] : [] }] };
          out.push(step);
          continue;
        }
        step = null;
      }
      if (n.type === 'hr') step = null;
      if (step) {
        const atMs = this.timeLine(n);
        if (atMs !== null) step.attrs!.atMs = atMs;
        else step.content!.push(...this.block(n, 'step'));
      } else out.push(...this.block(n, 'doc'));
    }
    for (const n of out) if (n.type === 'step' && !n.content![0]!.content!.length) delete n.content![0]!.content;
    return out;
  }

  /** "Watch at 3:12", plain or as a link, read as the step's time. */
  private timeLine(n: TreeNode): number | null {
    if (n.type !== 'paragraph') return null;
    const inline = readInline(n.children[0]?.token.children ?? null).inline;
    const words = inline.map(plainText).join('').trim();
    const m = TIME_LINE.exec(words);
    if (!m) return null;
    const links = new Set(inline.map((i) => i.marks?.find((k) => k.type === 'link')?.attrs?.href ?? null));
    if (links.size > 1) return null;
    return parseTimestamp(m[1]!);
  }

  blocks(nodes: TreeNode[], ctx: Context): JSONContent[] {
    return nodes.flatMap((n) => this.block(n, ctx));
  }

  private block(n: TreeNode, ctx: Context): JSONContent[] {
    const inlineOf = (node: TreeNode) => readInline(node.children[0]?.token.children ?? null);
    switch (n.type) {
      case 'paragraph': {
        const { inline, stills } = inlineOf(n);
        const out = inline.length ? [paragraph(inline)] : [];
        return ctx === 'callout' ? out : [...out, ...stills];
      }
      case 'heading': {
        const { inline } = inlineOf(n);
        if (!inline.length) return [];
        // Headings live only at the top level and in quotes; elsewhere the words stay, in bold.
        if (ctx === 'doc' || ctx === 'blockquote') return [{ type: 'heading', attrs: { level: Math.min(3, Number(n.token.tag.slice(1)) || 2) }, content: inline }];
        return [paragraph(inline.map((i) => ({ ...i, marks: [...(i.marks ?? []).filter((m) => m.type !== 'bold'), { type: 'bold' }] })))];
      }
      case 'bullet_list':
      case 'ordered_list': {
        const items = n.children
          .filter((c) => c.type === 'list_item')
          .map((c) => {
            const content = this.blocks(c.children, 'listItem');
            if (content[0]?.type !== 'paragraph') content.unshift({ type: 'paragraph' });
            return { type: 'listItem', content };
          });
        if (!items.length) return [];
        if (n.type === 'bullet_list') return [{ type: 'bulletList', content: items }];
        const start = Number(n.token.attrGet('start') ?? 1);
        return [{ type: 'orderedList', attrs: { start: Number.isInteger(start) && start >= 0 && start <= 100_000 ? start : 1, type: null }, content: items }];
      }
      case 'blockquote':
        return this.quote(n, ctx);
      case 'hr':
        return ctx === 'callout' ? [] : [{ type: 'horizontalRule' }];
      case 'table':
        // No table node in the write-up (the cut list is the table): rows become lines of text.
        return this.tableRows(n).map((cells) => paragraph(cells.flatMap((c, i) => (i ? [{ type: 'text', text: ' | ' }, ...c] : c))));
      case 'fence':
      case 'code_block': {
        const lines = n.token.content.replace(/\n$/, '').split('\n');
        const inline = lines.flatMap((l, i) => [...(i ? [{ type: 'hardBreak' }] : []), ...(l ? [{ type: 'text', text: l }] : [])]);
        return inline.some((i) => i.type === 'text') ? [paragraph(inline)] : [];
      }
      default:
        // html_block and anything unknown: dropped.
        return [];
    }
  }

  private tableRows(n: TreeNode): JSONContent[][][] {
    const rows: JSONContent[][][] = [];
    const walk = (t: TreeNode) => {
      if (t.type === 'tr') rows.push(t.children.filter((c) => c.type === 'th' || c.type === 'td').map((c) => readInline(c.children[0]?.token.children ?? null).inline));
      else t.children.forEach(walk);
    };
    walk(n);
    return rows.filter((r) => r.some((c) => c.length));
  }

  private quote(n: TreeNode, ctx: Context): JSONContent[] {
    const [first] = n.children;
    if ((ctx === 'doc' || ctx === 'step') && first?.type === 'paragraph') {
      // markdown-it leaves empty text tokens around delimiters.
      const tokens = (first.children[0]?.token.children ?? []).filter((t) => !(t.type === 'text' && t.content === ''));
      const kind = this.calloutKind(tokens);
      if (kind) {
        const { inline } = readInline(tokens.slice(3));
        // "**Tip**: text" as well as "**Tip:** text".
        if (inline[0]?.type === 'text' && !inline[0].marks) inline[0].text = inline[0].text!.replace(/^:\s*/, '');
        if (inline[0]?.type === 'text' && !inline[0].text) inline.shift();
        const content = [...(inline.length ? [paragraph(inline)] : []), ...this.blocks(n.children.slice(1), 'callout')];
        return [{ type: kind, content: content.length ? content : [{ type: 'paragraph' }] }];
      }
    }
    if (ctx === 'callout') return this.blocks(n.children, 'callout');
    const content = this.blocks(n.children, 'blockquote');
    return content.length ? [{ type: 'blockquote', content }] : [];
  }

  /** "**Tip:**" or "**Caution:**" opening a quote. */
  private calloutKind(tokens: Token[]): 'tip' | 'caution' | null {
    const [open, label, close] = tokens;
    if (open?.type !== 'strong_open' || label?.type !== 'text' || close?.type !== 'strong_close') return null;
    const word = label.content.trim().replace(/:$/, '').toLowerCase();
    return word === 'tip' || word === 'caution' ? word : null;
  }
}

/**
 * Reads Markdown into a write-up document (see the conventions at the top of this file).
 * Raw HTML is dropped, unsafe links lose their address, unsafe images are left out; the
 * result passes `validateDoc`.
 */
export function markdownToDoc(markdown: string): JSONContent {
  const tree = buildTree(md.parse(String(markdown ?? ''), {}));
  const content = new MdReader().doc(tree);
  const result = validateDoc({ type: 'doc', content: content.length ? content : [{ type: 'paragraph' }] }, { strip: true });
  if (!result.ok) throw new Error(`Markdown did not fit the write-up schema: ${result.error}`);
  return result.doc;
}
