import { useEffect, useId, useRef, useState, type ReactNode } from 'react';

type Props = {
  label: string;
  value: string;
  /** Checks the value before saving; returns a message when it cannot be saved. */
  check?: (v: string) => string | null;
  onSave: (v: string) => Promise<unknown>;
  hint?: ReactNode;
  rows?: number;
  placeholder?: string;
};

/**
 * A text area that saves when it loses focus and says so ("Saving …", "Saved"). While the person
 * is typing, a refetch of the same record does not overwrite what they typed.
 */
export function SavedField({ label, value, check, onSave, hint, rows = 2, placeholder }: Props) {
  const id = useId();
  const [text, setText] = useState(value);
  const [status, setStatus] = useState<'idle' | 'saving' | 'saved' | 'error'>('idle');
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);

  useEffect(() => {
    if (!focused.current) setText(value);
  }, [value]);
  useEffect(() => {
    if (status !== 'saved') return;
    const t = setTimeout(() => setStatus('idle'), 2500);
    return () => clearTimeout(t);
  }, [status]);

  const save = async () => {
    focused.current = false;
    if (text === value) return;
    const problem = check?.(text) ?? null;
    if (problem) {
      setError(problem);
      setStatus('error');
      return;
    }
    setStatus('saving');
    setError(null);
    try {
      await onSave(text);
      setStatus('saved');
    } catch (e) {
      setError((e as Error).message);
      setStatus('error');
    }
  };

  return (
    <div className="flex flex-col gap-1">
      <div className="flex items-baseline justify-between gap-2">
        <label htmlFor={id} className="text-xs font-medium">
          {label}
        </label>
        <span className="text-xs" aria-live="polite">
          {status === 'saving' && <span className="text-pencil">Saving …</span>}
          {status === 'saved' && <span className="text-sage">Saved</span>}
        </span>
      </div>
      <textarea
        id={id}
        rows={rows}
        value={text}
        placeholder={placeholder}
        aria-invalid={status === 'error' || undefined}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        onFocus={() => {
          focused.current = true;
        }}
        onChange={(e) => setText(e.target.value)}
        onBlur={save}
        className={`resize-y rounded-md border bg-white px-2 py-1.5 text-sm focus:border-kraft ${status === 'error' ? 'border-rosehip' : 'border-field'}`}
      />
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-xs text-rosehip">
          {error}
        </p>
      ) : (
        hint && (
          <p id={`${id}-hint`} className="text-xs text-pencil">
            {hint}
          </p>
        )
      )}
    </div>
  );
}
