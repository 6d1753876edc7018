import { useEffect, useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { createSupplySchema, SUPPLY_CATEGORIES, SUPPLY_CATEGORY_LABELS } from '@shared/schemas/supply';
import { Button } from '@/components/ui/button';
import { applyServerErrors } from '@/components/ui/form-errors';
import { ApiError } from '@/lib/api-client';
import { useCreateSupply } from '../api/create-supply';
import { guessCategory } from '../utils/parse-supply-lines';

type Values = z.input<typeof createSupplySchema>;
const EMPTY: Values = { category: 'other', name: '', quantity: '', note: '', url: '', sponsored: false, discountCode: '' };
const schemaResolver = zodResolver(createSupplySchema);
// A blank link or code is no link or code, not an invalid one.
const blank = (v: string | null | undefined) => (v?.trim() ? v : undefined);
const resolver: typeof schemaResolver = (values, context, options) =>
  schemaResolver({ ...values, url: blank(values.url), discountCode: blank(values.discountCode) }, context, options);

const inputCls = (error: unknown) => `w-full min-w-0 rounded border bg-white px-2 py-1 text-sm focus:border-kraft ${error ? 'border-rosehip' : 'border-field'}`;

function Err({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} role="alert" className="mt-1 text-xs text-rosehip">
      {message}
    </p>
  );
}

// Column names beside the fields when a phone shows the row as a card (.stack-table).
const COLUMN = { name: 'Name', quantity: 'Quantity', note: 'Note', url: 'Shop link', discountCode: 'Discount code' } as const;

/**
 * The table's last row: a new supply typed straight into the columns. Enter adds it and puts the
 * cursor back in Name for the next one. Until the category is picked by hand it follows the name
 * ("bone folder" is a tool).
 */
export function AddSupplyRow({ tutorialId, columns }: { tutorialId: string; columns: { order: boolean } }) {
  const formId = useId();
  const ids = useId();
  const create = useCreateSupply(tutorialId);
  const [formError, setFormError] = useState<string | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, watch, setValue, setFocus, formState } = useForm<Values, unknown, z.output<typeof createSupplySchema>>({
    resolver,
    defaultValues: EMPTY,
  });
  const e = formState.errors;
  const name = watch('name');
  const url = watch('url');
  const categoryPicked = !!formState.dirtyFields.category;

  useEffect(() => {
    if (!categoryPicked) setValue('category', guessCategory(name ?? ''));
  }, [name, categoryPicked, setValue]);
  useEffect(() => {
    if (!url?.trim()) setValue('sponsored', false);
  }, [url, setValue]);
  useEffect(() => {
    if (!added) return;
    const t = setTimeout(() => setAdded(null), 4000);
    return () => clearTimeout(t);
  }, [added]);

  const submit = handleSubmit(async (v) => {
    setFormError(null);
    setAdded(null);
    try {
      const s = await create.mutateAsync(v);
      setAdded(s.name);
      reset(EMPTY);
      // After the reset has re-rendered the row; focusing straight away is undone by it.
      requestAnimationFrame(() => setFocus('name'));
    } catch (err) {
      const message = applyServerErrors(err, setError);
      // Field issues already sit beside their fields; say it once more only when none matched.
      if (!(err instanceof ApiError && err.issues.some((i) => i.path))) setFormError(message);
    }
  });

  const described = (field: string, error: unknown) => (error ? `${ids}-${field}` : undefined);
  const field = (key: 'name' | 'quantity' | 'note' | 'url' | 'discountCode', label: string, placeholder: string, extra: Record<string, unknown> = {}) => (
    <td className="px-2 py-2 align-top" data-label={COLUMN[key]}>
      <input
        form={formId}
        aria-label={label}
        placeholder={placeholder}
        aria-invalid={e[key] ? true : undefined}
        aria-describedby={described(key, e[key])}
        className={inputCls(e[key])}
        {...extra}
        {...register(key)}
      />
      <Err id={`${ids}-${key}`} message={e[key]?.message} />
    </td>
  );

  return (
    <tfoot>
      <tr className="border-t-2 border-dashed border-kraft/40 bg-kraft-light/30">
        {columns.order && <td className="px-2 py-2 align-top text-xs font-medium text-kraft-dark">New</td>}
        <td className="px-2 py-2 align-top" data-label="Category">
          <select
            form={formId}
            aria-label="New supply category"
            className="w-full rounded border border-field bg-white px-1 py-1 text-sm focus:border-kraft"
            {...register('category')}
          >
            {SUPPLY_CATEGORIES.map((c) => (
              <option key={c} value={c}>
                {SUPPLY_CATEGORY_LABELS[c]}
              </option>
            ))}
          </select>
        </td>
        {field('name', 'New supply name', 'e.g. Kraft cardstock', { maxLength: 200, autoComplete: 'off' })}
        {field('quantity', 'New supply quantity', '2 sheets', { maxLength: 60, autoComplete: 'off' })}
        {field('note', 'New supply note', 'what it is for', { maxLength: 500, autoComplete: 'off' })}
        {field('url', 'New supply shop link', 'https://…', { type: 'url', autoComplete: 'off' })}
        <td className="px-2 py-2 text-center align-top" data-label="Sponsored">
          <input
            form={formId}
            type="checkbox"
            aria-label="New supply is a sponsored link"
            className="mt-1.5 h-4 w-4 accent-kraft disabled:opacity-40"
            disabled={!url?.trim()}
            title={url?.trim() ? undefined : 'Add a shop link first'}
            {...register('sponsored')}
          />
        </td>
        {field('discountCode', 'New supply discount code', 'optional', { maxLength: 60, autoComplete: 'off' })}
        <td className="px-2 py-2 text-right align-top">
          <form id={formId} onSubmit={submit} noValidate aria-label="Add a supply">
            <Button type="submit" size="sm" busy={create.isPending}>
              Add
            </Button>
          </form>
        </td>
      </tr>
      {(formError || added) && (
        <tr>
          <td colSpan={columns.order ? 9 : 7} className="px-2 pb-2">
            {formError ? (
              <p role="alert" className="text-sm text-rosehip">
                {formError}
              </p>
            ) : (
              <p role="status" className="text-sm text-sage">
                Added “{added}”.
              </p>
            )}
          </td>
        </tr>
      )}
    </tfoot>
  );
}
