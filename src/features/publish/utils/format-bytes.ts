/** A byte count the way a download line shows it: "820 B", "14 KB", "3.2 MB" (1 KB = 1000 B, SI prefixes). */
export function formatBytes(n: number): string {
  if (!Number.isFinite(n) || n < 0) return '';
  if (n < 1000) return `${Math.round(n)} B`;
  const units = ['KB', 'MB', 'GB', 'TB'];
  let v = n;
  let u = -1;
  do {
    v /= 1000;
    u += 1;
  } while (v >= 999.5 && u < units.length - 1);
  return `${v >= 10 ? Math.round(v) : Math.round(v * 10) / 10} ${units[u]}`;
}
