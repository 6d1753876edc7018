/**
 * Markdown out and in through prosemirror-markdown, with conventions of our own for the nodes
 * Markdown lacks:
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
 * Writing: a `MarkdownSerializer` with a serializer for each of our nodes. Reading: markdown-it
 * tokenizes, one core rule of ours (`writeUpRule`) turns our conventions into tokens of our own
 * (step, tip, still, cut_list ...) and drops what the write-up cannot hold (raw HTML, unsafe
 * addresses), and a `MarkdownParser` maps every token to the write-up's schema. Pure: runs in
 * the browser as well as on the server.
 */
import type { JSONContent } from '@tiptap/core';
import { Node as PMNode } from '@tiptap/pm/model';
import MarkdownIt from 'markdown-it';
import type { StateCore, Token } from 'markdown-it';
import { MarkdownParser, MarkdownSerializer, type MarkdownSerializerState } from 'prosemirror-markdown';
import { parseTimestamp } from '../transcript/timestamp';
import { getEditorSchema } from './extensions';
import { CALLOUT_LABELS, DEFAULT_DISCLOSURE, groupSupplies, inchSize, mmSize, sponsoredTag, supplyDetails, timeLink, TIME_LINE } from './render-parts';
import { CUT_LIST_UNITS, type CutListUnits, type RenderContext, type RenderPiece, type StillAttrs } from './types';
import { isSafeImageSrc, isSafeLinkHref } from './urls';
import { validateDoc } from './validate-doc';

// ---------------------------------------------------------------- writing

/** Besides prosemirror-markdown's own escapes: raw HTML and character references must stay words. */
const ESCAPE_EXTRA = /<|&(?=#?[a-z0-9]+;)/gi;

/** Text we build ourselves (table cells, supply lines) escaped like the serializer's text. */
function escapeText(s: string, inTable = false): string {
  let out = s
    .replace(/\n/g, ' ')
    .replace(/[\\`*_[\]<~]/g, '\\$&')
    .replace(/&(?=#?[a-z0-9]+;)/gi, '\\&');
  if (inTable) out = out.replace(/\|/g, '\\|');
  return out;
}

// Characters that would start a block at the start of a line (after a hard break).
function escapeLineStart(s: string): string {
  return s.replace(/^([#>+=-])/, '\\$1').replace(/^(\d+)([.)])/, '$1\\$2');
}

/**
 * A link address as a Markdown destination, or null when it must go. A Markdown reader decodes
 * character references and backslash escapes in a destination ("javascript&colon;x" becomes
 * "javascript:x"), which HTML-escaping never did, so the address is checked again as a reader
 * would see it; what is left is written so that every reader sees the same text: spaces,
 * brackets, backslashes and the "&" of anything that looks like a character reference are percent-encoded.
 */
function markdownHref(href: unknown): string | null {
  if (!isSafeLinkHref(href) || !isSafeLinkHref(tokenizer.utils.unescapeAll(href))) return null;
  return encodeHref(href);
}

function encodeHref(href: string): string {
  // "&#58" needs no ";" for a browser reading an attribute, so every "&#" goes.
  return href.replace(/[ ()<>\\]|&(?=#|[a-z0-9]+;)/gi, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
}

function quoteTitle(t: string): string {
  return `"${t
    .replace(/\n/g, ' ')
    .replace(/[\\"]/g, '\\$&')
    .replace(/&(?=#?[a-z0-9]+;)/gi, '\\&')}"`;
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

/** Tight when every item is one paragraph, perhaps with a nested list after it. */
function isTight(list: PMNode): boolean {
  let tight = true;
  list.forEach((item) =>
    item.forEach((b, _, k) => {
      if (k === 0 ? b.type.name !== 'paragraph' : b.type.name !== 'bulletList' && b.type.name !== 'orderedList') tight = false;
    }),
  );
  return tight;
}

/**
 * Whether a list follows a list of its own kind that used the usual marker: it then takes the
 * other one ("*" for "-", ")" for "."), since a new marker is what starts a new list in CommonMark.
 */
function afterSameList(parent: PMNode, index: number): boolean {
  let run = 0;
  for (let i = index - 1; i >= 0 && parent.child(i).type === parent.child(index).type; i--) run++;
  return run % 2 === 1;
}

/** A list, tight or loose by its content (our list nodes carry no `tight` attribute). */
function renderList(state: MarkdownSerializerState, node: PMNode, delim: string, firstDelim: (i: number) => string): void {
  const before = state.options.tightLists;
  state.options.tightLists = isTight(node);
  state.renderList(node, delim, firstDelim);
  state.options.tightLists = before;
}

/** The cut list between its markers, filled from the context as a GFM table. */
function cutListMd(ctx: RenderContext, units: CutListUnits): string {
  const show = (CUT_LIST_UNITS as readonly string[]).includes(units) ? units : 'both';
  const parts = [`<!-- cut-list${attrString({ units: show })} -->`];
  const pieces = ctx.pieces ?? [];
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
    if (ctx.precision && show !== 'mm') parts.push(`Inch sizes are given to the nearest 1/${ctx.precision} in; millimetres to 0.1 mm.`);
  }
  parts.push('<!-- /cut-list -->');
  return parts.join('\n\n');
}

/** The supplies between their markers, with the disclosure when a link is sponsored. */
function suppliesMd(ctx: RenderContext, grouped: boolean): string {
  const parts = [`<!-- supplies${attrString({ grouped: String(grouped) })} -->`];
  const supplies = ctx.supplies ?? [];
  if (supplies.length) {
    const line = (s: (typeof supplies)[number]) => {
      const d = supplyDetails(s);
      const href = markdownHref(s.url);
      const name = href ? `[${escapeText(s.name)}](${href})` : escapeText(s.name);
      return `- ${name}${escapeText(sponsoredTag(s) + d.quantity + d.note)}${d.code ? ` (discount code **${escapeText(d.code)}**)` : ''}`;
    };
    if (supplies.some((s) => s.sponsored && s.url && isSafeLinkHref(s.url))) parts.push(`*${escapeText(ctx.disclosure?.trim() || DEFAULT_DISCLOSURE)}*`);
    if (grouped) for (const g of groupSupplies(supplies)) parts.push(`**${escapeText(g.label)}**`, g.items.map(line).join('\n'));
    else parts.push(supplies.map(line).join('\n'));
  }
  parts.push('<!-- /supplies -->');
  return parts.join('\n\n');
}

/** A serializer for one export: steps are numbered as they come, the live lists filled from `ctx`. */
function writeUpSerializer(ctx: RenderContext): MarkdownSerializer {
  let stepNumber = 0;
  const block = (state: MarkdownSerializerState, node: PMNode, text: string) => {
    state.write();
    state.text(text, false);
    state.closeBlock(node);
  };
  const callout = (state: MarkdownSerializerState, node: PMNode) => {
    state.wrapBlock('> ', null, node, () => {
      state.write(`**${CALLOUT_LABELS[node.type.name as keyof typeof CALLOUT_LABELS]}:**`);
      const first = node.firstChild;
      const head = first?.type.name === 'paragraph' && first.content.size > 0;
      if (head) {
        state.write(' ');
        state.renderInline(first, false);
      }
      state.closeBlock(head ? first : node);
      node.forEach((child, _, i) => {
        if (i > 0 || (first?.type.name !== 'paragraph' && child === first)) state.render(child, node, i);
      });
    });
  };
  return new MarkdownSerializer(
    {
      paragraph(state, node) {
        state.renderInline(node);
        state.closeBlock(node);
      },
      heading(state, node) {
        if (!node.textContent.trim()) return;
        const level = [1, 2, 3].includes(node.attrs.level as number) ? (node.attrs.level as number) : 2;
        state.write(`${state.repeat('#', level)} `);
        state.renderInline(node, false);
        state.closeBlock(node);
      },
      blockquote(state, node) {
        state.wrapBlock('> ', null, node, () => state.renderContent(node));
      },
      bulletList(state, node, parent, index) {
        const bullet = afterSameList(parent, index) ? '*' : '-';
        renderList(state, node, '  ', () => `${bullet} `);
      },
      orderedList(state, node, parent, index) {
        const start = Number.isInteger(node.attrs.start) ? (node.attrs.start as number) : 1;
        const width = String(start + node.childCount - 1).length;
        const delim = afterSameList(parent, index) ? ')' : '.';
        renderList(state, node, ' '.repeat(width + 2), (i) => `${start + i}${delim} `);
      },
      listItem(state, node) {
        state.renderContent(node);
      },
      horizontalRule(state, node) {
        block(state, node, '---');
      },
      hardBreak(state, node, parent, index) {
        // A break at the end of a block would swallow the blank line after it: dropped.
        for (let i = index + 1; i < parent.childCount; i++)
          if (parent.child(i).type !== node.type) {
            state.write('\\\n');
            return;
          }
      },
      text(state, node, parent, index) {
        const text = (node.text ?? '').replace(/\n/g, ' ');
        // After a hard break the words start a line: keep them from opening a block.
        if (index > 0 && parent.child(index - 1).type.name === 'hardBreak') state.text(escapeLineStart(state.esc(text)), false);
        else state.text(text);
      },
      still(state, node) {
        const a = node.attrs as StillAttrs;
        if (isSafeImageSrc(a.src)) block(state, node, stillMd(a));
      },
      tip: callout,
      caution: callout,
      step(state, node) {
        const number = ++stepNumber;
        const first = node.firstChild;
        const title = first?.type.name === 'stepTitle' ? first.textContent.replace(/\s+/g, ' ').trim() : '';
        block(state, node, `### Step ${number}${title ? `: ${escapeText(title)}` : ''}`);
        node.forEach((child, _, i) => {
          if (child.type.name !== 'stepTitle') state.render(child, node, i);
        });
        const atMs = node.attrs.atMs;
        if (typeof atMs === 'number' && Number.isFinite(atMs) && atMs >= 0) {
          const link = timeLink(atMs, ctx.videoUrl);
          const href = markdownHref(link.href);
          block(state, node, href ? `[${link.label}](${href})` : link.label);
        }
      },
      stepTitle() {
        // Written by its step, as the heading.
      },
      cutList(state, node) {
        block(state, node, cutListMd(ctx, (node.attrs.units as CutListUnits) ?? 'both'));
      },
      supplyList(state, node) {
        block(state, node, suppliesMd(ctx, node.attrs.grouped !== false));
      },
    },
    {
      bold: { open: '**', close: '**', mixable: true, expelEnclosingWhitespace: true },
      italic: { open: '*', close: '*', mixable: true, expelEnclosingWhitespace: true },
      strike: { open: '~~', close: '~~', mixable: true, expelEnclosingWhitespace: true },
      link: {
        open: (_s, mark) => (markdownHref(mark.attrs.href) ? '[' : ''),
        close: (_s, mark) => {
          const href = markdownHref(mark.attrs.href);
          return href ? `](${href}${mark.attrs.title ? ` ${quoteTitle(String(mark.attrs.title))}` : ''})` : '';
        },
      },
    },
    { escapeExtraCharacters: ESCAPE_EXTRA, hardBreakNodeName: 'hardBreak', strict: false },
  );
}

/**
 * The write-up as Markdown (CommonMark with GFM tables), the live lists filled from `ctx`
 * like the HTML renderer. `markdownToDoc` reads it back to the same document.
 */
export function docToMarkdown(doc: JSONContent, ctx: RenderContext = {}): string {
  if (!doc || doc.type !== 'doc') return '';
  const checked = validateDoc(doc, { strip: true });
  if (!checked.ok) return '';
  const text = writeUpSerializer(ctx).serialize(PMNode.fromJSON(getEditorSchema(), checked.doc)).replace(/\s+$/, '');
  return text ? `${text}\n` : '';
}

// ---------------------------------------------------------------- reading

/** A token tree: markdown-it's open/close pairs as nodes with children. */
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
const MARK_TOKENS = new Set(['strong', 'em', 's']);

type Context = 'doc' | 'step' | 'callout' | 'listItem' | 'blockquote';

/** Builds the token stream the parser maps to the write-up's schema (see `TOKENS`). */
class TokenWriter {
  readonly out: Token[] = [];
  private skipping: string | null = null;

  constructor(private readonly state: StateCore) {}

  private token(type: string, nesting: -1 | 0 | 1, meta?: Record<string, unknown>): Token {
    const t = new this.state.Token(type, '', nesting);
    if (meta) t.meta = meta;
    return t;
  }

  private inlineToken(children: Token[]): Token {
    const t = this.token('inline', 0);
    t.children = children;
    t.content = '';
    return t;
  }

  private textToken(content: string): Token {
    const t = this.token('text', 0);
    t.content = content;
    return t;
  }

  private paragraph(into: Token[], children: Token[]): void {
    into.push(this.token('paragraph_open', 1), this.inlineToken(children), this.token('paragraph_close', -1));
  }

  /**
   * Inline tokens the write-up can hold: words, breaks, bold, italic, strike and safe links.
   * Images come out separately as stills; raw HTML, unsafe links' marks and code marks go.
   */
  private inline(tokens: readonly Token[] | null): { inline: Token[]; stills: Token[] } {
    const inline: Token[] = [];
    const stills: Token[] = [];
    const links: boolean[] = [];
    for (const t of tokens ?? []) {
      if (t.type === 'text' || t.type === 'code_inline') {
        if (t.content) inline.push(this.textToken(t.content));
      } else if (t.type === 'softbreak') inline.push(this.textToken(' '));
      else if (t.type === 'hardbreak') inline.push(t);
      else if (t.type === 'link_open') {
        const safe = isSafeLinkHref(t.attrGet('href'));
        links.push(safe);
        if (safe) inline.push(t);
      } else if (t.type === 'link_close') {
        if (links.pop()) inline.push(t);
      } else if (MARK_TOKENS.has(t.type.replace(/_(open|close)$/, ''))) inline.push(t);
      else if (t.type === 'image') {
        const src = t.attrGet('src');
        if (isSafeImageSrc(src)) {
          const alt = (t.children ?? []).map((c) => (c.type === 'text' || c.type === 'code_inline' ? c.content : c.type === 'softbreak' ? ' ' : '')).join('');
          const attrs: StillAttrs = { stillId: null, src, alt, caption: String(t.attrGet('title') ?? ''), width: null, height: null };
          stills.push(this.token('still', 0, { ...attrs }));
        }
      }
      // html_inline and anything else: dropped, never passed on as markup.
    }
    // Spaces left at the ends by dropped images or markup.
    const words = inline.filter((t) => t.type === 'text' || t.type === 'hardbreak');
    const first = words[0];
    if (first?.type === 'text') first.content = first.content.replace(/^\s+/, '');
    const last = words[words.length - 1];
    if (last?.type === 'text') last.content = last.content.replace(/\s+$/, '');
    const kept = inline.filter((t) => t.type !== 'text' || t.content);
    return { inline: kept.some((t) => t.type === 'text' || t.type === 'hardbreak') ? kept : [], stills };
  }

  private inlineOf(n: TreeNode) {
    return this.inline(n.children[0]?.token.children ?? null);
  }

  private plainWords(tokens: readonly Token[]): string {
    return tokens
      .map((t) => (t.type === 'text' ? t.content : t.type === 'hardbreak' ? ' ' : ''))
      .join('')
      .trim();
  }

  /** Top level: steps, headings, the live-list markers. */
  doc(nodes: TreeNode[]): void {
    let step: Token | null = null;
    const closeStep = () => {
      if (step) this.out.push(this.token('step_close', -1));
      step = null;
    };
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
        closeStep();
        this.skipping = kind!;
        const attr = (name: string) => new RegExp(`${name}="([^"]*)"`).exec(rest ?? '')?.[1];
        if (kind === 'cut-list') {
          const units = attr('units');
          this.out.push(this.token('cut_list', 0, { units: (CUT_LIST_UNITS as readonly string[]).includes(units ?? '') ? units : 'both' }));
        } else this.out.push(this.token('supply_list', 0, { grouped: attr('grouped') !== 'false' }));
        continue;
      }
      if (this.skipping) continue;
      if (n.type === 'heading') {
        const s = STEP_HEADING.exec(this.plainWords(this.inlineOf(n).inline));
        closeStep();
        if (s) {
          step = this.token('step_open', 1, { atMs: null, chapterId: null });
          const title = s[1]?.trim();
          this.out.push(step, this.token('step_title_open', 1), this.inlineToken(title ? [this.textToken(title)] : []), this.token('step_title_close', -1));
          continue;
        }
      }
      if (n.type === 'hr') closeStep();
      if (step) {
        const atMs = this.timeLine(n);
        if (atMs !== null) ((step as Token).meta as Record<string, unknown>).atMs = atMs;
        else this.block(n, 'step', this.out);
      } else this.block(n, 'doc', this.out);
    }
    closeStep();
  }

  /** "Watch at 3:12", plain or as one link, read as the step's time. */
  private timeLine(n: TreeNode): number | null {
    if (n.type !== 'paragraph') return null;
    const inline = this.inlineOf(n).inline;
    const m = TIME_LINE.exec(this.plainWords(inline));
    if (!m) return null;
    if (inline.filter((t) => t.type === 'link_open').length > 1) return null;
    const linked = inline.some((t) => t.type === 'link_open');
    // Words outside the one link would make it a sentence, not the time line.
    if (linked && (inline[0]?.type !== 'link_open' || inline[inline.length - 1]?.type !== 'link_close')) return null;
    return parseTimestamp(m[1]!);
  }

  private blocks(nodes: TreeNode[], ctx: Context, into: Token[]): void {
    for (const n of nodes) this.block(n, ctx, into);
  }

  private block(n: TreeNode, ctx: Context, into: Token[]): void {
    switch (n.type) {
      case 'paragraph': {
        const { inline, stills } = this.inlineOf(n);
        if (inline.length) this.paragraph(into, inline);
        if (ctx !== 'callout') into.push(...stills);
        return;
      }
      case 'heading': {
        const { inline } = this.inlineOf(n);
        if (!inline.length) return;
        // Headings live only at the top level and in quotes; elsewhere the words stay, in bold.
        if (ctx === 'doc' || ctx === 'blockquote') {
          const level = Math.min(3, Number(n.token.tag.slice(1)) || 2);
          into.push(this.token('heading_open', 1, { level }), this.inlineToken(inline), this.token('heading_close', -1));
        } else {
          const words = inline.filter((t) => t.type !== 'strong_open' && t.type !== 'strong_close');
          this.paragraph(into, [this.token('strong_open', 1), ...words, this.token('strong_close', -1)]);
        }
        return;
      }
      case 'bullet_list':
      case 'ordered_list': {
        const items = n.children.filter((c) => c.type === 'list_item');
        if (!items.length) return;
        const start = Number(n.token.attrGet('start') ?? 1);
        into.push(
          n.type === 'bullet_list'
            ? this.token('bullet_list_open', 1)
            : this.token('ordered_list_open', 1, { start: Number.isInteger(start) && start >= 0 && start <= 100_000 ? start : 1 }),
        );
        for (const item of items) {
          const content: Token[] = [];
          this.blocks(item.children, 'listItem', content);
          // A list item opens with a paragraph, if only an empty one.
          if (content[0]?.type !== 'paragraph_open') {
            const empty: Token[] = [];
            this.paragraph(empty, []);
            content.unshift(...empty);
          }
          into.push(this.token('list_item_open', 1), ...content, this.token('list_item_close', -1));
        }
        into.push(this.token(`${n.type}_close`, -1));
        return;
      }
      case 'blockquote':
        this.quote(n, ctx, into);
        return;
      case 'hr':
        if (ctx !== 'callout') into.push(this.token('hr', 0));
        return;
      case 'table':
        // No table node in the write-up (the cut list is the table): rows become lines of text.
        for (const cells of this.tableRows(n))
          this.paragraph(
            into,
            cells.flatMap((c, i) => (i ? [this.textToken(' | '), ...c] : c)),
          );
        return;
      case 'fence':
      case 'code_block': {
        const lines = n.token.content.replace(/\n$/, '').split('\n');
        const inline = lines.flatMap((l, i) => [...(i ? [this.token('hardbreak', 0)] : []), ...(l ? [this.textToken(l)] : [])]);
        if (inline.some((t) => t.type === 'text')) this.paragraph(into, inline);
        return;
      }
      default:
      // html_block and anything unknown: dropped.
    }
  }

  private tableRows(n: TreeNode): Token[][][] {
    const rows: Token[][][] = [];
    const walk = (t: TreeNode) => {
      if (t.type === 'tr') rows.push(t.children.filter((c) => c.type === 'th' || c.type === 'td').map((c) => this.inlineOf(c).inline));
      else t.children.forEach(walk);
    };
    walk(n);
    return rows.filter((r) => r.some((c) => c.length));
  }

  private quote(n: TreeNode, ctx: Context, into: Token[]): void {
    const [first] = n.children;
    if ((ctx === 'doc' || ctx === 'step') && first?.type === 'paragraph') {
      // markdown-it leaves empty text tokens around delimiters.
      const tokens = (first.children[0]?.token.children ?? []).filter((t) => !(t.type === 'text' && t.content === ''));
      const kind = this.calloutKind(tokens);
      if (kind) {
        const { inline } = this.inline(tokens.slice(3));
        // "**Tip**: text" as well as "**Tip:** text".
        if (inline[0]?.type === 'text') inline[0].content = inline[0].content.replace(/^:\s*/, '');
        if (inline[0]?.type === 'text' && !inline[0].content) inline.shift();
        const content: Token[] = [];
        if (inline.some((t) => t.type === 'text' || t.type === 'hardbreak')) this.paragraph(content, inline);
        this.blocks(n.children.slice(1), 'callout', content);
        if (!content.length) this.paragraph(content, []);
        into.push(this.token(`${kind}_open`, 1), ...content, this.token(`${kind}_close`, -1));
        return;
      }
    }
    if (ctx === 'callout') return this.blocks(n.children, 'callout', into);
    const content: Token[] = [];
    this.blocks(n.children, 'blockquote', content);
    if (content.length) into.push(this.token('blockquote_open', 1), ...content, this.token('blockquote_close', -1));
  }

  /** "**Tip:**" or "**Caution:**" opening a quote. */
  private calloutKind(tokens: Token[]): 'tip' | 'caution' | null {
    const [open, label, close] = tokens;
    if (open?.type !== 'strong_open' || label?.type !== 'text' || close?.type !== 'strong_close') return null;
    const word = label.content.trim().replace(/:$/, '').toLowerCase();
    return word === 'tip' || word === 'caution' ? word : null;
  }
}

/** The markdown-it core rule that turns our conventions into our tokens (see the top of this file). */
function writeUpRule(state: StateCore): void {
  const writer = new TokenWriter(state);
  writer.doc(buildTree(state.tokens));
  state.tokens = writer.out;
}

// html: true only so the comment markers arrive as tokens; every other HTML token is dropped.
const tokenizer = new MarkdownIt({ html: true, linkify: false, typographer: false });
tokenizer.core.ruler.push('cardwright_write_up', writeUpRule);

const meta = (t: Token) => t.meta as Record<string, unknown>;

/** Every token `writeUpRule` leaves, mapped to the write-up's nodes and marks. */
const TOKENS: ConstructorParameters<typeof MarkdownParser>[2] = {
  paragraph: { block: 'paragraph' },
  heading: { block: 'heading', getAttrs: (t) => ({ level: meta(t).level }) },
  blockquote: { block: 'blockquote' },
  bullet_list: { block: 'bulletList' },
  ordered_list: { block: 'orderedList', getAttrs: (t) => ({ start: meta(t).start, type: null }) },
  list_item: { block: 'listItem' },
  hr: { node: 'horizontalRule' },
  hardbreak: { node: 'hardBreak' },
  strong: { mark: 'bold' },
  em: { mark: 'italic' },
  s: { mark: 'strike' },
  link: { mark: 'link', getAttrs: (t) => ({ href: t.attrGet('href'), title: t.attrGet('title') || null }) },
  step: { block: 'step', getAttrs: (t) => meta(t) },
  step_title: { block: 'stepTitle' },
  tip: { block: 'tip' },
  caution: { block: 'caution' },
  still: { node: 'still', getAttrs: (t) => meta(t) },
  cut_list: { node: 'cutList', getAttrs: (t) => meta(t) },
  supply_list: { node: 'supplyList', getAttrs: (t) => meta(t) },
};

let parser: MarkdownParser | undefined;

/**
 * Reads Markdown into a write-up document (see the conventions at the top of this file).
 * Raw HTML is dropped, unsafe links lose their address, unsafe images are left out; the
 * result passes `validateDoc`.
 */
export function markdownToDoc(markdown: string): JSONContent {
  // prosemirror-markdown types its tokenizer with its own markdown-it; the parser only calls parse().
  parser ??= new MarkdownParser(getEditorSchema(), tokenizer as unknown as ConstructorParameters<typeof MarkdownParser>[1], TOKENS);
  const json = parser.parse(String(markdown ?? '')).toJSON() as JSONContent;
  const result = validateDoc(json, { strip: true });
  if (!result.ok) throw new Error(`Markdown did not fit the write-up schema: ${result.error}`);
  return result.doc;
}
