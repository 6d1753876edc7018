import { Button } from '@/components/ui/button';
import { formatClock } from '../utils/format';

type Props = {
  playing: boolean;
  timeMs: number;
  durationMs: number;
  chapterTitle: string | null;
  canEdit: boolean;
  onToggle: () => void;
  onMark: () => void;
  onPull: (mode: 'exact' | 'sharpest') => void;
  marking: boolean;
  pulling: 'exact' | 'sharpest' | null;
};

const Key = ({ children }: { children: string }) => (
  <kbd className="rounded border border-current/30 px-1 font-sans text-[10px] leading-4 opacity-70">{children}</kbd>
);

/** Play, the playhead against the length, and the actions that use the playhead. */
export function PlayerToolbar({ playing, timeMs, durationMs, chapterTitle, canEdit, onToggle, onMark, onPull, marking, pulling }: Props) {
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
      <Button variant="secondary" size="sm" onClick={onToggle} aria-label={playing ? 'Pause' : 'Play'} className="w-20">
        {playing ? (
          <svg viewBox="0 0 16 16" className="h-3.5 w-3.5" aria-hidden>
            <rect x="3.5" y="2.5" width="3" height="11" rx="0.5" fill="currentColor" />
            <rect x="9.5" y="2.5" width="3" height="11" rx="0.5" fill="currentColor" />
          </svg>
        ) : (
          <svg viewBox="0 0 16 16" className="h-3.5 w-3.5" aria-hidden>
            <path d="M4 2.5v11l9-5.5z" fill="currentColor" />
          </svg>
        )}
        {playing ? 'Pause' : 'Play'}
      </Button>
      <p className="text-sm tabular-nums" aria-label="Playhead">
        <span className="font-semibold">{formatClock(timeMs)}</span>
        <span className="text-pencil"> / {formatClock(durationMs)}</span>
      </p>
      {chapterTitle && (
        <p className="min-w-0 max-w-56 truncate text-sm text-pencil" title={chapterTitle}>
          in “{chapterTitle}”
        </p>
      )}
      {canEdit && (
        <div className="ml-auto flex flex-wrap gap-2">
          <Button variant="secondary" size="sm" onClick={onMark} busy={marking}>
            Mark chapter <Key>C</Key>
          </Button>
          <Button size="sm" onClick={() => onPull('exact')} busy={pulling === 'exact'} disabled={pulling !== null}>
            Pull still <Key>S</Key>
          </Button>
          <Button variant="secondary" size="sm" onClick={() => onPull('sharpest')} busy={pulling === 'sharpest'} disabled={pulling !== null}>
            Sharpest nearby <Key>⇧S</Key>
          </Button>
        </div>
      )}
    </div>
  );
}
