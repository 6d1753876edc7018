import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';
import { readTyped } from '../utils/lengths';
import { useCutList } from './cut-list-context';
import { LengthPreview } from './length-text';

type Kind = 'text' | 'number' | 'length';

/** A server refusal in words: the field's own issue when there is one, else the message. */
export function saveErrorText(e: unknown): string {
  if (e instanceof ApiError) return e.issues[0]?.message ? `${e.issues[0].message}` : e.message;
  return 'Could not save; please try again.';
}

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
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(props.initial);
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  // Enter saves and the field then loses focus: one save, not two.
  const settled = useRef(false);
  const hintId = useId();

  useEffect(() => {
    if (editing) input.current?.focus();
  }, [editing]);

  if (!canEdit) return <div className={props.className}>{props.display}</div>;

  const open = () => {
    setText(props.initial);
    setError(null);
    settled.current = false;
    setEditing(true);
  };
  const close = (refocus: boolean) => {
    settled.current = true;
    setEditing(false);
    setError(null);
    if (refocus) requestAnimationFrame(() => button.current?.focus());
  };
  const commit = async (refocus: boolean) => {
    if (settled.current || saving) return;
    if (text.trim() === props.initial.trim()) return close(refocus);
    const local = props.validate?.(text) ?? (kind === 'length' ? lengthProblem(text, defaultUnit, precision) : null);
    if (local) {
      setError(local);
      return;
    }
    setSaving(true);
    try {
      await props.onSave(text.trim());
      close(refocus);
    } catch (e) {
      setError(saveErrorText(e));
    } finally {
      setSaving(false);
    }
  };

  if (!editing) {
    return (
      <button
        ref={button}
        type="button"
        onClick={open}
        aria-label={`Edit ${props.label}`}
        className={`-mx-1 block w-[calc(100%+0.5rem)] rounded px-1 py-0.5 text-left hover:bg-kraft-light/60 focus-visible:bg-kraft-light/60 ${props.className ?? ''}`}
      >
        {props.display}
      </button>
    );
  }
  // The field may grow past a narrow column and its reading floats below it, so the row keeps its height while typing.
  return (
    <div className="relative">
      <input
        ref={input}
        aria-label={props.label}
        aria-invalid={error ? true : undefined}
        aria-describedby={hintId}
        className={`relative z-10 w-full rounded border bg-white px-1.5 py-0.5 text-sm shadow-sm outline-none focus:border-kraft ${kind === 'length' ? 'min-w-44' : kind === 'number' ? 'min-w-16' : 'min-w-40'} ${error ? 'border-rosehip' : 'border-line'}`}
        value={text}
        inputMode={kind === 'number' ? 'numeric' : undefined}
        placeholder={props.placeholder}
        list={props.list}
        readOnly={saving}
        onChange={(e) => {
          setText(e.target.value);
          setError(null);
        }}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            void commit(true);
          } else if (e.key === 'Escape') {
            e.preventDefault();
            close(true);
          }
        }}
        onBlur={() => void commit(false)}
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
