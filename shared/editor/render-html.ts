import type { JSONContent } from '@tiptap/core';
import { CALLOUT_LABELS, DEFAULT_DISCLOSURE, groupSupplies, inchSize, mmSize, plainText, sponsoredTag, supplyDetails, timeLink } from './render-parts';
import type { CutListUnits, RenderContext, RenderPiece, RenderSupply, StillAttrs } from './types';
import { isSafeImageSrc, isSafeLinkHref } from './urls';

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for HTML content and double-quoted attribute values. */
export function escapeHtml(s: string): string {
  return String(s).replace(/[&<>"']/g, (c) => ESCAPES[c]!);
}

function attrs(list: Record<string, string | number | null | undefined>): string {
  let out = '';
  for (const [k, v] of Object.entries(list)) if (v !== null && v !== undefined) out += ` ${k}="${escapeHtml(String(v))}"`;
  return out;
}

// Outermost first, so a link wraps the bold text inside it.
const MARK_RANK: Record<string, number> = { link: 0, bold: 1, italic: 2, strike: 3 };
const MARK_TAGS: Record<string, string> = { bold: 'strong', italic: 'em', strike: 's' };

type OpenMark = { key: string; close: string };

function markKey(m: { type: string; attrs?: Record<string, unknown> }): string {
  return m.type === 'link' ? `link:${String(m.attrs?.href ?? '')}` : m.type;
}

function openMark(m: { type: string; attrs?: Record<string, unknown> }): OpenMark & { open: string } {
  const key = markKey(m);
  if (m.type === 'link') {
    const href = m.attrs?.href;
    // An unsafe address keeps its text and loses the link.
    return isSafeLinkHref(href) ? { key, open: `<a${attrs({ href })}>`, close: '</a>' } : { key, open: '', close: '' };
  }
  const tag = MARK_TAGS[m.type];
  return tag ? { key, open: `<${tag}>`, close: `</${tag}>` } : { key, open: '', close: '' };
}

function renderInline(nodes: readonly JSONContent[] | undefined): string {
  let out = '';
  const stack: OpenMark[] = [];
  for (const n of nodes ?? []) {
    const marks = n.type === 'text' ? [...(n.marks ?? [])].filter((m) => m.type in MARK_RANK).sort((a, b) => MARK_RANK[a.type]! - MARK_RANK[b.type]!) : [];
    let keep = 0;
    while (keep < stack.length && keep < marks.length && stack[keep]!.key === markKey(marks[keep]!)) keep++;
    while (stack.length > keep) out += stack.pop()!.close;
    for (const m of marks.slice(keep)) {
      const o = openMark(m);
      out += o.open;
      stack.push(o);
    }
    if (n.type === 'text') out += escapeHtml(n.text ?? '');
    else if (n.type === 'hardBreak') out += '<br>';
  }
  while (stack.length) out += stack.pop()!.close;
  return out;
}

function hasText(nodes: readonly JSONContent[] | undefined): boolean {
  return (nodes ?? []).some((n) => (n.type === 'text' && (n.text ?? '').trim() !== '') || n.type === 'hardBreak');
}

class HtmlRenderer {
  private stepNumber = 0;

  constructor(private readonly ctx: RenderContext) {}

  blocks(nodes: readonly JSONContent[] | undefined): string {
    const list = nodes ?? [];
    let out = '';
    for (let i = 0; i < list.length; i++) {
      if (list[i]!.type !== 'step') {
        out += this.block(list[i]!);
        continue;
      }
      // Consecutive steps make one numbered list; a later run carries on the numbering.
      const start = this.stepNumber + 1;
      let items = '';
      while (i < list.length && list[i]!.type === 'step') items += this.step(list[i++]!);
      i--;
      out += `<ol class="cw-steps"${start > 1 ? attrs({ start }) : ''}>${items}</ol>`;
    }
    return out;
  }

  private block(n: JSONContent): string {
    switch (n.type) {
      case 'paragraph':
        return hasText(n.content) ? `<p>${renderInline(n.content)}</p>` : '';
      case 'heading': {
        if (!hasText(n.content)) return '';
        const level = [1, 2, 3].includes(n.attrs?.level as number) ? (n.attrs!.level as number) : 2;
        return `<h${level}>${renderInline(n.content)}</h${level}>`;
      }
      case 'bulletList':
        return `<ul>${this.items(n.content)}</ul>`;
      case 'orderedList': {
        const start = Number.isInteger(n.attrs?.start) && (n.attrs!.start as number) !== 1 ? (n.attrs!.start as number) : null;
        return `<ol${attrs({ start })}>${this.items(n.content)}</ol>`;
      }
      case 'blockquote':
        return `<blockquote>${this.blocks(n.content)}</blockquote>`;
      case 'horizontalRule':
        return '<hr>';
      case 'still':
        return this.still(n.attrs as StillAttrs | undefined);
      case 'tip':
      case 'caution':
        return this.callout(n.type, n.content);
      case 'cutList':
        return this.cutList(n.attrs?.units as CutListUnits | undefined);
      case 'supplyList':
        return this.supplies(n.attrs?.grouped !== false);
      case 'step':
        return this.blocks([n]);
      default:
        // Not in the schema: left out rather than guessed at.
        return '';
    }
  }

  private items(nodes: readonly JSONContent[] | undefined): string {
    return (nodes ?? [])
      .filter((n) => n.type === 'listItem')
      .map((n) => `<li>${this.blocks(n.content)}</li>`)
      .join('');
  }

  private step(n: JSONContent): string {
    const number = ++this.stepNumber;
    const [first, ...rest] = n.content ?? [];
    const hasTitle = first?.type === 'stepTitle';
    const title = (hasTitle ? plainText(first).trim() : '') || `Step ${number}`;
    let out = `<li class="cw-step" id="step-${number}"><h3>${escapeHtml(title)}</h3>${this.blocks(hasTitle ? rest : n.content)}`;
    const atMs = n.attrs?.atMs;
    if (typeof atMs === 'number' && Number.isFinite(atMs) && atMs >= 0) {
      const link = timeLink(atMs, this.ctx.videoUrl);
      if (link.href) out += `<p class="cw-step-time"><a${attrs({ href: link.href })}>${escapeHtml(link.label)}</a></p>`;
    }
    return `${out}</li>`;
  }

  private still(given: StillAttrs | undefined): string {
    if (!given) return '';
    const a = this.ctx.resolveStill ? this.ctx.resolveStill(given) : given;
    if (!a || !isSafeImageSrc(a.src)) return '';
    const size = (v: unknown) => (Number.isInteger(v) && (v as number) > 0 ? (v as number) : null);
    const img = `<img${attrs({ src: a.src, alt: typeof a.alt === 'string' ? a.alt : '', width: size(a.width), height: size(a.height), loading: 'lazy' })}>`;
    const caption = typeof a.caption === 'string' && a.caption.trim() ? `<figcaption>${escapeHtml(a.caption.trim())}</figcaption>` : '';
    return `<figure class="cw-still">${img}${caption}</figure>`;
  }

  private callout(kind: 'tip' | 'caution', content: readonly JSONContent[] | undefined): string {
    const label = `<strong>${CALLOUT_LABELS[kind]}:</strong>`;
    const [first, ...rest] = content ?? [];
    // The label opens the first paragraph, as a reader would write it ("Tip: ...").
    const body =
      first?.type === 'paragraph' && hasText(first.content)
        ? `<p>${label} ${renderInline(first.content)}</p>${this.blocks(rest)}`
        : `<p>${label}</p>${this.blocks(content)}`;
    return `<aside class="cw-${kind}">${body}</aside>`;
  }

  private cutList(units: CutListUnits | undefined): string {
    const pieces = this.ctx.pieces ?? [];
    if (!pieces.length) return '';
    const show = units === 'in' || units === 'mm' ? units : 'both';
    const withScores = pieces.some((p) => p.scoreLines?.length);
    const withNotes = pieces.some((p) => p.notes?.trim());
    const head = ['Piece', 'Material', 'Qty', 'Size', ...(withScores ? ['Score lines'] : []), ...(withNotes ? ['Notes'] : [])];
    const size = (p: RenderPiece) => {
      if (show === 'mm') return escapeHtml(mmSize(p));
      if (show === 'in') return escapeHtml(inchSize(p));
      return `${escapeHtml(inchSize(p))} <span class="cw-mm">(${escapeHtml(mmSize(p))})</span>`;
    };
    const rows = pieces.map((p) => {
      // data-label lets a narrow page show each row as a card with the column names beside the values.
      const td = (label: string, html: string) => `<td data-label="${label}">${html}</td>`;
      const cells = [
        `<th scope="row">${escapeHtml(p.name)}</th>`,
        td('Material', escapeHtml(p.material)),
        td('Qty', escapeHtml(String(p.quantity))),
        td('Size', size(p)),
      ];
      if (withScores) cells.push(td('Score lines', escapeHtml((p.scoreLines ?? []).join(', '))));
      if (withNotes) cells.push(td('Notes', escapeHtml(p.notes?.trim() ?? '')));
      return `<tr>${cells.join('')}</tr>`;
    });
    const note =
      this.ctx.precision && show !== 'mm'
        ? `<p class="cw-note">Inch sizes are given to the nearest 1/${this.ctx.precision} in; millimetres to 0.1 mm.</p>`
        : '';
    return `<div class="cw-cut-list"><table><thead><tr>${head.map((h) => `<th scope="col">${h}</th>`).join('')}</tr></thead><tbody>${rows.join('')}</tbody></table>${note}</div>`;
  }

  private supplies(grouped: boolean): string {
    const supplies = this.ctx.supplies ?? [];
    if (!supplies.length) return '';
    const item = (s: RenderSupply) => {
      const d = supplyDetails(s);
      const rel = s.sponsored ? 'sponsored noopener' : null;
      const name = s.url && isSafeLinkHref(s.url) ? `<a${attrs({ href: s.url, rel })}>${escapeHtml(s.name)}</a>` : escapeHtml(s.name);
      const code = d.code ? ` (discount code <strong>${escapeHtml(d.code)}</strong>)` : '';
      const tag = sponsoredTag(s) ? ` <span class="cw-sponsored">${escapeHtml(sponsoredTag(s).trim())}</span>` : '';
      return `<li>${name}${tag}${escapeHtml(d.quantity + d.note)}${code}</li>`;
    };
    const sponsored = supplies.some((s) => s.sponsored && s.url && isSafeLinkHref(s.url));
    // Before the links, where a reader sees it first (FTC Endorsement Guides, 16 CFR 255: clear and conspicuous).
    let out = sponsored ? `<p class="cw-disclosure">${escapeHtml(this.ctx.disclosure?.trim() || DEFAULT_DISCLOSURE)}</p>` : '';
    if (grouped) for (const g of groupSupplies(supplies)) out += `<h3>${escapeHtml(g.label)}</h3><ul>${g.items.map(item).join('')}</ul>`;
    else out += `<ul>${supplies.map(item).join('')}</ul>`;
    return `<div class="cw-supplies">${out}</div>`;
  }
}

/**
 * The write-up as clean semantic HTML (an article-level fragment, no scripts, no styles):
 * headings, paragraphs, an ordered list of steps with their photos and "Watch at" links, the
 * cut list as a table with fractions and millimetres, the supplies with their links and the
 * disclosure, tips and cautions as asides. Every text and attribute is escaped and every
 * address checked again here, so even an unvalidated document cannot inject markup.
 */
export function renderDocHtml(doc: JSONContent, ctx: RenderContext = {}): string {
  if (!doc || doc.type !== 'doc') return '';
  return new HtmlRenderer(ctx).blocks(doc.content);
}
