import { useId, useState } from 'react';
import { palette } from '@shared/palette';
import { FOLD_LABELS as FOLD_LABEL, FOLD_STYLES, type CardBaseResult, type FoldStyle } from '@shared/geometry';
import { formatLength, formatMm, serializeLength, toInches } from '@shared/measure';
import { SelectField } from '@/components/ui/field';
import { cardFields, runCardBase, type CardForm } from '../utils/helpers';
import { useCutList } from './cut-list-context';
import { AddAsPiece, HelperLength, Working } from './helper-parts';

/** What each fold is, in a line, under the choice. */
const FOLD_HINTS: Record<FoldStyle, string> = {
  side: 'Opens like a book.',
  top: 'Opens upwards.',
  gatefold: 'Two flaps meet in the middle of the front.',
  'z-fold': 'Three equal panels folded one way, then the other.',
  'tri-fold': 'Rolls in: one end panel tucks inside, so it is cut narrower.',
  shutter: 'An inner and an outer flap on each side; the outer may be narrower for a stepped look.',
  easel: 'The front folds back at its middle and stands on a stopper glued to the base.',
};

/** The longest form of a panel's name that fits its width at 11 units a letter-height (about 6 units a letter). */
function fitName(name: string, width: number): string {
  const forms = [name, name.replace(/\s*\(.*\)$/, ''), name.split(', ').pop() ?? name, name.match(/outer|inner|tucked|back|front|middle/)?.[0] ?? ''];
  return forms.find((f) => f.length * 6 <= width - 4) ?? '';
}

/** The flat card drawn to scale: panels with their names and widths, score lines dashed. */
function FlatCard({ r }: { r: CardBaseResult }) {
  const captionId = useId();
  const W = toInches(r.flatWidth).valueOf();
  const H = toInches(r.flatHeight).valueOf();
  const across = r.scoreLines[0]?.axis !== 'height';
  const scale = 300 / Math.max(W, H);
  const w = W * scale;
  const h = H * scale;
  let at = 0;
  const panels = r.panels.map((p) => {
    const size = toInches(p.size).valueOf() * scale;
    const box = across ? { x: at, y: 0, w: size, h } : { x: 0, y: at, w, h: size };
    at += size;
    return { ...box, name: p.name, size: formatLength(p.size) };
  });
  return (
    <figure className="mt-3">
      <svg viewBox={`-4 -4 ${w + 8} ${h + 8}`} className="h-auto max-h-72 w-full max-w-md" role="img" aria-labelledby={captionId}>
        <rect x={0} y={0} width={w} height={h} fill="white" stroke="currentColor" strokeWidth={1.5} />
        {r.scoreLines.map((s, i) => {
          const v = toInches(s.at).valueOf() * scale;
          return across ? (
            <line key={i} x1={v} y1={0} x2={v} y2={h} stroke={palette.kraft} strokeWidth={1.5} strokeDasharray="6 4" />
          ) : (
            <line key={i} x1={0} y1={v} x2={w} y2={v} stroke={palette.kraft} strokeWidth={1.5} strokeDasharray="6 4" />
          );
        })}
        {panels.map((p, i) => (
          <text key={i} x={p.x + p.w / 2} y={p.y + p.h / 2} textAnchor="middle" fontSize={11} fill="currentColor">
            <tspan x={p.x + p.w / 2} dy="-0.2em">
              {fitName(p.name, p.w)}
            </tspan>
            <tspan x={p.x + p.w / 2} dy="1.3em" fontSize={10}>
              {p.size}
            </tspan>
          </text>
        ))}
      </svg>
      <figcaption id={captionId} className="mt-1 text-xs text-pencil">
        The flat card, {formatLength(r.flatWidth)} × {formatLength(r.flatHeight)}: {r.panels.map((p) => `${p.name} ${formatLength(p.size)}`).join(', ')}; score
        lines dashed.
      </figcaption>
    </figure>
  );
}

/** The lengths only some folds ask for (`cardFields` says which), in the order they are shown. */
const OPTIONAL_LENGTHS: { key: keyof ReturnType<typeof cardFields>; label: string; placeholder: string; hint?: string }[] = [
  { key: 'relief', label: 'Relief', placeholder: '1/16 in if left empty', hint: 'The gap where flaps meet, so they do not rub' },
  {
    key: 'caliper',
    label: 'Stock thickness (caliper)',
    placeholder: 'e.g. 0.011 in or 0.28 mm',
    hint: 'For heavy stock: a tucked panel gives up about one caliper',
  },
  { key: 'outerFlap', label: 'Outer flap', placeholder: 'as wide as the inner flap' },
  { key: 'stopper', label: 'Stopper from the bottom edge', placeholder: 'half the height if left empty' },
];

/** The flat card base and its score lines from the finished size and fold, with relief, fold allowance, shutter flaps and the easel's stopper. */
export function CardBaseHelper() {
  const { defaultUnit, precision } = useCutList();
  const [f, setF] = useState<CardForm>({ width: '', height: '', fold: 'side', relief: '', caliper: '', outerFlap: '', stopper: '' });
  const touched = f.width.trim() !== '' || f.height.trim() !== '';
  const r = runCardBase(f, { unit: defaultUnit, precision });
  const errors = touched && !r.ok ? r.errors : {};
  const use = cardFields(f.fold);
  const set = (k: keyof CardForm) => (v: string) => setF((x) => ({ ...x, [k]: v }));
  return (
    <div>
      <p className="text-sm text-pencil">The size to cut a card base flat, and where to score it, from the size it should be once folded.</p>
      <div className="mt-3 grid grid-cols-1 gap-3 sm:grid-cols-3">
        <HelperLength label="Finished width" placeholder="e.g. 4 1/4" value={f.width} onChange={set('width')} error={errors.width} />
        <HelperLength label="Finished height" placeholder="e.g. 5 1/2" value={f.height} onChange={set('height')} error={errors.height} />
        <div>
          <SelectField label="Fold" value={f.fold} onChange={(e) => setF((x) => ({ ...x, fold: e.target.value as FoldStyle }))}>
            {FOLD_STYLES.map((s) => (
              <option key={s} value={s}>
                {FOLD_LABEL[s]}
              </option>
            ))}
          </SelectField>
          <p className="mt-1 text-xs text-pencil">{FOLD_HINTS[f.fold]}</p>
        </div>
        {OPTIONAL_LENGTHS.filter((o) => use[o.key]).map((o) => (
          <HelperLength
            key={o.key}
            label={o.label}
            placeholder={o.placeholder}
            value={f[o.key] ?? ''}
            onChange={set(o.key)}
            error={errors[o.key]}
            hint={o.hint}
          />
        ))}
      </div>
      {r.ok ? (
        <div className="mt-4">
          <FlatCard r={r.result} />
          <Working
            lines={r.result.working}
            result={
              <p>
                Cut{' '}
                <strong>
                  {formatLength(r.result.flatWidth)} × {formatLength(r.result.flatHeight)}
                </strong>{' '}
                <span className="text-sm text-pencil">
                  {formatMm(r.result.flatWidth)} × {formatMm(r.result.flatHeight)}
                </span>
                , score {r.result.scoreLines.map((s) => `at ${formatLength(s.at)} on the ${s.axis === 'width' ? 'width' : 'length'}`).join(' and ')}
                {r.result.stopper && (
                  <>
                    ; stopper {formatLength(r.result.stopper.fromEdge)} from the bottom edge, the front leaning at {r.result.stopper.leanDegrees.toFixed(0)}°
                  </>
                )}
              </p>
            }
          />
          <AddAsPiece
            defaultName="Card base"
            piece={(name, material) => ({
              name: name || 'Card base',
              material,
              shape: 'rect',
              // Exact stored forms: a gatefold's flap may be a fraction the ruler does not show.
              width: serializeLength(r.result.flatWidth),
              height: serializeLength(r.result.flatHeight),
              // Folds crease cleanly with the grain along the score lines (common practice).
              grain: r.result.grain,
              scoreLines: r.result.scoreLines.map((s) => ({ axis: s.axis, at: serializeLength(s.at) })),
              notes: `${FOLD_LABEL[f.fold]}; folds to ${f.width.trim()} x ${f.height.trim()}${
                r.result.stopper ? `; stopper ${formatLength(r.result.stopper.fromEdge)} from the bottom edge` : ''
              }`,
            })}
          />
        </div>
      ) : (
        !touched && <p className="mt-4 text-sm text-pencil">Enter the finished width and height of the card.</p>
      )}
    </div>
  );
}
