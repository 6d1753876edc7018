import { useId, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import type { MentionableDto } from '@shared/schemas/comment';
import { insertMention, matchPeople, mentionQuery } from '../utils/mentions';

type Props = {
  id?: string;
  label: string;
  value: string;
  onChange: (text: string) => void;
  /** People picked from the list, so the server is told exactly who (names typed by hand are found too). */
  onPick: (person: MentionableDto) => void;
  people: MentionableDto[];
  placeholder?: string;
  rows?: number;
  autoFocus?: boolean;
  describedBy?: string;
  invalid?: boolean;
  /** Ctrl+Enter (⌘+Enter) sends. */
  onSubmit?: () => void;
};

/**
 * A comment box where "@" offers the studio's members: ↑ and ↓ move through the names, Enter or
 * Tab picks one, Escape closes the list. The list is announced as it changes.
 */
export function MentionTextarea({ id, label, value, onChange, onPick, people, placeholder, rows = 3, autoFocus, describedBy, invalid, onSubmit }: Props) {
  const own = useId();
  const fieldId = id ?? own;
  const listId = `${fieldId}-people`;
  const ref = useRef<HTMLTextAreaElement>(null);
  const [caret, setCaret] = useState(0);
  const [active, setActive] = useState(0);
  const [closedAt, setClosedAt] = useState<number | null>(null);
  const query = mentionQuery(value, caret);
  const open = query !== null && closedAt !== query.start;
  const matches = useMemo(() => (open ? matchPeople(people, query.query) : []), [open, people, query?.query]);
  const showList = open && matches.length > 0;
  const current = Math.min(active, Math.max(matches.length - 1, 0));

  const pick = (person: MentionableDto) => {
    if (!query) return;
    const next = insertMention(value, query.start, caret, person.name);
    onChange(next.text);
    onPick(person);
    setCaret(next.caret);
    setActive(0);
    // This "@" is done with: the list stays shut until another one is typed.
    setClosedAt(query.start);
    requestAnimationFrame(() => {
      ref.current?.focus();
      ref.current?.setSelectionRange(next.caret, next.caret);
    });
  };

  const onKeyDown = (e: KeyboardEvent<HTMLTextAreaElement>) => {
    if (e.key === 'Enter' && (e.ctrlKey || e.metaKey) && onSubmit) {
      e.preventDefault();
      onSubmit();
      return;
    }
    if (!showList) return;
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      setActive((i) => (i + (e.key === 'ArrowDown' ? 1 : matches.length - 1)) % matches.length);
    } else if (e.key === 'Enter' || e.key === 'Tab') {
      e.preventDefault();
      pick(matches[current]!);
    } else if (e.key === 'Escape') {
      e.preventDefault();
      e.stopPropagation();
      setClosedAt(query!.start);
    }
  };

  const sync = () => setCaret(ref.current?.selectionStart ?? value.length);

  return (
    <div className="relative">
      <label htmlFor={fieldId} className="text-sm font-medium">
        {label}
      </label>
      <textarea
        ref={ref}
        id={fieldId}
        rows={rows}
        value={value}
        maxLength={5000}
        autoFocus={autoFocus}
        placeholder={placeholder}
        aria-describedby={[describedBy, `${fieldId}-hint`].filter(Boolean).join(' ')}
        aria-invalid={invalid || undefined}
        aria-autocomplete="list"
        aria-controls={showList ? listId : undefined}
        aria-activedescendant={showList ? `${listId}-${current}` : undefined}
        onChange={(e) => {
          onChange(e.target.value);
          setCaret(e.target.selectionStart);
          setActive(0);
          const q = mentionQuery(e.target.value, e.target.selectionStart);
          if (q?.start !== closedAt) setClosedAt(null);
        }}
        onKeyDown={onKeyDown}
        onKeyUp={sync}
        onClick={sync}
        onSelect={sync}
        className="mt-1 w-full rounded-md border border-field bg-white px-2 py-1.5 text-sm focus:border-kraft"
      />
      <p id={`${fieldId}-hint`} className="text-xs text-pencil">
        Type @ to mention someone in the studio; they get an e-mail.
      </p>
      {showList && (
        <ul
          id={listId}
          role="listbox"
          aria-label="People to mention"
          className="absolute left-0 right-0 z-20 mt-1 rounded-md border border-line bg-white py-1 text-sm shadow-lg"
        >
          {matches.map((p, i) => (
            <li
              key={p.id}
              id={`${listId}-${i}`}
              role="option"
              aria-selected={i === current}
              className={`cursor-pointer px-3 py-1.5 ${i === current ? 'bg-kraft-light' : ''}`}
              // Before the textarea loses focus, so the caret is still where the name goes.
              onMouseDown={(e) => {
                e.preventDefault();
                pick(p);
              }}
            >
              {p.name}
            </li>
          ))}
        </ul>
      )}
      <p className="sr-only" aria-live="polite">
        {showList ? `${matches.length} ${matches.length === 1 ? 'person matches' : 'people match'}; use the arrow keys and Enter to pick` : ''}
      </p>
    </div>
  );
}
