import { useId } from 'react';

type Props = { query: string; onQuery: (q: string) => void; count: number; current: number; onStep: (direction: 1 | -1) => void };

/** The transcript's search box: Enter and Shift+Enter, or the arrows beside it, step through matches. */
export function TranscriptSearch({ query, onQuery, count, current, onStep }: Props) {
  const id = useId();
  const btn =
    'flex h-8 w-8 items-center justify-center rounded-md border border-line bg-white text-ink hover:border-kraft disabled:cursor-not-allowed disabled:text-pencil';
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="sr-only">
        Search the transcript
      </label>
      <input
        id={id}
        type="search"
        placeholder="Search the transcript"
        value={query}
        onChange={(e) => onQuery(e.target.value)}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            onStep(e.shiftKey ? -1 : 1);
          } else if (e.key === 'Escape' && query) {
            e.preventDefault();
            onQuery('');
          }
        }}
        className="min-w-0 flex-1 rounded-md border border-field bg-white px-3 py-1.5 text-sm focus:border-kraft"
      />
      {query.trim() && (
        <span className="shrink-0 text-xs text-pencil tabular-nums" aria-live="polite">
          {count === 0 ? 'No matches' : `${current + 1} of ${count}`}
        </span>
      )}
      <button type="button" className={btn} aria-label="Previous match" disabled={count === 0} onClick={() => onStep(-1)}>
        <svg viewBox="0 0 16 16" className="h-4 w-4" aria-hidden>
          <path d="M4 10l4-4 4 4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
      </button>
      <button type="button" className={btn} aria-label="Next match" disabled={count === 0} onClick={() => onStep(1)}>
        <svg viewBox="0 0 16 16" className="h-4 w-4" aria-hidden>
          <path d="M4 6l4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
      </button>
    </div>
  );
}
