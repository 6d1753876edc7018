import { useEffect, useRef, useState, type ReactNode } from 'react';
import { SHAPE_LABELS } from '@shared/geometry';
import { GRAINS, PIECE_SHAPES, ROUND_SHAPES } from '@shared/measure';
import type { Grain, PieceDto, PieceShape, ShapeParamsInput, TagTop } from '@shared/schemas/piece';
import { useCutList } from './cut-list-context';
import { EditableCell, saveErrorText } from './editable-cell';
import { LengthText } from './length-text';

/** The words a crafter reads for each grain setting. */
export const GRAIN_LABELS: Record<Grain, string> = { length: 'along its length', width: 'along its width', any: 'any way' };

/** A shape's name with a capital, for selects. */
export const shapeName = (s: PieceShape) => SHAPE_LABELS[s].replace(/^./, (c) => c.toUpperCase());

/** A small drawing of the piece's own outline (from the server's exact outline), or a plain box while it has none. */
export function ShapeIcon({ piece }: { piece: Pick<PieceDto, 'shape' | 'outline' | 'extent'> }) {
  const w = piece.extent.width.inches || 1;
  const h = piece.extent.height.inches || 1;
  if (!piece.outline) return <span aria-hidden className="inline-block h-3 w-4 border-[1.5px] border-dashed border-current" />;
  // The longer side fills the icon; a stroke that keeps its width at any scale.
  const box = Math.max(w, h);
  return (
    <svg aria-hidden viewBox={`${-box * 0.06} ${-box * 0.06} ${box * 1.12} ${box * 1.12}`} className="h-5 w-5">
      <path
        d={piece.outline}
        transform={`translate(${(box - w) / 2} ${(box - h) / 2})`}
        fill="none"
        stroke="currentColor"
        strokeWidth={1.5}
        vectorEffect="non-scaling-stroke"
      />
    </svg>
  );
}

/**
 * A value chosen from a list, shown as text until clicked; saved as soon as it changes, Escape
 * leaves it as it was. The same click-to-edit manner as the other cells.
 */
export function InlineSelect<T extends string>({
  label,
  value,
  options,
  display,
  onSave,
  describe,
}: {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  display: ReactNode;
  onSave: (v: T) => Promise<unknown>;
  /** What the button says it shows, for speech users (WCAG 2.5.3). */
  describe: string;
}) {
  const { canEdit } = useCutList();
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const select = useRef<HTMLSelectElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (editing) select.current?.focus();
  }, [editing]);
  if (!canEdit) return <>{display}</>;
  const done = () => {
    setEditing(false);
    requestAnimationFrame(() => button.current?.focus());
  };
  if (!editing)
    return (
      <>
        <button
          ref={button}
          type="button"
          aria-label={`Edit ${label}: ${describe}`}
          onClick={() => {
            setError(null);
            setEditing(true);
          }}
          className="-mx-1 inline-flex items-center gap-1 rounded px-1 py-0.5 text-left hover:bg-kraft-light/60"
        >
          {display}
        </button>
        {error && (
          <p role="alert" className="text-xs text-rosehip">
            {error}
          </p>
        )}
      </>
    );
  return (
    <div>
      <select
        ref={select}
        aria-label={label}
        className="rounded border border-field bg-white px-1 py-0.5 text-sm"
        defaultValue={value}
        disabled={saving}
        onKeyDown={(e) => e.key === 'Escape' && (e.preventDefault(), done())}
        onBlur={() => !saving && !error && setEditing(false)}
        onChange={async (e) => {
          setSaving(true);
          setError(null);
          try {
            await onSave(e.target.value as T);
            done();
          } catch (err) {
            setError(saveErrorText(err));
          } finally {
            setSaving(false);
          }
        }}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error && (
        <p role="alert" className="text-xs text-rosehip">
          {error}
        </p>
      )}
    </div>
  );
}

const SHAPE_OPTIONS = PIECE_SHAPES.map((s) => ({ value: s, label: shapeName(s) }));

/** The piece's shape: its outline as an icon; click to choose another of the eight shapes. */
export function ShapeCell({ piece, onSave }: { piece: PieceDto; onSave: (shape: PieceShape) => Promise<unknown> }) {
  const word = shapeName(piece.shape);
  return (
    <InlineSelect
      label={`shape of ${piece.name}`}
      describe={word}
      value={piece.shape}
      options={SHAPE_OPTIONS}
      onSave={onSave}
      display={
        <span className="inline-flex items-center" title={word}>
          <ShapeIcon piece={piece} />
          <span className="sr-only">{word}</span>
        </span>
      }
    />
  );
}

const GRAIN_OPTIONS = GRAINS.map((g) => ({ value: g, label: `Grain ${GRAIN_LABELS[g]}` }));

/** Which way the grain must run in the piece; the sheet plan and the template follow it. */
export function GrainCell({ piece, onSave }: { piece: PieceDto; onSave: (g: Grain) => Promise<unknown> }) {
  const arrow =
    piece.grain === 'any'
      ? ''
      : piece.grain === 'length'
        ? piece.height.inches >= piece.width.inches
          ? '↕ '
          : '↔ '
        : piece.height.inches >= piece.width.inches
          ? '↔ '
          : '↕ ';
  const words = `grain ${GRAIN_LABELS[piece.grain]}`;
  return (
    <InlineSelect
      label={`grain of ${piece.name}`}
      describe={words}
      value={piece.grain}
      options={GRAIN_OPTIONS}
      onSave={onSave}
      display={
        <span className={piece.grain === 'any' ? 'text-pencil' : ''}>
          <span aria-hidden>{arrow}</span>
          {words}
        </span>
      }
    />
  );
}

type LengthKey = 'cornerRadius' | 'scallopSize' | 'tagCorner' | 'holeDiameter' | 'holeFromTop' | 'depth' | 'glueFlap';

/** The sizes each shape has beyond its width and length, with their labels. */
const SHAPE_SIZES: Partial<Record<PieceShape, { key: LengthKey | 'scallopCount' | 'tagTop'; label: string; hint?: string }[]>> = {
  'rounded-rect': [{ key: 'cornerRadius', label: 'Corner radius' }],
  'scalloped-rect': [
    { key: 'scallopSize', label: 'Scallop size', hint: 'the count follows' },
    { key: 'scallopCount', label: 'Scallops across the top', hint: 'the size follows' },
  ],
  'scalloped-circle': [
    { key: 'scallopSize', label: 'Scallop size', hint: 'the count follows' },
    { key: 'scallopCount', label: 'Scallops all round', hint: 'the size follows' },
  ],
  tag: [
    { key: 'tagTop', label: 'Top corners' },
    { key: 'tagCorner', label: 'Corner' },
    { key: 'holeDiameter', label: 'Hole' },
    { key: 'holeFromTop', label: 'Hole from the top' },
  ],
  'pillow-box': [
    { key: 'depth', label: 'Depth' },
    { key: 'glueFlap', label: 'Glue flap' },
  ],
};

/**
 * The line under a piece with its shape's own sizes (corner radius, scallops, tag corners and
 * hole, box depth), each edited in place, and the shape's summary in words.
 */
export function ShapeSizesLine({ piece, onSave }: { piece: PieceDto; onSave: (params: ShapeParamsInput) => Promise<unknown> }) {
  const fields = SHAPE_SIZES[piece.shape];
  // An oval has no sizes of its own, but its trim length is worth seeing.
  if (!fields)
    return piece.shapeSummary ? (
      <span className="pt-0.5 text-pencil">
        {shapeName(piece.shape)} · {piece.shapeSummary}
      </span>
    ) : null;
  const count = piece.params.scallopCount;
  return (
    <div
      className="flex max-w-3xl flex-wrap items-start gap-x-4 gap-y-1 text-xs"
      role="group"
      aria-label={`${SHAPE_LABELS[piece.shape]} sizes of ${piece.name}`}
    >
      <span className="pt-0.5 text-pencil">{shapeName(piece.shape)}</span>
      {fields.map((f) => {
        if (f.key === 'tagTop') {
          const top: TagTop = piece.params.tagTop ?? 'clipped';
          return (
            <span key={f.key} className="inline-flex items-start gap-1">
              <span className="whitespace-nowrap pt-0.5 text-pencil">{f.label}</span>
              <InlineSelect
                label={`top corners of ${piece.name}`}
                describe={top}
                value={top}
                options={[
                  { value: 'clipped', label: 'clipped' },
                  { value: 'rounded', label: 'rounded' },
                ]}
                onSave={(v) => onSave({ tagTop: v })}
                display={<span>{top}</span>}
              />
            </span>
          );
        }
        if (f.key === 'scallopCount') {
          return (
            <span key={f.key} className="inline-flex items-start gap-1">
              <span className="whitespace-nowrap pt-0.5 text-pencil">{f.label}</span>
              <EditableCell
                kind="number"
                label={`${f.label.toLowerCase()} of ${piece.name}`}
                initial={count !== undefined ? String(count) : ''}
                placeholder={f.hint}
                display={count !== undefined ? <span className="tabular-nums">{count}</span> : <span className="text-pencil">from the size</span>}
                validate={(t) => (/^\d+$/.test(t.trim()) && Number(t) >= 2 && Number(t) <= 400 ? null : 'Use a whole number from 2 to 400')}
                onSave={(t) => onSave({ scallopCount: Number(t), scallopSize: null })}
              />
            </span>
          );
        }
        const value = piece.params[f.key];
        const scallopFromCount = f.key === 'scallopSize' && count !== undefined;
        return (
          <span key={f.key} className="inline-flex items-start gap-1">
            <span className="whitespace-nowrap pt-0.5 text-pencil">{f.label}</span>
            <EditableCell
              kind="length"
              label={`${f.label.toLowerCase()} of ${piece.name}`}
              initial={value?.display ?? ''}
              placeholder="e.g. 1/4"
              display={value ? <LengthText value={value} /> : <span className="text-pencil">{scallopFromCount ? 'from the count' : 'add'}</span>}
              onSave={(t) => onSave(f.key === 'scallopSize' ? { scallopSize: t, scallopCount: null } : { [f.key]: t })}
            />
          </span>
        );
      })}
      {piece.shapeSummary && <span className="pt-0.5 text-pencil">· {piece.shapeSummary}</span>}
    </div>
  );
}

/** Round shapes keep one size, their diameter. */
export const isRoundShape = (s: PieceShape) => ROUND_SHAPES.includes(s);
