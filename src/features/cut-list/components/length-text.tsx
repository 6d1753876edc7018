import { readTyped, showLength } from '../utils/lengths';
import type { LengthDto } from '@shared/schemas/piece';
import { useCutList } from './cut-list-context';

/** A length as the crafter writes it, with the other system beside it in a lighter tone. */
export function LengthText({ value, stacked = false, prefix }: { value: LengthDto; stacked?: boolean; prefix?: string }) {
  const { units, precision } = useCutList();
  const t = showLength(value, units, precision);
  return (
    <span className={stacked ? 'inline-flex flex-col leading-tight' : 'inline-flex flex-wrap items-baseline gap-x-1.5'}>
      <span className="whitespace-nowrap">
        {prefix}
        {t.primary}
      </span>{' '}
      {t.secondary && <span className="whitespace-nowrap text-xs text-pencil">{t.secondary}</span>}
    </span>
  );
}

/** How the typed text was read, live; an unreadable text gets its reason in words. */
export function LengthPreview({ text, id }: { text: string; id?: string }) {
  const { defaultUnit, precision } = useCutList();
  const r = readTyped(text, defaultUnit, precision);
  if (r.state === 'empty') return null;
  return (
    <p id={id} aria-live="polite" className={`text-xs ${r.state === 'error' ? 'text-rosehip' : 'text-pencil'}`}>
      {r.state === 'error' ? r.message : `${r.preview}${r.approx ? ' (said as approximate)' : ''}`}
    </p>
  );
}
