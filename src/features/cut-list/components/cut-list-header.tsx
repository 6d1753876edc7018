import { RULER_PRECISIONS, type RulerPrecision } from '@shared/measure';
import type { UnitsMode } from '../utils/lengths';

const UNIT_LABEL: Record<UnitsMode, string> = { in: 'in', mm: 'mm', both: 'both' };

/** The section title with the units toggle and the ruler precision. */
export function CutListHeader(props: {
  count: number;
  units: UnitsMode;
  onUnits: (m: UnitsMode) => void;
  precision: RulerPrecision;
  onPrecision?: (p: RulerPrecision) => void;
  precisionBusy?: boolean;
  precisionError?: string | null;
}) {
  return (
    <div className="flex flex-wrap items-center gap-x-6 gap-y-2">
      <div className="flex items-baseline gap-3">
        <h2 className="text-xl">Cut list</h2>
        <span className="text-sm text-pencil">
          {props.count} piece{props.count === 1 ? '' : 's'}
        </span>
      </div>
      <span className="flex-1" />
      <fieldset className="flex items-center gap-2">
        <legend className="sr-only">Units shown</legend>
        <span aria-hidden className="text-sm text-pencil">
          Show
        </span>
        <div className="inline-flex rounded-md border border-line bg-white p-0.5">
          {(['in', 'mm', 'both'] as const).map((m) => (
            <label
              key={m}
              className={`cursor-pointer rounded px-2.5 py-1 text-sm has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-kraft ${props.units === m ? 'bg-kraft text-white' : 'text-ink hover:bg-kraft-light'}`}
            >
              <input type="radio" name="cut-list-units" value={m} checked={props.units === m} onChange={() => props.onUnits(m)} className="sr-only" />
              {UNIT_LABEL[m]}
            </label>
          ))}
        </div>
      </fieldset>
      <label className="flex items-center gap-2 text-sm">
        <span className="text-pencil">Ruler precision</span>
        {props.onPrecision ? (
          <select
            className="rounded-md border border-field bg-white px-2 py-1 text-sm"
            value={props.precision}
            disabled={props.precisionBusy}
            onChange={(e) => props.onPrecision!(Number(e.target.value) as RulerPrecision)}
          >
            {RULER_PRECISIONS.map((p) => (
              <option key={p} value={p}>
                1/{p} in
              </option>
            ))}
          </select>
        ) : (
          <span className="font-medium">1/{props.precision} in</span>
        )}
      </label>
      {props.precisionError && (
        <p role="alert" className="w-full text-right text-sm text-rosehip">
          {props.precisionError}
        </p>
      )}
    </div>
  );
}
