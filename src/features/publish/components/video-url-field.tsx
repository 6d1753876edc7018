import { useEffect, useId, useState } from 'react';
import { updateTutorialSchema } from '@shared/schemas/tutorial';
import { Button } from '@/components/ui/button';

/** The value as the server would take it: trimmed, empty meaning "no video". */
export function videoUrlProblem(text: string): string | null {
  const v = text.trim();
  if (!v) return null;
  const r = updateTutorialSchema.safeParse({ videoUrl: v });
  return r.success ? null : (r.error.issues[0]?.message ?? 'This is not a web address');
}

/**
 * The published video's address (https://…), which the handout's QR code and the video
 * description point to. Checked with the server's own schema before saving.
 */
export function VideoUrlField({ value, canEdit, onSave }: { value: string | null; canEdit: boolean; onSave: (url: string | null) => Promise<unknown> }) {
  const id = useId();
  const [text, setText] = useState(value ?? '');
  const [status, setStatus] = useState<'idle' | 'saving' | 'saved' | 'error'>('idle');
  const [error, setError] = useState<string | null>(null);
  useEffect(() => setText(value ?? ''), [value]);
  useEffect(() => {
    if (status !== 'saved') return;
    const t = setTimeout(() => setStatus('idle'), 3000);
    return () => clearTimeout(t);
  }, [status]);

  if (!canEdit) {
    return value ? (
      <a href={value} target="_blank" rel="noopener" className="text-sm break-all text-kraft-dark underline">
        {value}
      </a>
    ) : (
      <p className="text-sm text-pencil">No video address yet; the maker adds it once the video is up.</p>
    );
  }

  const changed = text.trim() !== (value ?? '');
  const save = async () => {
    const problem = videoUrlProblem(text);
    if (problem) {
      setError(problem);
      setStatus('error');
      return;
    }
    setError(null);
    setStatus('saving');
    try {
      await onSave(text.trim() || null);
      setStatus('saved');
    } catch (e) {
      setError((e as Error).message);
      setStatus('error');
    }
  };

  return (
    <form
      aria-label="Video address"
      onSubmit={(e) => {
        e.preventDefault();
        if (changed) void save();
      }}
    >
      <label htmlFor={id} className="text-sm font-medium">
        Video address
      </label>
      <div className="mt-1 flex gap-2">
        <input
          id={id}
          type="text"
          inputMode="url"
          autoComplete="url"
          spellCheck={false}
          placeholder="https://"
          value={text}
          onChange={(e) => {
            setText(e.target.value);
            if (status === 'error') setStatus('idle');
          }}
          aria-invalid={status === 'error' || undefined}
          aria-describedby={`${id}-${status === 'error' ? 'error' : 'hint'}`}
          className={`min-w-0 flex-1 rounded-md border bg-white px-3 py-2 text-sm focus:border-kraft ${status === 'error' ? 'border-rosehip' : 'border-field'}`}
        />
        <Button type="submit" variant="secondary" busy={status === 'saving'} disabled={!changed}>
          Save
        </Button>
      </div>
      {status === 'error' && error ? (
        <p id={`${id}-error`} role="alert" className="mt-1 text-xs text-rosehip">
          {error}
        </p>
      ) : (
        <p id={`${id}-hint`} className="mt-1 text-xs text-pencil" aria-live="polite">
          {status === 'saved' ? (
            <span className="text-sage">{value ? 'Saved the video address.' : 'Removed the video address.'}</span>
          ) : (
            'Where the finished video is watched. The blog post links each step’s time to it, and the handout’s QR code points to it until the tutorial is published (then to the public page). Leave it empty for none.'
          )}
        </p>
      )}
    </form>
  );
}
