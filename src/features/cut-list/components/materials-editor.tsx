import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { SHEET_SIZES } from '@shared/geometry';
import { formatLength, serializeLength } from '@shared/measure';
import { materialSchema, type MaterialDto, type MaterialKind, type PieceDto, type SheetGrain } from '@shared/schemas/piece';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { EmptyState } from '@/components/ui/empty-state';
import { SelectField, TextField } from '@/components/ui/field';
import { Loading } from '@/components/ui/spinner';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { useMaterials } from '../api/get-materials';
import { useCreateMaterial, useDeleteMaterial, useUpdateMaterial } from '../api/material-mutations';
import { useCutList } from './cut-list-context';
import { LengthPreview, LengthText } from './length-text';

type Values = z.input<typeof materialSchema>;

/** The words for a stock sheet's grain, as the sheet plan says them. */
const SHEET_GRAIN_LABELS: Record<SheetGrain, string> = {
  height: 'grain ↕ along the sheet’s height',
  width: 'grain ↔ along the sheet’s width',
  none: 'grain not known',
};
const KINDS: MaterialKind[] = ['cardstock', 'patterned paper', 'paper', 'vellum', 'acetate', 'other'];

/** The stock sheet preset a material's sheet matches, or "custom". */
function presetOf(m: Pick<MaterialDto, 'sheetWidth' | 'sheetHeight'>): string {
  return SHEET_SIZES.find((s) => serializeLength(s.width) === m.sheetWidth.value && serializeLength(s.height) === m.sheetHeight.value)?.id ?? 'custom';
}

/** Materials and the stock sheets they come in; pieces name their material, the sheet plan groups by it. */
export function MaterialsEditor({ pieces }: { pieces: PieceDto[] }) {
  const { tutorialId, canEdit } = useCutList();
  const q = useMaterials(tutorialId);
  const remove = useDeleteMaterial(tutorialId);
  const [editing, setEditing] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<MaterialDto | null>(null);
  if (q.isPending) return <Loading label="Loading materials" />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const materials = q.data.materials;
  const known = new Set(materials.map((m) => m.name.toLowerCase()));
  const unlisted = [...new Set(pieces.map((p) => p.material).filter((n) => n && !known.has(n.toLowerCase())))];
  const uses = (m: MaterialDto) => pieces.filter((p) => p.material.toLowerCase() === m.name.toLowerCase()).length;

  return (
    <div className="space-y-4">
      <p className="text-sm text-pencil">Pieces of a material are laid out on its stock sheet. A material not listed here is planned on 12 x 12 in sheets.</p>
      {materials.length === 0 ? (
        <EmptyState title="No materials yet">
          {canEdit
            ? 'Add the papers this project uses with the sheet size they come in, so the sheet plan and the size checks use the right stock.'
            : 'Every piece is planned on 12 x 12 in sheets until a material is added.'}
        </EmptyState>
      ) : (
        <ul className="divide-y divide-line rounded-lg border border-line bg-white">
          {materials.map((m) =>
            editing === m.id ? (
              <li key={m.id} className="p-3">
                <MaterialForm material={m} onDone={() => setEditing(null)} />
              </li>
            ) : (
              <li
                key={m.id}
                className="flex flex-wrap items-center gap-x-3 gap-y-1 px-3 py-2 text-sm sm:grid sm:grid-cols-[minmax(0,1.2fr)_7.5rem_minmax(0,1.7fr)_minmax(0,1fr)_4.5rem_7.5rem]"
              >
                <span className="truncate font-medium" title={m.name}>
                  {m.name}
                </span>
                <span className="text-pencil">{m.kind}</span>
                <span className="inline-flex flex-wrap items-baseline gap-x-1">
                  <LengthText value={m.sheetWidth} /> <span className="text-pencil">×</span> <LengthText value={m.sheetHeight} />
                </span>
                <span className="text-xs text-pencil">
                  {m.rotate ? 'pieces may turn' : 'kept upright (directional print)'}
                  <br />
                  {SHEET_GRAIN_LABELS[m.grain]}
                </span>
                <span className="text-xs text-pencil">
                  {uses(m)} piece{uses(m) === 1 ? '' : 's'}
                </span>
                <span className="ml-auto flex justify-end gap-1">
                  {canEdit && (
                    <>
                      <Button size="sm" variant="ghost" onClick={() => setEditing(m.id)} aria-label={`Edit ${m.name}`}>
                        Edit
                      </Button>
                      <Button size="sm" variant="ghost" className="text-rosehip" onClick={() => setDeleting(m)} aria-label={`Delete ${m.name}`}>
                        Delete
                      </Button>
                    </>
                  )}
                </span>
              </li>
            ),
          )}
        </ul>
      )}
      {unlisted.length > 0 && (
        <p className="text-xs text-pencil">Named on pieces but not listed (planned on 12 x 12 in): {unlisted.map((n) => `“${n}”`).join(', ')}.</p>
      )}
      {canEdit && (
        <div className="rounded-lg border border-line bg-white p-3">
          <h4 className="mb-2 text-sm font-medium">Add a material</h4>
          <MaterialForm suggestions={unlisted} />
        </div>
      )}
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete “${deleting?.name ?? ''}”?`}
        confirmLabel="Delete material"
        danger
        busy={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSuccess: () => setDeleting(null) })}
      >
        Its pieces keep the name and are planned on 12 x 12 in sheets until it is added again.
      </ConfirmDialog>
    </div>
  );
}

function MaterialForm({ material, onDone, suggestions = [] }: { material?: MaterialDto; onDone?: () => void; suggestions?: string[] }) {
  const { tutorialId } = useCutList();
  const create = useCreateMaterial(tutorialId);
  const update = useUpdateMaterial(tutorialId);
  const [formError, setFormError] = useState<string | null>(null);
  const start = material ? presetOf(material) : '12x12';
  const [preset, setPreset] = useState(start);
  const sizeOf = (id: string) => SHEET_SIZES.find((s) => s.id === id);
  const initialSize = sizeOf(start);
  const { register, handleSubmit, setError, setValue, reset, watch, formState } = useForm<Values, unknown, z.output<typeof materialSchema>>({
    resolver: zodResolver(materialSchema),
    defaultValues: material
      ? {
          name: material.name,
          kind: material.kind,
          sheetWidth: material.sheetWidth.display,
          sheetHeight: material.sheetHeight.display,
          rotate: material.rotate,
          grain: material.grain,
        }
      : {
          name: suggestions[0] ?? '',
          kind: 'cardstock',
          sheetWidth: formatLength(initialSize!.width),
          sheetHeight: formatLength(initialSize!.height),
          rotate: true,
          grain: 'none',
        },
  });
  const choose = (id: string) => {
    setPreset(id);
    const s = sizeOf(id);
    if (s) {
      setValue('sheetWidth', formatLength(s.width), { shouldValidate: true });
      setValue('sheetHeight', formatLength(s.height), { shouldValidate: true });
    }
  };
  const submit = handleSubmit(async (v) => {
    setFormError(null);
    try {
      if (material) {
        await update.mutateAsync({ id: material.id, ...v });
        onDone?.();
      } else {
        await create.mutateAsync(v);
        reset({ name: '', kind: v.kind, sheetWidth: v.sheetWidth, sheetHeight: v.sheetHeight, rotate: true, grain: v.grain });
      }
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  const e = formState.errors;
  const custom = preset === 'custom';
  return (
    <form onSubmit={submit} noValidate aria-label={material ? `Edit ${material.name}` : 'Add a material'}>
      <div className="grid grid-cols-12 items-start gap-3">
        <TextField className="col-span-12 sm:col-span-4" label="Name" placeholder="e.g. kraft cardstock" {...register('name')} error={e.name?.message} />
        <SelectField className="col-span-6 sm:col-span-3" label="Kind" {...register('kind')}>
          {KINDS.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </SelectField>
        <SelectField className="col-span-6 sm:col-span-5" label="Stock sheet" value={preset} onChange={(ev) => choose(ev.target.value)}>
          {SHEET_SIZES.map((s) => (
            <option key={s.id} value={s.id}>
              {s.label}
            </option>
          ))}
          <option value="custom">Custom size</option>
        </SelectField>
        <div className="col-span-6 sm:col-span-3">
          <TextField label="Sheet width" readOnly={!custom} className={custom ? '' : 'opacity-70'} {...register('sheetWidth')} error={e.sheetWidth?.message} />
          {custom && !e.sheetWidth && <LengthPreview text={watch('sheetWidth') ?? ''} />}
        </div>
        <div className="col-span-6 sm:col-span-3">
          <TextField
            label="Sheet height"
            readOnly={!custom}
            className={custom ? '' : 'opacity-70'}
            {...register('sheetHeight')}
            error={e.sheetHeight?.message}
          />
          {custom && !e.sheetHeight && <LengthPreview text={watch('sheetHeight') ?? ''} />}
        </div>
        <SelectField className="col-span-12 sm:col-span-6" label="Sheet grain" {...register('grain')}>
          <option value="none">Not known: grain-bound pieces lie either way</option>
          <option value="height">Along the sheet’s height (long grain on a tall sheet)</option>
          <option value="width">Along the sheet’s width</option>
        </SelectField>
        <label className="col-span-12 flex items-center gap-2 text-sm">
          <input type="checkbox" {...register('rotate')} /> Pieces may turn on the sheet
          <span className="text-xs text-pencil">(untick for a directional print)</span>
        </label>
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <span className="flex-1" />
        {material && (
          <Button variant="ghost" onClick={onDone}>
            Cancel
          </Button>
        )}
        <Button type="submit" busy={create.isPending || update.isPending}>
          {material ? 'Save material' : 'Add material'}
        </Button>
      </div>
      {formError && (
        <div className="mt-2">
          <Notice kind="error">{formError}</Notice>
        </div>
      )}
    </form>
  );
}
