import { useState } from 'react';
import { FOLD_STYLES, type FoldStyle } from '@shared/geometry';
import { formatLength, formatMm, serializeLength } from '@shared/measure';
import { SelectField } from '@/components/ui/field';
import { runCardBase, type CardForm } from '../utils/helpers';
import { useCutList } from './cut-list-context';
import { AddAsPiece, HelperLength, Working } from './helper-parts';

const FOLD_LABEL: Record<FoldStyle, string> = { top: 'Top fold', side: 'Side fold', gatefold: 'Gatefold' };

/** The flat card base and its score lines from the finished size and fold. */
export function CardBaseHelper() {
  const { defaultUnit, precision } = useCutList();
  const [f, setF] = useState<CardForm>({ width: '', height: '', fold: 'side' });
  const touched = f.width.trim() !== '' || f.height.trim() !== '';
  const r = runCardBase(f, { unit: defaultUnit, precision });
  const errors = touched && !r.ok ? r.errors : {};
  return (
    <div>
      <p className="text-sm text-pencil">The size to cut a card base flat, and where to score it, from the size it should be once folded.</p>
      <div className="mt-3 grid grid-cols-3 gap-3">
        <HelperLength label="Finished width" placeholder="e.g. 4 1/4" value={f.width} onChange={(v) => setF((x) => ({ ...x, width: v }))} error={errors.width} />
        <HelperLength label="Finished height" placeholder="e.g. 5 1/2" value={f.height} onChange={(v) => setF((x) => ({ ...x, height: v }))} error={errors.height} />
        <SelectField label="Fold" value={f.fold} onChange={(e) => setF((x) => ({ ...x, fold: e.target.value as FoldStyle }))}>
          {FOLD_STYLES.map((s) => (
            <option key={s} value={s}>
              {FOLD_LABEL[s]}
            </option>
          ))}
        </SelectField>
      </div>
      {r.ok ? (
        <div className="mt-4">
          <Working
            lines={r.result.working}
            result={
              <p>
                Cut <strong>{formatLength(r.result.flatWidth)} × {formatLength(r.result.flatHeight)}</strong>{' '}
                <span className="text-sm text-pencil">
                  {formatMm(r.result.flatWidth)} × {formatMm(r.result.flatHeight)}
                </span>
                , score {r.result.scoreLines.map((s) => `at ${formatLength(s.at)} on the ${s.axis === 'width' ? 'width' : 'length'}`).join(' and ')}
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
              scoreLines: r.result.scoreLines.map((s) => ({ axis: s.axis, at: serializeLength(s.at) })),
              notes: `${FOLD_LABEL[f.fold]}; folds to ${f.width.trim()} x ${f.height.trim()}`,
            })}
          />
        </div>
      ) : (
        !touched && <p className="mt-4 text-sm text-pencil">Enter the finished width and height of the card.</p>
      )}
    </div>
  );
}
