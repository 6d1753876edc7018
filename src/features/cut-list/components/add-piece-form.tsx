import { useEffect, useId, useRef, useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { createPieceSchema, type CreatePieceInput, type MaterialDto, type PieceDto } from '@shared/schemas/piece';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { useCreatePiece } from '../api/piece-mutations';
import { useCutList } from './cut-list-context';
import { LengthPreview } from './length-text';
import { GRAIN_LABELS, isRoundShape, shapeName } from './shape-fields';
import { GRAINS, PIECE_SHAPES } from '@shared/measure';

type Values = z.input<typeof createPieceSchema>;
const EMPTY: Values = {
  name: '',
  material: '',
  quantity: 1,
  shape: 'rect',
  width: '',
  height: '',
  scoreLines: [],
  matOnId: null,
  notes: '',
  saidAtMs: null,
  mentionKey: undefined,
};

/** A prefill for the form (from a mention); a new `nonce` applies it again. */
export type PiecePrefill = { values: Partial<CreatePieceInput>; nonce: number };

/** The form under the table that adds one piece; lengths take the same spoken or written forms as the table. */
export function AddPieceForm({ pieces, materials, prefill }: { pieces: PieceDto[]; materials: MaterialDto[]; prefill?: PiecePrefill | null }) {
  const { tutorialId } = useCutList();
  const create = useCreatePiece(tutorialId);
  const [formError, setFormError] = useState<string | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  const box = useRef<HTMLFormElement>(null);
  const listId = useId();
  const { register, handleSubmit, setError, reset, watch, control, formState } = useForm<Values, unknown, z.output<typeof createPieceSchema>>({
    resolver: zodResolver(createPieceSchema),
    defaultValues: EMPTY,
  });
  const lines = useFieldArray({ control, name: 'scoreLines' });
  const shape = watch('shape');
  const saidAtMs = watch('saidAtMs');

  useEffect(() => {
    if (!prefill) return;
    reset({ ...EMPTY, ...prefill.values });
    setAdded(null);
    box.current?.scrollIntoView({ behavior: 'smooth', block: 'center' });
    box.current?.querySelector<HTMLInputElement>('input[name="name"]')?.focus();
  }, [prefill, reset]);

  useEffect(() => {
    if (!added) return;
    const t = setTimeout(() => setAdded(null), 5000);
    return () => clearTimeout(t);
  }, [added]);

  const round = isRoundShape(shape ?? 'rect');
  const submit = handleSubmit(async (v) => {
    setFormError(null);
    try {
      const p = await create.mutateAsync({
        ...v,
        height: isRoundShape(v.shape) ? undefined : v.height,
        matOnId: v.matOnId || null,
        saidAtMs: v.saidAtMs ?? null,
      });
      setAdded(p.name);
      reset(EMPTY);
      box.current?.querySelector<HTMLInputElement>('input[name="name"]')?.focus();
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  const e = formState.errors;

  return (
    <form ref={box} onSubmit={submit} noValidate aria-label="Add a piece" className="rounded-lg border border-line bg-white p-4">
      <div className="flex items-baseline justify-between">
        <h3 className="text-base">Add a piece</h3>
        {saidAtMs != null && <span className="text-xs text-pencil">from the mention at {formatTimestamp(saidAtMs)}</span>}
      </div>
      <div className="mt-3 grid grid-cols-12 gap-3">
        <TextField className="col-span-12 sm:col-span-4" label="Name" placeholder="e.g. Box base" {...register('name')} error={e.name?.message} />
        <TextField
          className="col-span-8 sm:col-span-3"
          label="Material"
          placeholder="e.g. kraft cardstock"
          list={listId}
          {...register('material')}
          error={e.material?.message}
        />
        <datalist id={listId}>
          {materials.map((m) => (
            <option key={m.id} value={m.name} />
          ))}
        </datalist>
        <TextField
          className="col-span-4 sm:col-span-2"
          label="Quantity"
          inputMode="numeric"
          {...register('quantity', { setValueAs: (v) => (v === '' ? 1 : Number(v)) })}
          error={e.quantity?.message}
        />
        <SelectField className="col-span-12 sm:col-span-3" label="Shape" {...register('shape')}>
          {PIECE_SHAPES.map((s) => (
            <option key={s} value={s}>
              {shapeName(s)}
            </option>
          ))}
        </SelectField>
        <div className="col-span-6 sm:col-span-4">
          <TextField label={round ? 'Diameter' : 'Width'} placeholder="e.g. ten and a half, 4 1/4, 108 mm" {...register('width')} error={e.width?.message} />
          {!e.width && <LengthPreview text={watch('width') ?? ''} />}
        </div>
        {!round && (
          <div className="col-span-6 sm:col-span-4">
            <TextField
              label="Length"
              placeholder="e.g. 2 1/2"
              {...register('height', { shouldUnregister: true, setValueAs: (v) => (v === '' ? undefined : v) })}
              error={e.height?.message}
            />
            {!e.height && <LengthPreview text={watch('height') ?? ''} />}
          </div>
        )}
        <SelectField
          className={round ? 'col-span-6 sm:col-span-8' : 'col-span-12 sm:col-span-4'}
          label="Mat: sits on"
          {...register('matOnId', { setValueAs: (v) => v || null })}
        >
          <option value="">Not a mat</option>
          {pieces.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </SelectField>
        <ShapeSizeFields shape={shape ?? 'rect'} register={register} errors={e} watch={watch} />
        <SelectField
          className="col-span-12 sm:col-span-4"
          label="Grain"
          {...register('grain', { setValueAs: (v) => (v === '' || v === undefined ? undefined : v) })}
        >
          <option value="">Usual (strips and walls along their length)</option>
          {GRAINS.map((g) => (
            <option key={g} value={g}>
              {GRAIN_LABELS[g]}
            </option>
          ))}
        </SelectField>
        <TextField className="col-span-12 sm:col-span-8" label="Notes" placeholder="notches, tabs …" {...register('notes')} error={e.notes?.message} />
      </div>

      <fieldset className="mt-4">
        <legend className="text-sm font-medium">Score lines</legend>
        {lines.fields.length === 0 && (
          <p className="mt-1 text-xs text-pencil">None yet. Each line is measured from the left edge (on width) or the top edge (on length).</p>
        )}
        <ul className="mt-2 space-y-2">
          {lines.fields.map((f, i) => (
            <li key={f.id} className="flex items-start gap-2">
              <select
                aria-label={`New score line ${i + 1} measured on`}
                className="rounded-md border border-field bg-white px-2 py-1.5 text-sm"
                {...register(`scoreLines.${i}.axis`)}
              >
                <option value="width">on width</option>
                <option value="height">on length</option>
              </select>
              <div className="flex-1">
                <input
                  aria-label={`New score line ${i + 1} at`}
                  placeholder="at, e.g. 4 1/4"
                  className={`w-full rounded-md border bg-white px-2 py-1.5 text-sm ${e.scoreLines?.[i]?.at ? 'border-rosehip' : 'border-field'}`}
                  {...register(`scoreLines.${i}.at`)}
                />
                {e.scoreLines?.[i]?.at ? (
                  <p className="text-xs text-rosehip">{e.scoreLines[i]!.at!.message}</p>
                ) : (
                  <LengthPreview text={watch(`scoreLines.${i}.at`) ?? ''} />
                )}
              </div>
              <label className="flex items-center gap-1 pt-2 text-xs">
                <input type="checkbox" {...register(`scoreLines.${i}.tab`)} /> tab
              </label>
              <Button size="sm" variant="ghost" className="mt-0.5 text-rosehip" onClick={() => lines.remove(i)} aria-label={`Remove new score line ${i + 1}`}>
                Remove
              </Button>
            </li>
          ))}
        </ul>
        <Button size="sm" variant="secondary" className="mt-2" onClick={() => lines.append({ axis: 'width', at: '', tab: false })}>
          Add score line
        </Button>
      </fieldset>

      <div className="mt-4 flex items-center gap-3">
        <Button type="submit" busy={create.isPending}>
          Add piece
        </Button>
        {prefill && (
          <Button variant="ghost" onClick={() => reset(EMPTY)}>
            Clear
          </Button>
        )}
        {added && !formError && (
          <span role="status" className="text-sm text-sage">
            Added “{added}”.
          </span>
        )}
      </div>
      {formError && (
        <div className="mt-3">
          <Notice kind="error">{formError}</Notice>
        </div>
      )}
    </form>
  );
}

type FormTools = Pick<ReturnType<typeof useForm<Values, unknown, z.output<typeof createPieceSchema>>>, 'register' | 'watch'>;

/** The size fields of the chosen shape (corner radius, scallops, tag corners and hole, box depth); each is dropped when the shape changes. */
function ShapeSizeFields({
  shape,
  register,
  watch,
  errors,
}: FormTools & { shape: Values['shape']; errors: ReturnType<typeof useForm<Values>>['formState']['errors'] }) {
  const e = errors.params;
  const length = (
    key: 'cornerRadius' | 'scallopSize' | 'tagCorner' | 'holeDiameter' | 'holeFromTop' | 'depth' | 'glueFlap',
    label: string,
    placeholder: string,
    hint?: string,
  ) => (
    <div key={key} className="col-span-6 sm:col-span-4">
      <TextField
        label={label}
        placeholder={placeholder}
        hint={hint}
        {...register(`params.${key}`, { shouldUnregister: true, setValueAs: (v) => (v === '' || v === undefined ? undefined : v) })}
        error={e?.[key]?.message}
      />
      {!e?.[key] && <LengthPreview text={watch(`params.${key}`) ?? ''} />}
    </div>
  );
  switch (shape) {
    case 'rounded-rect':
      return length('cornerRadius', 'Corner radius', 'e.g. 1/4');
    case 'scalloped-rect':
    case 'scalloped-circle':
      return (
        <>
          {length('scallopSize', 'Scallop size', '1/2 in if left empty', 'Or give a count instead')}
          <TextField
            className="col-span-6 sm:col-span-4"
            label={shape === 'scalloped-rect' ? 'Scallops across the top' : 'Scallops all round'}
            inputMode="numeric"
            placeholder="optional: sizes the scallops"
            {...register('params.scallopCount', { shouldUnregister: true, setValueAs: (v) => (v === '' || v === undefined ? undefined : Number(v)) })}
            error={e?.scallopCount?.message}
          />
        </>
      );
    case 'tag':
      return (
        <>
          <SelectField className="col-span-6 sm:col-span-4" label="Top corners" {...register('params.tagTop', { shouldUnregister: true })}>
            <option value="clipped">clipped</option>
            <option value="rounded">rounded</option>
          </SelectField>
          {length('tagCorner', 'Corner', '3/8 in if left empty')}
          {length('holeDiameter', 'Hole', '1/4 in if left empty')}
          {length('holeFromTop', 'Hole from the top', '1/2 in if left empty')}
        </>
      );
    case 'pillow-box':
      return (
        <>
          {length('depth', 'Depth', 'e.g. 1', 'How far the box puffs out')}
          {length('glueFlap', 'Glue flap', '1/2 in if left empty')}
        </>
      );
    default:
      return null;
  }
}
