import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useRestoreSupply } from '../api/create-supply';
import { useDeleteSupply } from '../api/delete-supply';
import { useSupplies } from '../api/get-supplies';
import { useReorderSupplies } from '../api/reorder-supplies';
import type { SupplyDto, UpdateSupplyInput } from '@shared/schemas/supply';
import { useUpdateSupply } from '../api/update-supply';
import { groupByCategory, moveSupply } from '../utils/supply-order';
import { DisclosurePanel } from './disclosure-panel';
import { PasteList } from './paste-list';
import { SheetChecksPanel } from './sheet-checks-panel';
import { SuppliesTable } from './supplies-table';
import { UndoBar } from './undo-bar';

/**
 * A tutorial's Supplies section: the table (grouped by category or in list order), the add row
 * and the "Paste a list" helper for people who may edit, and the sponsorship disclosure.
 */
export function SuppliesSection({ tutorialId, canEdit: tutorialCanEdit }: { tutorialId: string; canEdit: boolean }) {
  const q = useSupplies(tutorialId);
  const update = useUpdateSupply(tutorialId);
  const reorder = useReorderSupplies(tutorialId);
  const remove = useDeleteSupply(tutorialId);
  const restore = useRestoreSupply(tutorialId);
  const [grouped, setGrouped] = useState(true);
  const [pasting, setPasting] = useState(false);
  const [deleted, setDeleted] = useState<SupplyDto | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const box = useRef<HTMLDivElement>(null);
  // Which control gets the focus once a move or a delete has changed the rows (not before).
  const focusNext = useRef<{ key: string; from: SupplyDto[] } | null>(null);

  const supplies = q.data?.supplies;
  const updateAsync = update.mutateAsync;
  const onChange = useCallback((id: string, change: UpdateSupplyInput) => updateAsync({ id, ...change }), [updateAsync]);

  const onMove = useCallback(
    (id: string, step: -1 | 1) => {
      if (!supplies) return;
      const next = moveSupply(supplies, id, step, grouped);
      if (!next) return;
      focusNext.current = { key: `${id}:${step < 0 ? 'up' : 'down'}`, from: supplies };
      setProblem(null);
      reorder.mutate(next, { onError: (e) => setProblem(`The new order was not saved: ${e.message}`) });
    },
    [supplies, grouped, reorder],
  );

  const onDelete = useCallback(
    (s: SupplyDto) => {
      if (!supplies) return;
      const shown = grouped ? groupByCategory(supplies).flatMap((g) => g.items) : supplies;
      const i = shown.findIndex((x) => x.id === s.id);
      const neighbour = shown[i + 1] ?? shown[i - 1];
      focusNext.current = { key: neighbour ? `${neighbour.id}:name` : 'new:name', from: supplies };
      setProblem(null);
      setDeleted(s);
      remove.mutate(s.id, {
        onError: (e) => {
          setDeleted(null);
          setProblem(`“${s.name}” was not deleted: ${e.message}`);
        },
      });
    },
    [supplies, grouped, remove],
  );

  useLayoutEffect(() => {
    if (!focusNext.current || focusNext.current.from === supplies || !box.current) return;
    const { key } = focusNext.current;
    const find = (k: string) => box.current!.querySelector<HTMLElement>(`[data-focus-key="${k}"]:not(:disabled)`);
    // A row moved to the top or bottom has its button disabled: the other direction takes the focus.
    const other = key.endsWith(':up') ? key.replace(/:up$/, ':down') : key.replace(/:down$/, ':up');
    const el = find(key) ?? find(other) ?? box.current.querySelector<HTMLElement>('input[aria-label="New supply name"]');
    if (el) {
      el.focus();
      focusNext.current = null;
    }
  });

  const undo = () => {
    const s = deleted;
    if (!s) return;
    setDeleted(null);
    restore.mutate(s, { onError: (e) => setProblem(`“${s.name}” could not be put back: ${e.message}`) });
  };

  useEffect(() => setProblem(null), [tutorialId]);

  if (q.isPending) return <Loading label="Loading the supplies" />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const canEdit = q.data.abilities.update && tutorialCanEdit;
  const list = q.data.supplies;

  return (
    <section aria-labelledby="supplies-title" className="space-y-5" ref={box}>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h2 id="supplies-title" className="text-xl">
            Supplies
          </h2>
          <p className="mt-1 max-w-2xl text-sm text-pencil">
            Everything a maker needs for this project, with shop links where you have them. The list goes into the write-up, the handout and the video
            description{canEdit ? '; click a cell to change it (Enter or leaving the field saves, Escape cancels).' : '.'}
          </p>
        </div>
        <div className="flex items-center gap-3">
          {list.length > 1 && <ViewToggle grouped={grouped} onChange={setGrouped} />}
          {canEdit && !pasting && (
            <Button variant="secondary" size="sm" onClick={() => setPasting(true)}>
              Paste a list
            </Button>
          )}
        </div>
      </div>

      {problem && <Notice kind="error">{problem}</Notice>}

      {list.length === 0 &&
        (canEdit ? (
          <EmptyState title="No supplies yet">
            List the papers, cardstock, embellishments, adhesives and tools a maker needs for this project. Type them one at a time in the row below (Enter adds
            each one), or use “Paste a list” if you already have them written down.
          </EmptyState>
        ) : (
          <EmptyState title="No supplies yet">The supplies have not been listed yet. Someone who edits this tutorial can add them here.</EmptyState>
        ))}

      {pasting && canEdit && <PasteList tutorialId={tutorialId} onClose={() => setPasting(false)} />}

      {(list.length > 0 || canEdit) && (
        <SuppliesTable
          tutorialId={tutorialId}
          supplies={list}
          grouped={grouped && list.length > 1}
          canEdit={canEdit}
          onMove={onMove}
          onDelete={onDelete}
          onChange={onChange}
        />
      )}

      <SheetChecksPanel tutorialId={tutorialId} canEdit={canEdit} where="supplies" />

      <hr className="score-rule" />
      <DisclosurePanel tutorialId={tutorialId} disclosure={q.data.disclosure} canEdit={canEdit} />

      {deleted && <UndoBar key={deleted.id} name={deleted.name} onUndo={undo} onDone={() => setDeleted(null)} />}
    </section>
  );
}

function ViewToggle({ grouped, onChange }: { grouped: boolean; onChange: (g: boolean) => void }) {
  const opt = (value: boolean, label: string) => (
    <button
      type="button"
      aria-pressed={grouped === value}
      onClick={() => onChange(value)}
      className={`px-3 py-1 text-sm ${grouped === value ? 'bg-kraft text-white' : 'bg-white text-ink hover:bg-kraft-light'}`}
    >
      {label}
    </button>
  );
  return (
    <div role="group" aria-label="Show the supplies" className="inline-flex overflow-hidden rounded-md border border-line">
      {opt(true, 'By category')}
      {opt(false, 'In list order')}
    </div>
  );
}
