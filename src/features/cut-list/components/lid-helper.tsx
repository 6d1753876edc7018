import { useState } from 'react';
import { DEFAULT_LID_CLEARANCE } from '@shared/geometry';
import { formatLength, formatMm } from '@shared/measure';
import { runLid, type LidForm } from '../utils/helpers';
import { useCutList } from './cut-list-context';
import { AddAsPiece, HelperLength, Working } from './helper-parts';

/** The lid circle that fits over a base, with its working. */
export function LidHelper() {
  const { defaultUnit, precision } = useCutList();
  const [f, setF] = useState<LidForm>({ diameter: '', wall: '', clearance: '' });
  const set = (k: keyof LidForm) => (v: string) => setF((x) => ({ ...x, [k]: v }));
  const touched = f.diameter.trim() !== '';
  const r = runLid(f, { unit: defaultUnit, precision });
  const errors = touched && !r.ok ? r.errors : {};
  return (
    <div>
      <p className="text-sm text-pencil">
        A lid is cut larger than the base: the wall on both sides plus a little play so it slides on, rounded up (a lid too small does not go on at all).
      </p>
      <div className="mt-3 grid grid-cols-3 gap-3">
        <HelperLength label="Base diameter" placeholder="e.g. 6 3/8" value={f.diameter} onChange={set('diameter')} error={errors.diameter} />
        <HelperLength
          label="Wall thickness"
          placeholder="e.g. 1/32"
          value={f.wall}
          onChange={set('wall')}
          error={errors.wall}
          hint="the strip around the base; empty for none"
        />
        <HelperLength
          label="Clearance each side"
          placeholder={`${formatLength(DEFAULT_LID_CLEARANCE)} if empty`}
          value={f.clearance}
          onChange={set('clearance')}
          error={errors.clearance}
        />
      </div>
      {r.ok ? (
        <div className="mt-4">
          <Working
            lines={r.result.working}
            result={
              <p>
                Cut the lid circle <strong>⌀ {formatLength(r.result.lidDiameter)}</strong>{' '}
                <span className="text-sm text-pencil">{formatMm(r.result.lidDiameter)}</span>
              </p>
            }
          />
          <AddAsPiece
            defaultName="Lid"
            piece={(name, material) => ({
              name: name || 'Lid',
              material,
              shape: 'circle',
              width: formatLength(r.result.lidDiameter),
              notes: `Fits over a ${f.diameter.trim()} base`,
            })}
          />
        </div>
      ) : (
        !touched && <p className="mt-4 text-sm text-pencil">Enter the diameter of the base the lid goes over.</p>
      )}
    </div>
  );
}
