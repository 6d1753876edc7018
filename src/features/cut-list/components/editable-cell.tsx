import { useId, type ReactNode } from 'react';
import { useInlineEdit } from '@/components/ui/use-inline-edit';
import { readTyped } from '../utils/lengths';
import { useCutList } from './cut-list-context';
import { LengthPreview } from './length-text';

type Kind = 'text' | 'number' | 'length';

export { saveErrorText } from '@/components/ui/use-inline-edit';

/**
 * A table cell that turns into a field when clicked. Enter or leaving the field saves, Escape
 * puts the old value back; a length shows how it was read while typing. A refused save keeps
 * the field open with the typed text and the server's reason.
 */
export function EditableCell(props: {
  label: string;
  initial: string;
  display: ReactNode;
  kind?: Kind;
  onSave: (text: string) => Promise<unknown>;
  /** A check before saving; return the reason in words or null. */
  validate?: (text: string) => string | null;
  placeholder?: string;
  list?: string;
  className?: string;
}) {
  const { canEdit, defaultUnit, precision } = useCutList();
  const kind = props.kind ?? 'text';
  const hintId = useId();
  const nameId = useId();
  const shownId = useId();
  const edit = useInlineEdit({
    value: props.initial,
    onSave: props.onSave,
    check: (text) => props.validate?.(text) ?? (kind === 'length' ? lengthProblem(text, defaultUnit, precision) : null),
  });
  const { editing, text, error, saving } = edit;

  if (!canEdit) return <div className={props.className}>{props.display}</div>;

  if (!editing) {
    // The name says what the button does and then what it shows ("Edit width of Base 4 in"), so
    // speech users can say the words they see (WCAG 2.5.3, label in name).
    return (
      <>
        <button
          ref={edit.buttonRef}
          type="button"
          onClick={edit.open}
          aria-labelledby={`${nameId} ${shownId}`}
          className={`-mx-1 block w-[calc(100%+0.5rem)] rounded px-1 py-0.5 text-left hover:bg-kraft-light/60 focus-visible:bg-kraft-light/60 ${props.className ?? ''}`}
        >
          <span id={shownId}>{props.display}</span>
        </button>
        <span id={nameId} hidden>
          Edit {props.label}
        </span>
      </>
    );
  }
  // The field may grow past a narrow column and its reading floats below it, so the row keeps its height while typing.
  return (
    <div className="relative">
      <input
        ref={edit.inputRef}
        aria-label={props.label}
        aria-invalid={error ? true : undefined}
        aria-describedby={hintId}
        className={`relative z-10 w-full rounded border bg-white px-1.5 py-0.5 text-sm shadow-sm focus:border-kraft ${kind === 'length' ? 'min-w-44' : kind === 'number' ? 'min-w-16' : 'min-w-40'} ${error ? 'border-rosehip' : 'border-field'}`}
        value={text}
        inputMode={kind === 'number' ? 'numeric' : undefined}
        placeholder={props.placeholder}
        list={props.list}
        readOnly={saving}
        onChange={(e) => edit.setText(e.target.value)}
        onKeyDown={edit.onKeyDown}
        onBlur={edit.onBlur}
      />
      <div id={hintId} className="absolute left-0 top-full z-20 mt-0.5 w-64 empty:hidden">
        {(kind === 'length' && !error && text.trim() !== '') || saving || error ? (
          <div className="rounded border border-line bg-white px-2 py-1 shadow-md">
            {kind === 'length' && !error && <LengthPreview text={text} />}
            {saving && <p className="text-xs text-pencil">Saving …</p>}
            {error && (
              <p role="alert" className="text-xs text-rosehip">
                {error}
              </p>
            )}
          </div>
        ) : null}
      </div>
    </div>
  );
}

function lengthProblem(text: string, unit: Parameters<typeof readTyped>[1], precision: Parameters<typeof readTyped>[2]): string | null {
  const r = readTyped(text, unit, precision);
  if (r.state === 'empty') return 'Enter a length';
  return r.state === 'error' ? r.message : null;
}
