/** A determinate progress bar with its percent for screen readers. */
export function ProgressBar({ percent, label, tone = 'kraft' }: { percent: number; label: string; tone?: 'kraft' | 'sage' }) {
  const p = Math.max(0, Math.min(100, Math.round(percent)));
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={p}
      className="h-2.5 w-full overflow-hidden rounded-full bg-line"
    >
      <div className={`h-full rounded-full transition-[width] duration-300 ${tone === 'sage' ? 'bg-sage' : 'bg-kraft'}`} style={{ width: `${p}%` }} />
    </div>
  );
}
