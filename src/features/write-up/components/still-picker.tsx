import { Link } from 'react-router-dom';
import type { StillAttrs } from '@shared/editor';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { useTutorialStills } from '../api/get-stills';
import { Modal } from './modal';

/** Picks one of the tutorial's stills (pulled in the Footage section) to put in the write-up. */
export function StillPicker({
  tutorialId,
  open,
  onPick,
  onClose,
}: {
  tutorialId: string;
  open: boolean;
  onPick: (still: StillAttrs) => void;
  onClose: () => void;
}) {
  const q = useTutorialStills(tutorialId, { enabled: open });
  const total = q.groups.reduce((n, g) => n + g.stills.length, 0);
  return (
    <Modal open={open} title="Put in a still" onClose={onClose} wide>
      {q.isPending ? (
        <Loading label="Loading the stills" />
      ) : q.error ? (
        <Notice kind="error">{q.error.message}</Notice>
      ) : total === 0 ? (
        <p className="text-sm text-pencil">
          No stills yet. Pull frames from the video in the{' '}
          <Link to={paths.tutorialSection(tutorialId, 'footage')} className="text-kraft-dark underline">
            Footage section
          </Link>
          , then come back and pick them here.
        </p>
      ) : (
        <div className="space-y-5">
          {q.groups
            .filter((g) => g.stills.length > 0)
            .map((g) => (
              <section key={g.recording.id} aria-label={`Stills from ${g.recording.originalName}`}>
                {q.groups.length > 1 && <h3 className="mb-2 font-sans text-sm font-semibold">{g.recording.originalName}</h3>}
                <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 md:grid-cols-4">
                  {g.stills.map((s) => (
                    <li key={s.id}>
                      <button
                        type="button"
                        onClick={() => onPick({ stillId: s.id, src: s.url, alt: s.alt ?? '', caption: s.caption ?? '', width: s.width, height: s.height })}
                        className="group flex w-full flex-col overflow-hidden rounded-md border border-line bg-white text-left hover:border-kraft focus-visible:border-kraft"
                        aria-label={`Still at ${formatTimestamp(s.atMs)}${s.caption ? `: ${s.caption}` : ''}`}
                      >
                        <img src={s.url} alt="" width={s.width} height={s.height} loading="lazy" className="aspect-video w-full bg-kraft-light object-cover" />
                        <span className="flex items-baseline gap-2 px-2 py-1.5 text-xs">
                          <span className="tabular-nums text-pencil">{formatTimestamp(s.atMs)}</span>
                          <span className="truncate">{s.caption || <span className="text-pencil">No caption</span>}</span>
                        </span>
                        {!s.alt && <span className="px-2 pb-1.5 text-xs text-rosehip">No alt text yet</span>}
                      </button>
                    </li>
                  ))}
                </ul>
              </section>
            ))}
        </div>
      )}
    </Modal>
  );
}
