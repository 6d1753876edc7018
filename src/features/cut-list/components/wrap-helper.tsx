import { useState } from 'react';
import { formatLength, formatMm, readLength } from '@shared/measure';
import { TextField } from '@/components/ui/field';
import { runWrap, wrapNote, type WrapForm } from '../utils/helpers';
import { useCutList } from './cut-list-context';
import { AddAsPiece, HelperLength, Working } from './helper-parts';
import { LengthPreview } from './length-text';

/** The strip that wraps a circle, with its working, rounded up to the tutorial's ruler. */
export function WrapHelper() {
  const { defaultUnit, precision } = useCutList();
  const [f, setF] = useState<WrapForm>({ diameter: '', strips: '1', overlap: '', thickness: '' });
  const [wall, setWall] = useState('');
  const set = (k: keyof WrapForm) => (v: string) => setF((x) => ({ ...x, [k]: v }));
  const touched = f.diameter.trim() !== '';
  const r = runWrap(f, { unit: defaultUnit, precision });
  const errors = touched && !r.ok ? r.errors : {};
  const strips = Number(f.strips) || 1;
  return (
    <div>
      <p className="text-sm text-pencil">
        How long to cut the strip that wraps a circle (a box wall, a lid rim): π × (diameter + paper thickness) shared by the strips, plus the overlap, rounded
        up to the next 1/{precision} in mark. Cut long: a long strip only overlaps more, a short one leaves a gap.
      </p>
      <div className="mt-3 grid grid-cols-4 gap-3">
        <HelperLength label="Diameter" placeholder="e.g. 6 3/8" value={f.diameter} onChange={set('diameter')} error={errors.diameter} />
        <TextField label="Number of strips" inputMode="numeric" value={f.strips} onChange={(e) => set('strips')(e.target.value)} error={errors.strips} />
        <HelperLength label="Overlap per strip" placeholder="e.g. 1/2" value={f.overlap} onChange={set('overlap')} error={errors.overlap} />
        <HelperLength
          label="Paper thickness (optional)"
          placeholder="e.g. 0.3 mm"
          value={f.thickness}
          onChange={set('thickness')}
          error={errors.thickness}
          hint="caliper; 100 lb cover is about 0.011 in"
        />
      </div>
      {r.ok ? (
        <div className="mt-4">
          <Working
            lines={r.result.working}
            result={
              <p>
                Cut {strips > 1 ? `${strips} strips` : 'the strip'} <strong>{formatLength(r.result.stripLength)}</strong>{' '}
                <span className="text-sm text-pencil">{formatMm(r.result.stripLength)}</span> long
              </p>
            }
          />
          <AddAsPiece
            defaultName="Wall strip"
            extra={
              <div>
                <TextField label="Wall height" placeholder="e.g. 2 1/2" value={wall} onChange={(e) => setWall(e.target.value)} />
                <LengthPreview text={wall} />
              </div>
            }
            piece={(name, material) => {
              if (!readLength(wall, { defaultUnit })) return 'Enter the wall height: the strip is the strip length by the wall height';
              return {
                name: name || 'Wall strip',
                material,
                quantity: strips,
                shape: 'rect',
                width: formatLength(r.result.stripLength),
                height: wall,
                notes: wrapNote(f, { unit: defaultUnit, precision }),
              };
            }}
          />
        </div>
      ) : (
        !touched && <p className="mt-4 text-sm text-pencil">Enter the diameter of the circle the strip goes around.</p>
      )}
    </div>
  );
}
