import { memo, useState } from 'react';
import {
  SUPPLY_CATEGORIES,
  SUPPLY_CATEGORY_LABELS,
  updateSupplySchema,
  type SupplyDto,
  type SupplyCategory,
  type UpdateSupplyInput,
} from '@shared/schemas/supply';
import { shopHost } from '../utils/shop-host';
import { EditableCell, fieldError } from './editable-cell';

type TextField = 'name' | 'quantity' | 'note' | 'url' | 'discountCode';

// An empty link or code is stored as null, as the schema has it.
const toValue = (field: TextField, text: string): string | null => ((field === 'url' || field === 'discountCode') && text.trim() === '' ? null : text);

/** Checks one field with the shared update schema before it goes to the server. */
export function checkSupplyField(field: TextField, text: string): string | null {
  const r = updateSupplySchema.safeParse({ [field]: toValue(field, text) });
  return r.success ? null : (r.error.issues[0]?.message ?? 'This cannot be saved');
}

const empty = <span className="text-pencil/70">—</span>;
const cell = 'px-2 py-1.5 align-top';

type Props = {
  supply: SupplyDto;
  canEdit: boolean;
  canUp: boolean;
  canDown: boolean;
  onMove: (id: string, step: -1 | 1) => void;
  onDelete: (supply: SupplyDto) => void;
  onChange: (id: string, change: UpdateSupplyInput) => Promise<unknown>;
};

/** One supply in the table: each cell edits in place; the row moves up or down and deletes. */
export const SupplyRow = memo(function SupplyRow({ supply: s, canEdit, canUp, canDown, onMove, onDelete, onChange }: Props) {
  const [error, setError] = useState<{ field: string; message: string } | null>(null);
  // A ticked box or a picked category shows at once, before the server answers; a refusal puts the stored value back.
  const [pending, setPending] = useState<Pick<UpdateSupplyInput, 'category' | 'sponsored'>>({});
  const host = shopHost(s.url);
  const save = (field: TextField) => (text: string) => onChange(s.id, { [field]: toValue(field, text) });
  const text = (field: TextField, label: string, opts: { placeholder?: string; maxLength?: number } = {}) => (
    <EditableCell
      field={field}
      label={`${label} of ${s.name}`}
      value={(s[field] as string | null) ?? ''}
      display={s[field] ? <span className="break-words">{s[field]}</span> : empty}
      canEdit={canEdit}
      check={(t) => checkSupplyField(field, t)}
      onSave={save(field)}
      focusKey={`${s.id}:${field}`}
      {...opts}
    />
  );
  const immediate = (change: Pick<UpdateSupplyInput, 'category' | 'sponsored'>, field: string) => {
    setError(null);
    setPending((p) => ({ ...p, ...change }));
    onChange(s.id, change)
      .catch((e: unknown) => setError({ field, message: fieldError(e, field) }))
      .finally(() => setPending((p) => Object.fromEntries(Object.entries(p).filter(([k]) => !(k in change)))));
  };
  const category = pending.category ?? s.category;
  const sponsored = pending.sponsored ?? s.sponsored;

  const link = host ? (
    <a
      href={s.url!}
      target="_blank"
      rel="noopener"
      className="text-sm text-kraft-dark underline decoration-kraft/40 underline-offset-2 hover:decoration-kraft"
      title={s.url!}
    >
      {host}
      <span className="sr-only"> (opens in a new tab)</span>
      <span aria-hidden> ↗</span>
    </a>
  ) : s.url ? (
    <span className="text-sm">{s.url}</span>
  ) : (
    empty
  );

  return (
    <tr className="border-t border-line hover:bg-white/70" data-supply-id={s.id}>
      {canEdit && (
        <td className={`${cell} whitespace-nowrap`} data-label="Order">
          <span className="inline-flex gap-0.5">
            <MoveButton label={`Move “${s.name}” up`} glyph="↑" focusKey={`${s.id}:up`} disabled={!canUp} onClick={() => onMove(s.id, -1)} />
            <MoveButton label={`Move “${s.name}” down`} glyph="↓" focusKey={`${s.id}:down`} disabled={!canDown} onClick={() => onMove(s.id, 1)} />
          </span>
        </td>
      )}
      <td className={cell} data-label="Category">
        {canEdit ? (
          <select
            aria-label={`Category of ${s.name}`}
            value={category}
            onChange={(e) => immediate({ category: e.target.value as SupplyCategory }, 'category')}
            className="w-full rounded border border-transparent bg-transparent px-1 py-1 text-sm hover:border-field focus:border-kraft"
          >
            {SUPPLY_CATEGORIES.map((c) => (
              <option key={c} value={c}>
                {SUPPLY_CATEGORY_LABELS[c]}
              </option>
            ))}
          </select>
        ) : (
          <span className="text-sm">{SUPPLY_CATEGORY_LABELS[s.category] ?? s.category}</span>
        )}
        <RowError error={error} field="category" />
      </td>
      <td className={`${cell} font-medium`} data-label="Name">
        {text('name', 'Name', { maxLength: 200 })}
      </td>
      <td className={cell} data-label="Quantity">
        {text('quantity', 'Quantity', { maxLength: 60, placeholder: 'e.g. 2 sheets' })}
      </td>
      <td className={cell} data-label="Note">
        {text('note', 'Note', { maxLength: 500 })}
      </td>
      <td className={cell} data-label="Shop link">
        {canEdit ? (
          <EditableCell
            field="url"
            type="url"
            label={`Shop link of ${s.name}`}
            value={s.url ?? ''}
            display={link}
            canEdit
            placeholder="https://…"
            check={(t) => checkSupplyField('url', t)}
            onSave={save('url')}
            focusKey={`${s.id}:url`}
            editLabel={s.url ? `Edit the shop link of ${s.name}` : undefined}
          />
        ) : (
          link
        )}
      </td>
      <td className={`${cell} text-center`} data-label="Sponsored">
        {canEdit ? (
          <input
            type="checkbox"
            className="mt-1.5 h-4 w-4 accent-kraft disabled:opacity-40"
            aria-label={`Sponsored link: ${s.name}`}
            checked={sponsored}
            disabled={!s.url && !sponsored}
            title={!s.url && !sponsored ? 'Add a shop link first' : undefined}
            onChange={(e) => immediate({ sponsored: e.target.checked }, 'sponsored')}
          />
        ) : (
          s.sponsored && <span className="text-xs font-medium text-kraft-dark">Sponsored</span>
        )}
        <RowError error={error} field="sponsored" />
      </td>
      <td className={cell} data-label="Discount code">
        {text('discountCode', 'Discount code', { maxLength: 60 })}
      </td>
      {canEdit && (
        <td className={`${cell} text-right`}>
          <button
            type="button"
            onClick={() => onDelete(s)}
            aria-label={`Delete “${s.name}”`}
            className="rounded px-2 py-1 text-sm text-rosehip hover:bg-rosehip-light"
          >
            Delete
          </button>
        </td>
      )}
    </tr>
  );
});

function RowError({ error, field }: { error: { field: string; message: string } | null; field: string }) {
  if (error?.field !== field) return null;
  return (
    <p role="alert" className="mt-1 text-left text-xs text-rosehip">
      {error.message}
    </p>
  );
}

function MoveButton({ label, glyph, focusKey, disabled, onClick }: { label: string; glyph: string; focusKey: string; disabled: boolean; onClick: () => void }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      data-focus-key={focusKey}
      disabled={disabled}
      onClick={onClick}
      className="h-7 w-7 rounded text-sm text-ink hover:bg-kraft-light disabled:cursor-default disabled:text-pencil/40 disabled:hover:bg-transparent"
    >
      {glyph}
    </button>
  );
}
