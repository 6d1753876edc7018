import { useDeferredValue, useState } from 'react';
import { TextField } from '@/components/ui/field';
import { EmptyState } from '@/components/ui/empty-state';
import { Loading } from '@/components/ui/spinner';
import { Notice } from '@/components/ui/notice';
import { useSheetPlan } from '../api/get-sheet-plan';
import type { MaterialPlanDto as MaterialPlan, PlanBlockDto } from '@shared/schemas/sheet-plan';
import { blockCells, CELLS_DRAWN, labelSize, patternLabel, type DrawnPiece } from '../utils/sheet-drawing';
import { useCutList } from './cut-list-context';
import { LengthText } from './length-text';
import { palette } from '@shared/palette';

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
  if (pieceCount === 0)
    return <EmptyState title="Nothing to plan yet">Add pieces to the cut list; the sheet plan lays them out on each material's stock sheets.</EmptyState>;
  return (
    <div>
      <div className="flex flex-wrap items-end gap-3">
        <TextField
          className="w-28"
          label="Kits"
          inputMode="numeric"
          value={kitsText}
          onChange={(e) => setKits(e.target.value)}
          error={kitsText !== String(kits) ? 'A whole number from 1 to 500' : undefined}
        />
        <TextField
          className="w-28"
          label="Spares"
          inputMode="numeric"
          value={sparesText}
          onChange={(e) => setSpares(e.target.value)}
          error={sparesText !== String(spares) ? 'A whole number from 0 to 100' : undefined}
        />
        <p className="pb-2 text-sm text-pencil">
          Planning {kits + spares} set{kits + spares === 1 ? '' : 's'} of every piece
          {spares ? ` (${kits} kit${kits === 1 ? '' : 's'} and ${spares} spare${spares === 1 ? '' : 's'})` : ''}. Every layout can be cut with straight trimmer
          cuts.
        </p>
        {q.isFetching && !q.isPending && <span className="pb-2 text-xs text-pencil">Planning …</span>}
      </div>
      <div className="mt-4 space-y-6">
        {q.isPending ? (
          <Loading label="Laying out the pieces" />
        ) : q.error ? (
          <Notice kind="error">{q.error.message}</Notice>
        ) : (
          q.data.materials.map((m) => <MaterialPlanView key={m.material} plan={m} />)
        )}
      </div>
    </div>
  );
}

function MaterialPlanView({ plan }: { plan: MaterialPlan }) {
  const name = plan.material === 'unassigned' && plan.materialId === null ? 'No material given' : plan.material;
  const turned = plan.patterns.some((p) => p.blocks.some((b) => b.rotated));
  return (
    <section aria-label={`Sheet plan for ${name}`} className="rounded-lg border border-line bg-white p-4">
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h4 className="font-serif text-base">{name}</h4>
        <span className="inline-flex items-baseline gap-1 text-sm">
          sheet <LengthText value={plan.sheet.width} /> × <LengthText value={plan.sheet.height} />
        </span>
        <span className="text-xs text-pencil">{plan.rotate ? 'pieces may turn' : 'pieces kept upright'}</span>
        <span className="text-xs text-pencil">
          {plan.grain === 'none' ? 'grain not set' : `grain ${plan.grain === 'height' ? '↕ along the sheet’s height' : '↔ along the sheet’s width'}`}
        </span>
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
          <dt className="text-pencil">Pieces</dt>
          <dd>{plan.pieces.toLocaleString('en-US')}</dd>
        </div>
        <div className="flex gap-1">
          <dt className="text-pencil">Waste</dt>
          <dd>{Math.round(plan.waste * 100)}%</dd>
        </div>
      </dl>
      {!plan.complete && (
        <p className="mt-1 text-xs text-pencil">
          A large plan: the search for fewer sheets stopped after a couple of seconds. Every sheet below can be cut as drawn.
        </p>
      )}
      {turned && (
        <p className="mt-1 flex items-center gap-1.5 text-xs text-pencil">
          <span aria-hidden className="inline-block h-3 w-4 border border-kraft-dark bg-sage-light" /> ↻ turned a quarter on the sheet
        </p>
      )}
      {plan.errors.length > 0 && (
        <ul className="mt-2 space-y-1">
          {plan.errors.map((e, i) => (
            <li key={i} className="flex items-start gap-1.5 text-sm text-rosehip">
              <span
                aria-hidden
                className="mt-0.5 inline-flex h-4 w-4 shrink-0 items-center justify-center rounded-full bg-rosehip text-[10px] font-bold text-white"
              >
                ✕
              </span>
              <span>
                <span className="font-semibold">Not placed:</span>{' '}
                <span className="text-ink">
                  {e.count} × “{e.name}”: {e.reason}
                </span>
              </span>
            </li>
          ))}
        </ul>
      )}
      {plan.patterns.length > 0 && (
        <div className="mt-3 flex flex-wrap gap-4">
          {plan.patterns.map((pt) => (
            <figure key={pt.first} className="w-56">
              <SheetDrawing
                width={plan.sheet.width.inches}
                height={plan.sheet.height.inches}
                blocks={pt.blocks}
                title={
                  pt.count === 1
                    ? `${name}, sheet ${pt.first} of ${plan.sheets}`
                    : `${name}, sheets ${pt.first} to ${pt.first + pt.count - 1} of ${plan.sheets}, all alike`
                }
              />
              <figcaption className="mt-1 text-center text-xs text-pencil">
                {patternLabel(pt.first, pt.count)} of {plan.sheets}
                {pt.count > 1 && (
                  <>
                    {' '}
                    · <span className="font-semibold text-ink">{pt.count} sheets like this</span>
                  </>
                )}{' '}
                · {pt.pieces} piece{pt.pieces === 1 ? '' : 's'}
                {pt.count > 1 ? ' each' : ''}
              </figcaption>
            </figure>
          ))}
        </div>
      )}
    </section>
  );
}

/**
 * One stock sheet drawn to scale in inches, each piece labelled, turned ones marked ↻. A block of
 * many small copies is drawn as one ruled rectangle with a single "name × N" label.
 */
export function SheetDrawing({ width, height, blocks, title }: { width: number; height: number; blocks: PlanBlockDto[]; title: string }) {
  const stroke = Math.max(width, height) / 300;
  return (
    <svg viewBox={`0 0 ${width} ${height}`} role="img" aria-label={title} className="block h-auto w-full" style={{ aspectRatio: `${width} / ${height}` }}>
      <title>{title}</title>
      <rect x={0} y={0} width={width} height={height} fill={palette.paper} stroke={palette.ink} strokeWidth={stroke * 2} />
      {blocks.map((b, i) =>
        b.across * b.down <= CELLS_DRAWN ? (
          <g key={i}>
            {blockCells(b).map((p, j) => (
              <PieceShape key={j} p={p} stroke={stroke} />
            ))}
          </g>
        ) : (
          <RuledBlock key={i} b={b} stroke={stroke} />
        ),
      )}
    </svg>
  );
}

function PieceShape({ p, stroke }: { p: DrawnPiece; stroke: number }) {
  const size = labelSize(p);
  const cx = p.x + p.width / 2;
  const cy = p.y + p.height / 2;
  const upright = p.height > p.width * 1.6;
  return (
    <g>
      <title>{`${p.name}${p.rotated ? ' (turned)' : ''}: ${round(p.width)} x ${round(p.height)} in`}</title>
      {p.outline ? (
        <>
          <rect
            x={p.x}
            y={p.y}
            width={p.width}
            height={p.height}
            fill="none"
            stroke={palette.kraft}
            strokeWidth={stroke}
            strokeDasharray={`${stroke * 4} ${stroke * 3}`}
          />
          {/* the piece's own outline inside the box the trimmer cuts first */}
          <path d={p.outline} transform={`translate(${p.x} ${p.y})`} fill={palette.kraftLight} stroke={palette.kraftDark} strokeWidth={stroke} />
        </>
      ) : p.shape === 'circle' ? (
        <>
          <rect
            x={p.x}
            y={p.y}
            width={p.width}
            height={p.height}
            fill="none"
            stroke={palette.kraft}
            strokeWidth={stroke}
            strokeDasharray={`${stroke * 4} ${stroke * 3}`}
          />
          <circle cx={cx} cy={cy} r={Math.min(p.width, p.height) / 2} fill={palette.kraftLight} stroke={palette.kraftDark} strokeWidth={stroke} />
        </>
      ) : (
        <rect
          x={p.x}
          y={p.y}
          width={p.width}
          height={p.height}
          fill={p.rotated ? palette.sageLight : palette.kraftLight}
          stroke={palette.kraftDark}
          strokeWidth={stroke}
        />
      )}
      {size && <Label x={cx} y={cy} size={size} turn={upright} text={`${p.name}${p.rotated ? ' ↻' : ''}`} />}
    </g>
  );
}

/** Many copies side by side: the block, its cut lines, and one label for all of them. */
function RuledBlock({ b, stroke }: { b: PlanBlockDto; stroke: number }) {
  const w = b.across * b.width;
  const h = b.down * b.height;
  const n = b.across * b.down;
  const text = `${b.name}${b.rotated ? ' ↻' : ''} × ${n}`;
  const size = labelSize({ name: text, width: w, height: h });
  const lines: string[] = [];
  for (let i = 1; i < b.across; i++) lines.push(`M${b.x + i * b.width} ${b.y}v${h}`);
  for (let j = 1; j < b.down; j++) lines.push(`M${b.x} ${b.y + j * b.height}h${w}`);
  return (
    <g>
      <title>{`${n} × ${b.name}${b.rotated ? ' (turned)' : ''}: ${b.across} across, ${b.down} down, each ${round(b.width)} x ${round(b.height)} in`}</title>
      <rect x={b.x} y={b.y} width={w} height={h} fill={b.rotated ? palette.sageLight : palette.kraftLight} stroke={palette.kraftDark} strokeWidth={stroke} />
      <path d={lines.join('')} fill="none" stroke={palette.kraftDark} strokeWidth={stroke / 2} />
      {size && (
        // a paper-coloured band under the label keeps it readable over the cut lines
        <g transform={h > w * 1.6 ? `rotate(-90 ${b.x + w / 2} ${b.y + h / 2})` : undefined}>
          <rect
            x={b.x + w / 2 - text.length * size * 0.3}
            y={b.y + h / 2 - size * 0.7}
            width={text.length * size * 0.6}
            height={size * 1.4}
            fill={palette.paper}
          />
          <Label x={b.x + w / 2} y={b.y + h / 2} size={size} turn={false} text={text} />
        </g>
      )}
    </g>
  );
}

function Label({ x, y, size, turn, text }: { x: number; y: number; size: number; turn: boolean; text: string }) {
  return (
    <text
      x={x}
      y={y}
      fontSize={size}
      textAnchor="middle"
      dominantBaseline="central"
      fill={palette.ink}
      fontFamily="Inter, system-ui, sans-serif"
      transform={turn ? `rotate(-90 ${x} ${y})` : undefined}
    >
      {text}
    </text>
  );
}

const round = (n: number) => Math.round(n * 1000) / 1000;
