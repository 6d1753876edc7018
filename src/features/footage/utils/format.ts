import { formatTimestamp } from '@shared/transcript/timestamp';

const MB = 1024 ** 2;
const GB = 1024 ** 3;

/**
 * Sizes as the server's upload limit message writes them (binary multiples labelled MB and GB),
 * so "2.0 GB of 4.0 GB" here and "larger than the 4 GB limit" there mean the same bytes.
 */
export function formatBytes(n: number): string {
  if (n >= GB) return `${(n / GB).toFixed(1)} GB`;
  if (n >= 10 * MB) return `${Math.round(n / MB)} MB`;
  if (n >= MB / 10) return `${(n / MB).toFixed(1)} MB`;
  return `${Math.max(1, Math.round(n / 1024))} KB`;
}

/** A playhead time as chapter lists write it ("1:05"); anything not yet known reads 0:00. */
export function formatClock(ms: number | null | undefined): string {
  return typeof ms === 'number' && Number.isFinite(ms) && ms >= 0 ? formatTimestamp(ms) : '0:00';
}

/** Whole percent of a part, clamped to 0-100 (an upload may report a few bytes over its total). */
export function percentOf(part: number, whole: number): number {
  if (!(whole > 0)) return 0;
  return Math.max(0, Math.min(100, Math.floor((part / whole) * 100)));
}
