import { useId, type ReactNode } from 'react';
import { saveErrorText, useInlineEdit } from '@/components/ui/use-inline-edit';

/** The server's reason for one field, else its message; the typed text stays in the field. */
export const fieldError = (e: unknown, field: string) => saveErrorText(e, field);

type Props = {
  /** The supply field, to pick the server's issue for it. */
  field: string;
  /** Names the field and the supply for screen readers: "Quantity of Kraft cardstock". */
  label: string;
  value: string;
  /** What the cell shows when it is not being edited. */
  display: ReactNode;
  canEdit: boolean;
  /** Checks the text before saving; returns the reason in words, or null. */
  check?: (text: string) => string | null;
  onSave: (text: string) => Promise<unknown>;
  type?: 'text' | 'url';
  placeholder?: string;
  maxLength?: number;
  /** Set on the cell's button so the table can move focus to it after a row leaves. */
  focusKey?: string;
  /** Where a click on the cell's text goes instead of editing (a link); editing is then a separate button. */
  editLabel?: string;
};

/**
 * A table cell that becomes a field when clicked (or Enter on it). Enter or leaving the field
 * saves, Escape puts the old value back. A refused save keeps the field open with the typed
 * text and the reason beside it.
 */
export function EditableCell({ field, label, value, display, canEdit, check, onSave, type = 'text', placeholder, maxLength, focusKey, editLabel }: Props) {
  const errorId = useId();
  const edit = useInlineEdit({ value, onSave, check, field, selectOnOpen: true });
  const { editing, text, error, saving } = edit;

  if (!canEdit) return <>{display}</>;

  if (editing) {
    return (
      <div>
        <input
          ref={edit.inputRef}
          type={type}
          value={text}
          aria-label={label}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          placeholder={placeholder}
          maxLength={maxLength}
          onChange={(e) => edit.setText(e.target.value)}
          onKeyDown={edit.onKeyDown}
          onBlur={edit.onBlur}
          aria-busy={saving || undefined}
          className={`w-full min-w-0 rounded border bg-white px-2 py-1 text-sm focus:border-kraft ${error ? 'border-rosehip' : 'border-kraft/60'}`}
        />
        {error && (
          <p id={errorId} role="alert" className="mt-1 text-xs text-rosehip">
            {error}
          </p>
        )}
      </div>
    );
  }

  if (editLabel) {
    return (
      <div className="flex items-center gap-1">
        <div className="min-w-0 flex-1 truncate">{display}</div>
        <button
          ref={edit.buttonRef}
          type="button"
          data-focus-key={focusKey}
          onClick={edit.open}
          aria-label={editLabel}
          className="shrink-0 rounded px-1.5 py-0.5 text-xs text-pencil hover:bg-kraft-light hover:text-kraft-dark"
        >
          Edit
        </button>
      </div>
    );
  }
  return (
    <button
      ref={edit.buttonRef}
      type="button"
      data-focus-key={focusKey}
      onClick={edit.open}
      aria-label={`${label}: ${value || 'none'}`}
      title="Click to edit"
      className="block w-full min-w-0 rounded px-2 py-1 text-left text-sm hover:bg-kraft-light"
    >
      {display}
    </button>
  );
}
