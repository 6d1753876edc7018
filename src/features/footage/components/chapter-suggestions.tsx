import { Button } from '@/components/ui/button';
import type { ChapterSuggestionDto } from '@shared/schemas/footage';
import { suggestionKey } from '../hooks/use-dismissed-suggestions';
import { formatClock } from '../utils/format';

type Props = {
  suggestions: ChapterSuggestionDto[];
  onAccept: (s: ChapterSuggestionDto) => void;
  onDismiss: (s: ChapterSuggestionDto) => void;
  onSeek: (ms: number) => void;
  accepting: string | null;
};

/** Chapters the transcript suggests where the talk moves on; accept one to add it. */
export function ChapterSuggestions({ suggestions, onAccept, onDismiss, onSeek, accepting }: Props) {
  if (suggestions.length === 0) return null;
  return (
    <div className="border-t border-line px-4 py-3">
      <h3 className="font-sans text-sm font-semibold">Suggested from the transcript</h3>
      <p className="text-xs text-pencil">Where the talk moves on (“first”, “next”, “now we” …). Accept the ones that start a step.</p>
      <ul className="mt-2 space-y-2">
        {suggestions.map((s) => {
          const key = suggestionKey(s);
          return (
            <li key={key} className="rounded-md border border-dashed border-kraft/40 bg-paper px-3 py-2">
              <div className="flex items-start gap-2">
                <button
                  type="button"
                  onClick={() => onSeek(s.startMs)}
                  className="w-12 shrink-0 pt-1 text-left text-sm tabular-nums text-kraft-dark hover:underline"
                >
                  {formatClock(s.startMs)}
                </button>
                <span className="min-w-0 flex-1 pt-1 text-sm font-medium break-words">{s.title}</span>
                <Button size="sm" busy={accepting === key} onClick={() => onAccept(s)} aria-label={`Accept “${s.title}”`}>
                  Accept
                </Button>
                <Button variant="ghost" size="sm" onClick={() => onDismiss(s)} aria-label={`Dismiss “${s.title}”`}>
                  Dismiss
                </Button>
              </div>
              <p className="mt-1 truncate pl-14 text-xs italic text-pencil" title={s.cueText}>
                “{s.cueText}”
              </p>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
