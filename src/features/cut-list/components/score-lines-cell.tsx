import { useEffect, useId, useRef, useState } from 'react';
import { formatLength, formatMm, groupScoreLines, inchesNumber, mmNumber, parseStoredLength, serializeLength, type Length } from '@shared/measure';
import { ApiError } from '@/lib/api-client';
import { Button } from '@/components/ui/button';
import { readTyped } from '../utils/lengths';
import type { LengthDto, PieceDto } from '@shared/schemas/piece';
import { useCutList } from './cut-list-context';
import { saveErrorText } from './editable-cell';
import { LengthPreview, LengthText } from './length-text';

type Draft = { axis: 'width' | 'height'; at: string; tab: boolean };

/** The API's length form for a length worked out here (a repeat's step). */
const lengthDto = (l: Length): LengthDto => ({
  value: serializeLength(l),
  inches: inchesNumber(l),
  mm: mmNumber(l),
  display: formatLength(l),
  mmDisplay: formatMm(l),
});

const AXIS_WORD = { width: 'on width', height: 'on length' } as const;

/** Score lines in the table: a short list, edited as a list in a small panel under the cell. */
export function ScoreLinesCell({ piece, onSave }: { piece: PieceDto; onSave: (lines: Draft[]) => Promise<unknown> }) {
  const { canEdit, defaultUnit, precision } = useCutList();
  const nameId = useId();
  const shownId = useId();
  const [open, setOpen] = useState(false);
  const [drafts, setDrafts] = useState<Draft[]>([]);
  const [errors, setErrors] = useState<Record<number, string>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const panel = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const settled = useRef(false);
  const circle = piece.shape === 'circle';

  useEffect(() => {
    if (open) panel.current?.querySelector<HTMLElement>('input, select, button')?.focus();
  }, [open]);

  // evenly spaced runs ("every 1/4 in") show as one line rather than dozens of positions
  const groups = groupScoreLines(piece.scoreLines.map((s) => ({ ...s, dto: s, at: parseStoredLength(s.at.value) })));
  const list =
    piece.scoreLines.length === 0 ? (
      <span className="text-pencil">none</span>
    ) : (
      // Spaces between the parts (flex drops them from the layout) keep the button's name readable: "7 in 177.8 mm on width".
      <ul className="space-y-0.5">
        {groups.map((g, i) =>
          g.kind === 'every' ? (
            <li key={i} className="flex flex-wrap items-baseline gap-x-1">
              <LengthText value={lengthDto(g.step)} prefix="every " />{' '}
              <span className="text-xs text-pencil">
                {AXIS_WORD[g.axis]} · {g.lines[0]!.dto.at.display} to {g.lines[g.lines.length - 1]!.dto.at.display} ({g.lines.length} lines)
                {g.lines.some((l) => l.tab) ? ' · tabs' : ''}
              </span>{' '}
            </li>
          ) : (
            <li key={i} className="flex flex-wrap items-baseline gap-x-1">
              <LengthText value={g.line.dto.at} />{' '}
              <span className="text-xs text-pencil">
                {AXIS_WORD[g.line.axis]}
                {g.line.tab ? ' · tab' : ''}
              </span>{' '}
            </li>
          ),
        )}
      </ul>
    );
  if (!canEdit) return list;

  const start = () => {
    setDrafts(piece.scoreLines.map((s) => ({ axis: s.axis, at: s.at.display, tab: s.tab })));
    setErrors({});
    setFormError(null);
    settled.current = false;
    setOpen(true);
  };
  const close = (refocus: boolean) => {
    settled.current = true;
    setOpen(false);
    if (refocus) requestAnimationFrame(() => button.current?.focus());
  };
  const unchanged = () =>
    drafts.length === piece.scoreLines.length &&
    drafts.every((d, i) => d.axis === piece.scoreLines[i]!.axis && d.tab === piece.scoreLines[i]!.tab && d.at.trim() === piece.scoreLines[i]!.at.display);
  const save = async (refocus: boolean) => {
    if (settled.current || saving) return;
    if (unchanged()) return close(refocus);
    const found: Record<number, string> = {};
    drafts.forEach((d, i) => {
      const r = readTyped(d.at, defaultUnit, precision);
      if (r.state === 'empty') found[i] = 'Enter where the line goes, or remove it';
      else if (r.state === 'error') found[i] = r.message;
    });
    setErrors(found);
    if (Object.keys(found).length) return;
    setSaving(true);
    try {
      // An untouched line goes back in its exact stored form, so it cannot drift.
      await onSave(
        drafts.map((d, i) => {
          const old = piece.scoreLines[i];
          return { axis: d.axis, tab: d.tab, at: old && d.at.trim() === old.at.display ? old.at.value : d.at.trim() };
        }),
      );
      close(refocus);
    } catch (e) {
      const byRow: Record<number, string> = {};
      if (e instanceof ApiError)
        for (const i of e.issues) {
          const m = /^scoreLines\.(\d+)/.exec(i.path);
          if (m) byRow[Number(m[1])] = i.message;
        }
      setErrors(byRow);
      setFormError(saveErrorText(e));
    } finally {
      setSaving(false);
    }
  };
  const set = (i: number, change: Partial<Draft>) => setDrafts((ds) => ds.map((d, k) => (k === i ? { ...d, ...change } : d)));

  return (
    <div className="relative">
      <button
        ref={button}
        type="button"
        onClick={open ? undefined : start}
        // What it does, then what it shows: the visible words are part of the name (WCAG 2.5.3).
        aria-labelledby={`${nameId} ${shownId}`}
        aria-expanded={open}
        className="-mx-1 block w-[calc(100%+0.5rem)] rounded px-1 py-0.5 text-left hover:bg-kraft-light/60"
      >
        <span id={shownId}>{list}</span>
      </button>
      <span id={nameId} hidden>
        Edit score lines of {piece.name}
      </span>
      {open && (
        <div
          ref={panel}
          role="group"
          aria-label={`Score lines of ${piece.name}`}
          className="absolute left-0 top-full z-20 mt-1 w-[26rem] rounded-md border border-line bg-paper p-3 shadow-lg"
          onBlur={(e) => {
            if (!panel.current?.contains(e.relatedTarget as Node | null)) void save(false);
          }}
          onKeyDown={(e) => {
            if (e.key === 'Escape') {
              e.preventDefault();
              close(true);
            } else if (e.key === 'Enter' && (e.target as HTMLElement).tagName === 'INPUT' && (e.target as HTMLInputElement).type === 'text') {
              e.preventDefault();
              void save(true);
            }
          }}
        >
          <p className="mb-2 text-xs text-pencil">
            Each line is measured from the left edge (on width) or the top edge (on length). A tab line may sit close to an edge.
          </p>
          {drafts.length === 0 && <p className="mb-2 text-sm text-pencil">No score lines.</p>}
          <ul className="space-y-2">
            {drafts.map((d, i) => (
              <li key={i} className="flex items-start gap-2">
                <select
                  aria-label={`Score line ${i + 1} measured on`}
                  className="rounded border border-field bg-white px-1 py-0.5 text-sm"
                  value={d.axis}
                  onChange={(e) => set(i, { axis: e.target.value as Draft['axis'] })}
                  disabled={circle}
                >
                  <option value="width">on width</option>
                  <option value="height">on length</option>
                </select>
                <div className="flex-1">
                  <input
                    type="text"
                    aria-label={`Score line ${i + 1} at`}
                    aria-invalid={errors[i] ? true : undefined}
                    className={`w-full rounded border bg-white px-1.5 py-0.5 text-sm ${errors[i] ? 'border-rosehip' : 'border-field'}`}
                    placeholder="at, e.g. 4 1/4"
                    value={d.at}
                    readOnly={saving}
                    onChange={(e) => {
                      set(i, { at: e.target.value });
                      setErrors((x) => ({ ...x, [i]: '' }));
                    }}
                  />
                  {errors[i] ? (
                    <p role="alert" className="text-xs text-rosehip">
                      {errors[i]}
                    </p>
                  ) : (
                    <LengthPreview text={d.at} />
                  )}
                </div>
                <label className="flex items-center gap-1 pt-1 text-xs">
                  <input type="checkbox" checked={d.tab} onChange={(e) => set(i, { tab: e.target.checked })} /> tab
                </label>
                <Button
                  size="sm"
                  variant="ghost"
                  className="text-rosehip"
                  aria-label={`Remove score line ${i + 1}`}
                  onClick={() => {
                    // Focus stays in the panel, so removing the focused button does not read as leaving it.
                    panel.current?.querySelector<HTMLElement>('[data-add-line]')?.focus();
                    setDrafts((ds) => ds.filter((_, k) => k !== i));
                  }}
                >
                  Remove
                </Button>
              </li>
            ))}
          </ul>
          {formError && (
            <p role="alert" className="mt-2 text-xs text-rosehip">
              {formError}
            </p>
          )}
          <div className="mt-3 flex items-center gap-2">
            <Button
              size="sm"
              variant="secondary"
              data-add-line
              onClick={() => setDrafts((ds) => [...ds, { axis: ds.at(-1)?.axis ?? 'width', at: '', tab: false }])}
            >
              Add score line
            </Button>
            <span className="flex-1" />
            <Button size="sm" variant="ghost" onClick={() => close(true)}>
              Cancel
            </Button>
            <Button size="sm" busy={saving} onClick={() => void save(true)}>
              Save
            </Button>
          </div>
        </div>
      )}
    </div>
  );
}
