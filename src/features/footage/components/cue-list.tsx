import { memo, useCallback, useEffect, useMemo, useRef } from 'react';
import type { CueDto } from '@shared/schemas/footage';
import { splitByMatches, type CueMatch } from '../utils/cue-search';
import { formatClock } from '../utils/format';

/** After the person scrolls the list themselves, following playback waits this long. */
export const USER_SCROLL_PAUSE_MS = 3000;

type Props = {
  cues: CueDto[];
  active: number;
  matches: CueMatch[];
  currentMatch: number;
  onSeek: (ms: number) => void;
};

const CueRow = memo(function CueRow(props: {
  cue: CueDto;
  active: boolean;
  matches: CueMatch[];
  first: number;
  current: number;
  onSeek: (ms: number) => void;
}) {
  const { cue, active, matches, first, current, onSeek } = props;
  const parts = matches.length ? splitByMatches(cue.text, matches, first) : null;
  return (
    <li data-cue={cue.position}>
      <button
        type="button"
        onClick={() => onSeek(cue.startMs)}
        aria-current={active ? 'true' : undefined}
        className={`flex w-full gap-3 border-l-[3px] px-3 py-1.5 text-left text-sm transition-colors ${
          active ? 'border-sage bg-sage-light' : 'border-transparent hover:bg-kraft-light/60'
        }`}
      >
        <span className={`w-12 shrink-0 pt-px text-xs tabular-nums ${active ? 'font-semibold text-ink' : 'text-pencil'}`}>{formatClock(cue.startMs)}</span>
        <span className="min-w-0 whitespace-pre-line">
          {parts
            ? parts.map((p, i) =>
                p.match === null ? (
                  <span key={i}>{p.text}</span>
                ) : (
                  <mark key={i} data-match={p.match} className={`rounded-sm px-px ${p.match === current ? 'bg-kraft text-white' : 'bg-kraft/25 text-ink'}`}>
                    {p.text}
                  </mark>
                ),
              )
            : cue.text}
        </span>
      </button>
    </li>
  );
});

/**
 * The cues with their times. The spoken cue is highlighted and kept in view during playback,
 * except for a few seconds after the person scrolls the list themselves; stepping through search
 * matches brings the current match into view and holds playback's scrolling off the same way.
 */
export function CueList({ cues, active, matches, currentMatch, onSeek }: Props) {
  const box = useRef<HTMLOListElement>(null);
  const userScrolledAt = useRef(0);

  const byCue = useMemo(() => {
    const m = new Map<number, { list: CueMatch[]; first: number }>();
    matches.forEach((x, i) => {
      const e = m.get(x.cue);
      if (e) e.list.push(x);
      else m.set(x.cue, { list: [x], first: i });
    });
    return m;
  }, [matches]);

  const scrollTo = useCallback(
    (index: number, smooth: boolean) => {
      const list = box.current;
      const row = list?.querySelector<HTMLElement>(`[data-cue="${cues[index]?.position}"]`);
      if (!list || !row) return;
      const top = row.offsetTop;
      const bottom = top + row.offsetHeight;
      // Leave it be while it is comfortably on screen; otherwise bring it to a third of the way down.
      if (top >= list.scrollTop && bottom <= list.scrollTop + list.clientHeight * 0.8) return;
      const reduce = window.matchMedia?.('(prefers-reduced-motion: reduce)').matches;
      list.scrollTo({ top: Math.max(0, top - list.clientHeight / 3), behavior: smooth && !reduce ? 'smooth' : 'auto' });
    },
    [cues],
  );

  useEffect(() => {
    if (active < 0 || Date.now() - userScrolledAt.current < USER_SCROLL_PAUSE_MS) return;
    scrollTo(active, true);
  }, [active, scrollTo]);

  useEffect(() => {
    if (currentMatch < 0 || !matches[currentMatch]) return;
    userScrolledAt.current = Date.now();
    scrollTo(matches[currentMatch].cue, false);
  }, [currentMatch, matches, scrollTo]);

  const noteUserScroll = () => {
    userScrolledAt.current = Date.now();
  };

  return (
    <ol
      ref={box}
      aria-label="Transcript lines"
      className="relative max-h-[26rem] overflow-y-auto overscroll-contain py-1"
      onWheel={noteUserScroll}
      onTouchMove={noteUserScroll}
      onPointerDown={(e) => {
        // A press on the scroll bar itself (to the right of the rows) is scrolling too.
        if (e.target === e.currentTarget) noteUserScroll();
      }}
    >
      {cues.map((c, i) => {
        const m = byCue.get(i);
        const first = m?.first ?? -1;
        const current = m && currentMatch >= first && currentMatch < first + m.list.length ? currentMatch : -1;
        return <CueRow key={c.id} cue={c} active={i === active} matches={m?.list ?? NONE} first={first} current={current} onSeek={onSeek} />;
      })}
    </ol>
  );
}

const NONE: CueMatch[] = [];
