import type { StateChangeDto } from '@shared/schemas/review';
import { STATE_LABELS } from '@shared/schemas/tutorial';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useHistory } from '../api/get-history';
import { moveVerb } from '../utils/move-words';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function Move({ m }: { m: StateChangeDto }) {
  const who = m.by?.name ?? 'Cardwright';
  const verb = moveVerb(m);
  return (
    <li className="border-l-2 border-line pl-3">
      <p className="text-sm">
        <span className="font-medium">{who}</span> {verb}{' '}
        <span className="text-pencil">
          ({STATE_LABELS[m.from]} → {STATE_LABELS[m.to]})
        </span>
      </p>
      <p className="text-xs text-pencil">
        <time dateTime={m.at}>{when(m.at)}</time>
      </p>
      {m.note && <blockquote className="mt-1 whitespace-pre-wrap rounded bg-paper px-2 py-1 text-sm">“{m.note}”</blockquote>}
      {m.openComments.length > 0 && (
        <div className="mt-1 text-sm">
          <p className="text-xs font-medium">
            {m.openComments.length} open {m.openComments.length === 1 ? 'comment' : 'comments'} then:
          </p>
          <ol className="ml-5 list-decimal text-xs">
            {m.openComments.map((c) => (
              <li key={c.id}>
                <span className="font-medium">{c.where}:</span> {c.body} <span className="text-pencil">({c.author})</span>
              </li>
            ))}
          </ol>
        </div>
      )}
    </li>
  );
}

/** Every move between states, newest first: who, when, from, to, and the note. */
export function ReviewHistory({ tutorialId }: { tutorialId: string }) {
  const q = useHistory(tutorialId);
  return (
    <section aria-labelledby="review-history-title" className="rounded-lg border border-line bg-white p-5">
      <h2 id="review-history-title" className="text-lg">
        History
      </h2>
      {q.isPending && <Loading label="Loading the history" />}
      {q.error && <Notice kind="error">The history could not be loaded: {q.error.message}</Notice>}
      {q.data && q.data.history.length === 0 && <p className="mt-2 text-sm text-pencil">No moves yet: it has been a draft since it was made.</p>}
      {q.data && q.data.history.length > 0 && (
        <ol className="mt-3 space-y-3" aria-label="Moves, newest first">
          {q.data.history.map((m) => (
            <Move key={m.id} m={m} />
          ))}
        </ol>
      )}
    </section>
  );
}
