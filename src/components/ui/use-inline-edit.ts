import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import { ApiError } from '@/lib/api-client';

/** A server refusal in words: the named field's issue when there is one, else the first issue, else the message. */
export function saveErrorText(e: unknown, field?: string): string {
  if (e instanceof ApiError) return (field ? e.issues.find((i) => i.path === field)?.message : undefined) ?? e.issues[0]?.message ?? e.message;
  return 'Could not save; please try again.';
}

/**
 * The state of a click-to-edit cell: Enter or leaving the field saves, Escape puts the old value
 * back, and a refused save (a local check or the server) keeps the field open with the typed
 * text and the reason. Each way out happens once: Enter saves, and the blur that follows does not
 * save again.
 */
export function useInlineEdit(opts: {
  value: string;
  onSave: (text: string) => Promise<unknown>;
  check?: (text: string) => string | null;
  /** The field's name, to pick the server's issue for it. */
  field?: string;
  /** Select the text when the field opens. */
  selectOnOpen?: boolean;
}) {
  const [editing, setEditing] = useState(false);
  const [text, setTextState] = useState(opts.value);
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const inputRef = useRef<HTMLInputElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const settled = useRef(false);

  useEffect(() => {
    if (!editing) return;
    inputRef.current?.focus();
    if (opts.selectOnOpen) inputRef.current?.select();
  }, [editing, opts.selectOnOpen]);

  const open = () => {
    setTextState(opts.value);
    setError(null);
    settled.current = false;
    setEditing(true);
  };
  const close = (refocus: boolean) => {
    settled.current = true;
    setEditing(false);
    setError(null);
    if (refocus) requestAnimationFrame(() => buttonRef.current?.focus());
  };
  const save = async (refocus: boolean) => {
    if (settled.current || saving) return;
    if (text.trim() === opts.value.trim()) return close(refocus);
    const problem = opts.check?.(text) ?? null;
    if (problem) {
      // The field stays open with what was typed and the reason; the focus is not pulled back.
      setError(problem);
      return;
    }
    setSaving(true);
    try {
      await opts.onSave(text.trim());
      close(refocus);
    } catch (e) {
      setError(saveErrorText(e, opts.field));
    } finally {
      setSaving(false);
    }
  };
  const setText = (t: string) => {
    setTextState(t);
    setError(null);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter') {
      e.preventDefault();
      void save(true);
    } else if (e.key === 'Escape') {
      e.preventDefault();
      e.stopPropagation();
      close(true);
    }
  };
  return { editing, text, setText, error, saving, open, close, save, onKeyDown, onBlur: () => void save(false), inputRef, buttonRef };
}
