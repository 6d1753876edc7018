/**
 * Pieces both renderers (HTML and Markdown) share, so the page and the Markdown say the same
 * words: labels, size text, the supply line, the time link.
 */
import type { JSONContent } from '@tiptap/core';
import { formatTimestamp } from '../transcript/timestamp';
import { SHAPE_LABELS } from '../geometry/shapes';
import { ROUND_SHAPES } from '../measure/piece';
import type { RenderPiece, RenderSupply } from './types';
import { SUPPLY_CATEGORIES } from './types';
import { isSafeLinkHref, isSafeVideoUrl } from './urls';

export const CATEGORY_LABELS: Record<string, string> = {
  paper: 'Paper',
  cardstock: 'Cardstock',
  embellishment: 'Embellishments',
  adhesive: 'Adhesives',
  tool: 'Tools',
  other: 'Other',
};

/** Used when a supply link is sponsored and the caller gave no wording of its own (one wording app-wide). */
export { DEFAULT_DISCLOSURE } from '../schemas/supply';

export const CALLOUT_LABELS = { tip: 'Tip', caution: 'Caution' } as const;

/** The plain text of a node (titles, alt text). */
export function plainText(node: JSONContent | undefined): string {
  if (!node) return '';
  if (node.type === 'text') return node.text ?? '';
  if (node.type === 'hardBreak') return ' ';
  return (node.content ?? []).map(plainText).join('');
}

/**
 * Millimetres rounded to 0.1, half away from zero, on the decimal value: going through six
 * decimals first absorbs float noise (107.95 stored as 107.949999...).
 */
export function formatMmNumber(mm: number): string {
  if (!Number.isFinite(mm)) return '';
  const neg = mm < 0;
  const micro = BigInt(Math.abs(mm).toFixed(6).replace('.', ''));
  const tenths = (micro + 50_000n) / 100_000n;
  const whole = tenths / 10n;
  const frac = tenths % 10n;
  const s = frac === 0n ? `${whole}` : `${whole}.${frac}`;
  return neg && tenths !== 0n ? `-${s}` : s;
}

const UNIT_SUFFIX = / ([a-z]+)$/;

/** " oval", " rounded rectangle": what follows a size for shapes other than a rectangle. */
const shapeSuffix = (p: RenderPiece) => (p.shape === 'rect' ? '' : ` ${SHAPE_LABELS[p.shape]}`);

/** "4 1/4 x 5 1/2 in" from "4 1/4 in" and "5 1/2 in"; a circle is its diameter ("3 in circle"); other shapes say theirs ("4 x 3 in oval"). */
export function inchSize(p: RenderPiece): string {
  if (ROUND_SHAPES.includes(p.shape)) return `${p.width}${shapeSuffix(p)}`;
  const wu = UNIT_SUFFIX.exec(p.width)?.[1];
  const hu = UNIT_SUFFIX.exec(p.height)?.[1];
  return (wu && wu === hu ? `${p.width.slice(0, -wu.length - 1)} x ${p.height}` : `${p.width} x ${p.height}`) + shapeSuffix(p);
}

/** "108 x 139.7 mm", "76.2 mm circle", "101.6 x 76.2 mm oval". */
export function mmSize(p: RenderPiece): string {
  if (ROUND_SHAPES.includes(p.shape)) return `${formatMmNumber(p.widthMm)} mm${shapeSuffix(p)}`;
  return `${formatMmNumber(p.widthMm)} x ${formatMmNumber(p.heightMm)} mm${shapeSuffix(p)}`;
}

/** Supplies grouped in the category order of DESIGN.md W4, unknown categories after, by name. */
export function groupSupplies(supplies: readonly RenderSupply[]): { category: string; label: string; items: RenderSupply[] }[] {
  const order = new Map<string, number>(SUPPLY_CATEGORIES.map((c, i) => [c, i]));
  const groups = new Map<string, RenderSupply[]>();
  for (const s of supplies) {
    const key =
      String(s.category ?? '')
        .trim()
        .toLowerCase() || 'other';
    if (!groups.has(key)) groups.set(key, []);
    groups.get(key)!.push(s);
  }
  return [...groups.entries()]
    .sort(([a], [b]) => (order.get(a) ?? 99) - (order.get(b) ?? 99) || a.localeCompare(b))
    .map(([category, items]) => ({ category, label: CATEGORY_LABELS[category] ?? category.charAt(0).toUpperCase() + category.slice(1), items }));
}

/**
 * The tag every output puts right after a sponsored supply's name, so a reader sees which link
 * pays before following it (FTC Endorsement Guides, 16 CFR 255: disclose next to the endorsement).
 */
export function sponsoredTag(s: Pick<RenderSupply, 'sponsored' | 'url'>): string {
  // Only a link that is shown: an unsafe address is dropped from every output, and so is its tag.
  return s.sponsored && s.url && isSafeLinkHref(s.url) ? ' (sponsored link)' : '';
}

/** Text after a supply's name: " (2 sheets) — for the base (discount code PAPER10)". */
export function supplyDetails(s: RenderSupply): { quantity: string; note: string; code: string } {
  const q = s.quantity === undefined || s.quantity === null ? '' : String(s.quantity).trim();
  return { quantity: q ? ` (${q})` : '', note: s.note?.trim() ? ` — ${s.note.trim()}` : '', code: s.discountCode?.trim() ?? '' };
}

/** "Watch at 3:12" and `${videoUrl}#t=192` (W3C Media Fragments URI 1.0, temporal dimension in seconds). */
export function timeLink(atMs: number, videoUrl?: string): { label: string; href: string | null } {
  const label = `Watch at ${formatTimestamp(atMs)}`;
  if (!videoUrl || !isSafeVideoUrl(videoUrl)) return { label, href: null };
  return { label, href: `${videoUrl.split('#')[0]}#t=${Math.floor(atMs / 1000)}` };
}

/** Reads the time back from "Watch at 3:12" (Markdown import). */
export const TIME_LINE = /^Watch at ((?:\d+:)?\d{1,2}:\d{2})$/;
