import type { PieceCheckDto } from '@shared/schemas/piece';

const TONE = {
  error: { box: 'text-rosehip', word: 'Error', icon: '✕' },
  warning: { box: 'text-kraft-dark', word: 'Warning', icon: '!' },
} as const;

/** A piece's checks in words, with a word and a mark beside the colour; a clean piece says so. */
export function PieceChecks({ checks }: { checks: PieceCheckDto[] }) {
  if (checks.length === 0)
    return (
      <p className="flex items-center gap-1.5 text-xs text-sage">
        <span aria-hidden className="inline-flex h-4 w-4 items-center justify-center rounded-full bg-sage text-[10px] text-white">
          ✓
        </span>
        All checks pass
      </p>
    );
  const order = [...checks].sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'error' ? -1 : 1));
  return (
    <ul className="space-y-0.5" aria-label="Checks">
      {order.map((c, i) => {
        const t = TONE[c.severity];
        return (
          <li key={i} className={`flex items-start gap-1.5 text-xs ${t.box}`}>
            <span
              aria-hidden
              className={`mt-px inline-flex h-4 w-4 shrink-0 items-center justify-center rounded-full text-[10px] font-bold text-white ${c.severity === 'error' ? 'bg-rosehip' : 'bg-kraft'}`}
            >
              {t.icon}
            </span>
            <span>
              <span className="font-semibold">{t.word}:</span> <span className="text-ink">{c.reason}</span>
            </span>
          </li>
        );
      })}
    </ul>
  );
}
