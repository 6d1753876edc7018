/**
 * The index of the last item whose start is at or before `t` in a list sorted by start, or -1
 * before the first. Binary search: transcripts run to thousands of cues and this runs per frame.
 */
export function lastStartingAtOrBefore(starts: ArrayLike<number>, t: number): number {
  let lo = 0;
  let hi = starts.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (starts[mid] <= t) {
      found = mid;
      lo = mid + 1;
    } else hi = mid - 1;
  }
  return found;
}

/** The cue being spoken at `t` (start inclusive, end exclusive), or -1 in a pause between cues. */
export function activeCueIndex(cues: { startMs: number; endMs: number }[], t: number): number {
  const i = lastStartingAtOrBefore(
    cues.map((c) => c.startMs),
    t,
  );
  return i >= 0 && t < cues[i].endMs ? i : -1;
}

/** The thumbnail nearest to `t` among tiles taken at `atMs` (sorted). */
export function nearestThumbnail(atMs: number[], t: number): number {
  if (atMs.length === 0) return -1;
  const i = lastStartingAtOrBefore(atMs, t);
  if (i < 0) return 0;
  if (i === atMs.length - 1) return i;
  return t - atMs[i] <= atMs[i + 1] - t ? i : i + 1;
}

export type TileGeometry = { sheet: number; column: number; row: number };

/** Where tile `i` sits: sheet floor(i / perSheet), then left to right, top to bottom. */
export function tileAt(i: number, sheets: { columns: number; perSheet: number }): TileGeometry {
  const k = i % sheets.perSheet;
  return { sheet: Math.floor(i / sheets.perSheet), column: k % sheets.columns, row: Math.floor(k / sheets.columns) };
}

/** CSS background values that show tile `i` scaled to `height` pixels tall. */
export function tileBackground(
  i: number,
  t: { sheets: string[]; columns: number; rows: number; perSheet: number; tileWidth: number; tileHeight: number },
  height: number,
): { width: number; height: number; backgroundImage: string; backgroundSize: string; backgroundPosition: string } {
  const scale = height / t.tileHeight;
  const w = t.tileWidth * scale;
  const g = tileAt(i, t);
  return {
    width: w,
    height,
    backgroundImage: `url("${t.sheets[g.sheet]}")`,
    backgroundSize: `${t.columns * w}px ${t.rows * height}px`,
    backgroundPosition: `${-g.column * w}px ${-g.row * height}px`,
  };
}
