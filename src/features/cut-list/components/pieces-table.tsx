import { Fragment, useCallback, useMemo, useState } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { updatePieceSchema, type UpdatePieceInput, type MaterialDto, type PieceDto } from '@shared/schemas/piece';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { pieceChange, useDeletePiece, useMovePiece, useUpdatePiece } from '../api/piece-mutations';
import { useCutList } from './cut-list-context';
import { EditableCell } from './editable-cell';
import { LengthText } from './length-text';
import { MatCell, SaidAtCell } from './piece-cells';
import { PieceChecks } from './piece-checks';
import { ScoreLinesCell } from './score-lines-cell';
import { GrainCell, isRoundShape, ShapeCell, ShapeSizesLine } from './shape-fields';

const col = createColumnHelper<PieceDto>();

/** The schema's own message for one field, so the table refuses what the server would. */
function fieldProblem(change: UpdatePieceInput): string | null {
  const r = updatePieceSchema.safeParse(change);
  return r.success ? null : (r.error.issues[0]?.message ?? 'Not a valid value');
}

/** A piece's notes (notches, tabs, grain) on the line under it, edited like any cell. */
function NotesLine({ piece, onSave }: { piece: PieceDto; onSave: (notes: string) => Promise<unknown> }) {
  const { canEdit } = useCutList();
  if (!canEdit && !piece.notes) return null;
  return (
    <div className="flex max-w-3xl items-start gap-1.5 text-xs">
      <span className="pt-0.5 text-pencil">Notes</span>
      <div className="min-w-0 flex-1">
        <EditableCell
          label={`notes of ${piece.name}`}
          initial={piece.notes}
          placeholder="notches, tabs, grain …"
          display={piece.notes ? <span>{piece.notes}</span> : <span className="text-pencil">add notches, tabs, grain …</span>}
          validate={(t) => fieldProblem({ notes: t })}
          onSave={onSave}
        />
      </div>
    </div>
  );
}

/** The cut list as a table: click a cell to change it; checks sit under each piece. */
export function PiecesTable({ pieces, materials }: { pieces: PieceDto[]; materials: MaterialDto[] }) {
  const { tutorialId, canEdit } = useCutList();
  const { mutateAsync: updateAsync } = useUpdatePiece(tutorialId);
  const { mutate: movePiece, isPending: moving, error: moveError } = useMovePiece(tutorialId);
  const remove = useDeletePiece(tutorialId);
  const [deleting, setDeleting] = useState<PieceDto | null>(null);
  const save = useCallback((p: PieceDto, change: UpdatePieceInput) => updateAsync({ id: p.id, ...pieceChange(p, change) }), [updateAsync]);
  const listId = `materials-${tutorialId}`;

  const columns = useMemo(
    () => [
      col.display({
        id: 'order',
        header: () => <span className="sr-only">Order</span>,
        cell: ({ row }) => {
          const p = row.original;
          const i = row.index;
          if (!canEdit) return <span className="text-xs text-pencil">{i + 1}</span>;
          return (
            <div className="flex flex-col items-center">
              <button
                type="button"
                className="rounded px-1 text-xs leading-none text-pencil hover:bg-kraft-light hover:text-ink disabled:opacity-30"
                aria-label={`Move ${p.name} up`}
                disabled={i === 0 || moving}
                onClick={() => movePiece({ pieces, id: p.id, by: -1 })}
              >
                ▲
              </button>
              <span className="text-xs text-pencil">{i + 1}</span>
              <button
                type="button"
                className="rounded px-1 text-xs leading-none text-pencil hover:bg-kraft-light hover:text-ink disabled:opacity-30"
                aria-label={`Move ${p.name} down`}
                disabled={i === pieces.length - 1 || moving}
                onClick={() => movePiece({ pieces, id: p.id, by: 1 })}
              >
                ▼
              </button>
            </div>
          );
        },
      }),
      col.accessor('name', {
        header: 'Name',
        cell: ({ row }) => {
          const p = row.original;
          return (
            <EditableCell
              label={`name of ${p.name}`}
              initial={p.name}
              display={<span className="font-medium">{p.name}</span>}
              validate={(t) => fieldProblem({ name: t })}
              onSave={(t) => save(p, { name: t })}
            />
          );
        },
      }),
      col.accessor('material', {
        header: 'Material',
        cell: ({ row }) => {
          const p = row.original;
          return (
            <EditableCell
              label={`material of ${p.name}`}
              initial={p.material}
              list={listId}
              placeholder="e.g. white cardstock"
              display={p.material ? p.material : <span className="text-pencil">—</span>}
              onSave={(t) => save(p, { material: t })}
            />
          );
        },
      }),
      col.accessor('quantity', {
        header: () => (
          <abbr title="Quantity" className="no-underline">
            Qty
          </abbr>
        ),
        cell: ({ row }) => {
          const p = row.original;
          return (
            <EditableCell
              kind="number"
              label={`quantity of ${p.name}`}
              initial={String(p.quantity)}
              display={<span className="tabular-nums">{p.quantity}</span>}
              validate={(t) => (/^\d+$/.test(t.trim()) ? fieldProblem({ quantity: Number(t) }) : 'Use a whole number')}
              onSave={(t) => save(p, { quantity: Number(t) })}
            />
          );
        },
      }),
      col.accessor('shape', {
        header: () => <span className="sr-only">Shape</span>,
        cell: ({ row }) => <ShapeCell piece={row.original} onSave={(shape) => save(row.original, { shape })} />,
      }),
      col.accessor((p) => p.width.inches, {
        id: 'width',
        header: 'Width / ⌀',
        cell: ({ row }) => {
          const p = row.original;
          const circle = isRoundShape(p.shape);
          return (
            <EditableCell
              kind="length"
              label={`${circle ? 'diameter' : 'width'} of ${p.name}`}
              initial={p.width.display}
              display={<LengthText value={p.width} stacked prefix={circle ? '⌀ ' : undefined} />}
              onSave={(t) => save(p, { width: t })}
            />
          );
        },
      }),
      col.accessor((p) => p.height.inches, {
        id: 'height',
        header: 'Length',
        cell: ({ row }) => {
          const p = row.original;
          if (isRoundShape(p.shape)) return <span className="text-xs text-pencil">round</span>;
          return (
            <EditableCell
              kind="length"
              label={`length of ${p.name}`}
              initial={p.height.display}
              display={<LengthText value={p.height} stacked />}
              onSave={(t) => save(p, { height: t })}
            />
          );
        },
      }),
      col.display({
        id: 'scoreLines',
        header: 'Score lines',
        cell: ({ row }) => <ScoreLinesCell piece={row.original} onSave={(scoreLines) => save(row.original, { scoreLines })} />,
      }),
      col.accessor('matOnId', {
        header: 'Mat',
        cell: ({ row }) => <MatCell piece={row.original} pieces={pieces} onSave={(matOnId) => save(row.original, { matOnId })} />,
      }),
      col.accessor('saidAtMs', { header: 'Said', cell: ({ row }) => <SaidAtCell piece={row.original} /> }),
      col.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: ({ row }) =>
          canEdit ? (
            <button
              type="button"
              className="rounded px-1.5 py-0.5 text-xs text-rosehip hover:bg-rosehip-light"
              aria-label={`Delete ${row.original.name}`}
              onClick={() => setDeleting(row.original)}
            >
              Delete
            </button>
          ) : null,
      }),
    ],
    // The cells read the list for mats and moves; the mutations' functions are stable.
    [pieces, canEdit, moving, movePiece, save, listId],
  );

  const table = useReactTable({ data: pieces, columns, getCoreRowModel: getCoreRowModel(), getRowId: (p) => p.id });
  // Notes are free sentences, so they get the full width of the line under the piece instead of a column.
  // Column names beside the values when a phone shows each piece as a card (.stack-table).
  const labels: Record<string, string> = {
    order: 'Order',
    name: 'Name',
    material: 'Material',
    quantity: 'Quantity',
    shape: 'Shape',
    width: 'Width / ⌀',
    height: 'Length',
    scoreLines: 'Score lines',
    matOnId: 'Mat',
    saidAtMs: 'Said',
  };
  const widths: Record<string, string> = {
    order: 'w-8',
    name: 'w-[17%]',
    material: 'w-[13%]',
    quantity: 'w-10',
    shape: 'w-9',
    width: 'w-[5.75rem]',
    height: 'w-[5.75rem]',
    scoreLines: 'w-[15%]',
    matOnId: 'w-[12%]',
    saidAtMs: 'w-12',
    actions: 'w-14',
  };

  return (
    <div>
      {moveError && (
        <div className="mb-2">
          <Notice kind="error">{moveError.message}</Notice>
        </div>
      )}
      <datalist id={listId}>
        {materials.map((m) => (
          <option key={m.id} value={m.name} />
        ))}
      </datalist>
      <div className="sm:rounded-lg sm:border sm:border-line sm:bg-white">
        <table className="stack-table w-full table-fixed text-sm">
          <thead className="text-left text-xs text-pencil">
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id} className="border-b border-line">
                {g.headers.map((h) => (
                  <th key={h.id} scope="col" className={`px-1.5 py-2 font-medium ${widths[h.column.id] ?? ''}`}>
                    {flexRender(h.column.columnDef.header, h.getContext())}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <Fragment key={row.id}>
                <tr className="stack-more-above border-t border-line align-top first:border-t-0" aria-label={row.original.name}>
                  {row.getVisibleCells().map((c) => (
                    <td key={c.id} className="px-1.5 pt-2 pb-1" data-label={labels[c.column.id]}>
                      {flexRender(c.column.columnDef.cell, c.getContext())}
                    </td>
                  ))}
                </tr>
                <tr className="stack-more">
                  <td />
                  <td colSpan={row.getVisibleCells().length - 1} className="space-y-1 px-2 pb-2.5">
                    <div className="flex flex-wrap items-start gap-x-4 gap-y-1 text-xs">
                      <GrainCell piece={row.original} onSave={(grain) => save(row.original, { grain })} />
                      <ShapeSizesLine piece={row.original} onSave={(params) => save(row.original, { params })} />
                    </div>
                    <NotesLine piece={row.original} onSave={(notes) => save(row.original, { notes })} />
                    <PieceChecks checks={row.original.checks} />
                  </td>
                </tr>
              </Fragment>
            ))}
          </tbody>
        </table>
      </div>
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete “${deleting?.name ?? ''}”?`}
        confirmLabel="Delete piece"
        danger
        busy={remove.isPending}
        onCancel={() => {
          remove.reset();
          setDeleting(null);
        }}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSuccess: () => setDeleting(null) })}
      >
        <p>The piece leaves the cut list, the sheet plan and the handout. Mats that sat on it stop sitting on anything.</p>
        {remove.error && (
          <div className="mt-2">
            <Notice kind="error">{remove.error.message}</Notice>
          </div>
        )}
      </ConfirmDialog>
    </div>
  );
}
