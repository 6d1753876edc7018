import type { CommentAnchorDto } from '@shared/schemas/comment';

/** Only the live write-up (not a revision preview or the other side of a conflict) is searched. */
const scope = () => document.querySelector<HTMLElement>('[data-comment-scope]') ?? document.body;

const reducedMotion = () => window.matchMedia?.('(prefers-reduced-motion: reduce)').matches ?? false;

/** The element a comment points at in the write-up, if it is shown there. */
export function anchorElement(anchor: CommentAnchorDto): HTMLElement | null {
  const esc = (v: string) => (typeof CSS !== 'undefined' && typeof CSS.escape === 'function' ? CSS.escape(v) : v.replace(/"/g, ''));
  if (anchor.stepId) return scope().querySelector<HTMLElement>(`[data-step-id="${esc(anchor.stepId)}"]`);
  if (anchor.stillId) return scope().querySelector<HTMLElement>(`[data-still-id="${esc(anchor.stillId)}"]`);
  if (anchor.pieceId) return scope().querySelector<HTMLElement>(`[data-piece-id="${esc(anchor.pieceId)}"]`);
  return null;
}

/** The quoted words inside an element as a Range (spaces and line breaks count as one space), or null. */
export function findQuote(root: HTMLElement, quote: string): Range | null {
  const walker = document.createTreeWalker(root, NodeFilter.SHOW_TEXT);
  const nodes: Text[] = [];
  let all = '';
  const starts: number[] = [];
  for (let n = walker.nextNode(); n; n = walker.nextNode()) {
    const t = n as Text;
    // Words in the step's controls (buttons, the number) are not part of its text.
    if (t.parentElement?.closest('[contenteditable="false"]')) continue;
    starts.push(all.length);
    nodes.push(t);
    all += t.data;
  }
  const words = quote
    .trim()
    .split(/\s+/)
    .map((w) => w.replace(/[.*+?^${}()|[\]\\]/g, '\\$&'));
  const m = new RegExp(words.join('\\s+'), 'i').exec(all);
  if (!m) return null;
  const at = (offset: number) => {
    let i = starts.length - 1;
    while (i > 0 && starts[i]! > offset) i--;
    return { node: nodes[i]!, offset: offset - starts[i]! };
  };
  const a = at(m.index);
  const b = at(m.index + m[0].length);
  const range = document.createRange();
  range.setStart(a.node, a.offset);
  range.setEnd(b.node, Math.min(b.offset, b.node.data.length));
  return range;
}

let clearTimer: number | undefined;

/**
 * Scrolls the write-up to what a comment points at and marks it for a moment (the quoted words
 * stay highlighted where the browser can). False when it is not in the write-up (a piece or a
 * still that the text does not show), so the caller offers a link to its section instead.
 */
export function showAnchor(anchor: CommentAnchorDto): boolean {
  const el = anchorElement(anchor);
  if (!el) return false;
  el.scrollIntoView({ block: 'center', behavior: reducedMotion() ? 'auto' : 'smooth' });
  document.querySelectorAll('.comment-target').forEach((x) => x.classList.remove('comment-target'));
  el.classList.add('comment-target');
  const highlights = (window.CSS as unknown as { highlights?: Map<string, unknown> })?.highlights;
  const Highlight = (window as unknown as { Highlight?: new (...r: Range[]) => unknown }).Highlight;
  highlights?.delete('comment-quote');
  if (anchor.quote && highlights && Highlight) {
    const range = findQuote(el, anchor.quote);
    if (range) highlights.set('comment-quote', new Highlight(range));
  }
  window.clearTimeout(clearTimer);
  clearTimer = window.setTimeout(() => el.classList.remove('comment-target'), 2500);
  return true;
}
