import { useDeferredValue, useState } from 'react';
import { TextField } from '@/components/ui/field';
import { EmptyState } from '@/components/ui/empty-state';
import { Loading } from '@/components/ui/spinner';
import { Notice } from '@/components/ui/notice';
import { useSheetPlan } from '../api/get-sheet-plan';
import type { MaterialPlan, PlacementDto } from '../api/types';
import { labelSize, placementsBySheet } from '../utils/sheet-drawing';
import { useCutList } from './cut-list-context';
import { LengthText } from './length-text';

function count(text: string, min: number, max: number, fallback: number): number {
  const n = Number(text);
  return Number.isInteger(n) && n >= min && n <= max ? n : fallback;
}

/** Each material's pieces laid out on its stock sheets, for a number of kits plus spares. */
export function SheetPlanView({ pieceCount }: { pieceCount: number }) {
  const { tutorialId } = useCutList();
  const [kitsText, setKits] = useState('1');
  const [sparesText, setSpares] = useState('0');
  const kits = count(kitsText, 1, 500, 1);
  const spares = count(sparesText, 0, 100, 0);
  const params = useDeferredValue({ kits, spares });
  const q = useSheetPlan(tutorialId, params, pieceCount > 0);
  if (pieceCount === 0) return <EmptyState title="Nothing to plan yet">Add pieces to the cut list; the sheet plan lays them out on each material's stock sheets.</EmptyState>;
  return (
    <div>
      <div className="flex flex-wrap items-end gap-3">
        <TextField className="w-28" label="Kits" inputMode="numeric" value={kitsText} onChange={(e) => setKits(e.target.value)} error={kitsText !== String(kits) ? 'A whole number from 1 to 500' : undefined} />
        <TextField className="w-28" label="Spares" inputMode="numeric" value={sparesText} onChange={(e) => setSpares(e.target.value)} error={sparesText !== String(spares) ? 'A whole number from 0 to 100' : undefined} />
        <p className="pb-2 text-sm text-pencil">
          Planning {kits + spares} set{kits + spares === 1 ? '' : 's'} of every piece{spares ? ` (${kits} kit${kits === 1 ? '' : 's'} and ${spares} spare${spares === 1 ? '' : 's'})` : ''}. Every layout can be cut with straight trimmer cuts.
        </p>
        {q.isFetching && !q.isPending && <span className="pb-2 text-xs text-pencil">Planning …</span>}
      </div>
      <div className="mt-4 space-y-6">
        {q.isPending ? <Loading label="Laying out the pieces" /> : q.error ? <Notice kind="error">{q.error.message}</Notice> : q.data.materials.map((m) => <MaterialPlanView key={m.material} plan={m} />)}
      </div>
    </div>
  );
}

function MaterialPlanView({ plan }: { plan: MaterialPlan }) {
  const sheets = placementsBySheet(plan.placements, plan.sheets);
  const name = plan.material === 'unassigned' && plan.materialId === null ? 'No material given' : plan.material;
  return (
    <section aria-label={`Sheet plan for ${name}`} className="rounded-lg border border-line bg-white p-4">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h4 className="font-serif text-base">{name}</h4>
        <span className="inline-flex items-baseline gap-1 text-sm">
          sheet <LengthText value={plan.sheet.width} /> × <LengthText value={plan.sheet.height} />
        </span>
        <span className="text-xs text-pencil">{plan.rotate ? 'pieces may turn' : 'pieces kept upright'}</span>
      </div>
      <dl className="mt-2 flex flex-wrap gap-x-6 gap-y-1 text-sm">
        <div className="flex gap-1">
          <dt className="text-pencil">Sheets</dt>
          <dd className="font-semibold">{plan.sheets}</dd>
        </div>
        <div className="flex gap-1">
          <dt className="text-pencil">At least, by area</dt>
          <dd>{plan.areaLowerBound}</dd>
        </div>
        <div className="flex gap-1">
          <dt className="text-pencil">Waste</dt>
          <dd>{Math.round(plan.waste * 100)}%</dd>
        </div>
      </dl>
      {plan.placements.some((p) => p.rotated) && (
        <p className="mt-1 flex items-center gap-1.5 text-xs text-pencil">
          <span aria-hidden className="inline-block h-3 w-4 border border-kraft-dark bg-sage-light" /> ↻ turned a quarter on the sheet
        </p>
      )}
      {plan.errors.length > 0 && (
        <ul className="mt-2 space-y-1">
          {plan.errors.map((e, i) => (
            <li key={i} className="flex items-start gap-1.5 text-sm text-rosehip">
              <span aria-hidden className="mt-0.5 inline-flex h-4 w-4 shrink-0 items-center justify-center rounded-full bg-rosehip text-[10px] font-bold text-white">✕</span>
              <span>
                <span className="font-semibold">Not placed:</span> <span className="text-ink">{e.count} × “{e.name}”: {e.reason}</span>
              </span>
            </li>
          ))}
        </ul>
      )}
      {sheets.length > 0 && (
        <div className="mt-3 flex flex-wrap gap-4">
          {sheets.map((ps, i) => (
            <figure key={i} className="w-56">
              <SheetDrawing width={plan.sheet.width.inches} height={plan.sheet.height.inches} placements={ps} title={`${name}, sheet ${i + 1} of ${sheets.length}`} />
              <figcaption className="mt-1 text-center text-xs text-pencil">
                Sheet {i + 1} of {sheets.length} · {ps.length} piece{ps.length === 1 ? '' : 's'}
              </figcaption>
            </figure>
          ))}
        </div>
      )}
    </section>
  );
}

/** One stock sheet drawn to scale in inches, each piece labelled, turned ones marked ↻. */
export function SheetDrawing({ width, height, placements, title }: { width: number; height: number; placements: PlacementDto[]; title: string }) {
  const stroke = Math.max(width, height) / 300;
  return (
    <svg viewBox={`0 0 ${width} ${height}`} role="img" aria-label={title} className="block h-auto w-full" style={{ aspectRatio: `${width} / ${height}` }}>
      <title>{title}</title>
      <rect x={0} y={0} width={width} height={height} fill="#FBF8F3" stroke="#22303C" strokeWidth={stroke * 2} />
      {placements.map((p, i) => {
        const size = labelSize(p);
        const cx = p.x + p.width / 2;
        const cy = p.y + p.height / 2;
        const upright = p.height > p.width * 1.6;
        return (
          <g key={i}>
            <title>{`${p.name}${p.rotated ? ' (turned)' : ''}: ${round(p.width)} x ${round(p.height)} in`}</title>
            {p.shape === 'circle' ? (
              <>
                <rect x={p.x} y={p.y} width={p.width} height={p.height} fill="none" stroke="#A87B4F" strokeWidth={stroke} strokeDasharray={`${stroke * 4} ${stroke * 3}`} />
                <circle cx={cx} cy={cy} r={Math.min(p.width, p.height) / 2} fill="#EFE4D6" stroke="#8C6440" strokeWidth={stroke} />
              </>
            ) : (
              <rect x={p.x} y={p.y} width={p.width} height={p.height} fill={p.rotated ? '#E3EBE4' : '#EFE4D6'} stroke="#8C6440" strokeWidth={stroke} />
            )}
            {size && (
              <text
                x={cx}
                y={cy}
                fontSize={size}
                textAnchor="middle"
                dominantBaseline="central"
                fill="#22303C"
                fontFamily="Inter, system-ui, sans-serif"
                transform={upright ? `rotate(-90 ${cx} ${cy})` : undefined}
              >
                {p.name}
                {p.rotated ? ' ↻' : ''}
              </text>
            )}
          </g>
        );
      })}
    </svg>
  );
}

const round = (n: number) => Math.round(n * 1000) / 1000;
