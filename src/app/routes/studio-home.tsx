import { useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { STATE_LABELS, TUTORIAL_STATES } from '@shared/schemas/tutorial';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useTutorials } from '@/features/tutorials/api/get-tutorials';
import { CreateTutorialForm } from '@/features/tutorials/components/create-tutorial-form';
import { TutorialRow } from '@/features/tutorials/components/tutorial-row';
import { MyClasses } from '@/features/classes/components/my-classes';

/** The studio's tutorials, filterable by state, with a form to start a new one. */
export function StudioHomeRoute() {
  const { studioId = '' } = useParams();
  const navigate = useNavigate();
  const [state, setState] = useState<string | undefined>();
  const [q, setQ] = useState('');
  const list = useTutorials(studioId, { state, q: q.trim() || undefined });
  const canCreate = list.data?.abilities.createTutorial;
  // A student sees published tutorials only, so the other states would be chips that find nothing.
  const chips = list.data && !list.data.abilities.seeAllTutorials ? [undefined, 'published' as const] : [undefined, ...TUTORIAL_STATES];
  return (
    <main className="mx-auto max-w-5xl px-4 sm:px-6 py-8">
      <h1 className="text-2xl">Tutorials</h1>
      <hr className="score-rule my-4" />
      <MyClasses />
      {canCreate && (
        <div className="mb-6 rounded-lg border border-line bg-white p-4">
          <CreateTutorialForm studioId={studioId} onCreated={(t) => navigate(paths.tutorial(t.id))} />
        </div>
      )}
      <div className="mb-3 flex flex-wrap items-center gap-2" role="group" aria-label="Filter by state">
        {chips.map((s) => (
          <button
            key={s ?? 'all'}
            type="button"
            aria-pressed={state === s}
            onClick={() => setState(s)}
            className={`rounded-full border px-3 py-1 text-xs ${state === s ? 'border-kraft bg-kraft-light text-kraft-dark' : 'border-line bg-white'}`}
          >
            {s ? STATE_LABELS[s] : 'all'}
          </button>
        ))}
        <input
          type="search"
          aria-label="Search titles"
          placeholder="Search titles"
          className="ml-auto rounded-md border border-field bg-white px-3 py-1.5 text-sm"
          value={q}
          onChange={(e) => setQ(e.target.value)}
        />
      </div>
      {list.isPending ? (
        <Loading label="Loading tutorials" />
      ) : list.error ? (
        <Notice kind="error">{list.error.message}</Notice>
      ) : list.data.tutorials.length === 0 ? (
        state || q ? (
          <EmptyState title="Nothing matches">Clear the filter or the search to see every tutorial.</EmptyState>
        ) : (
          <EmptyState title="No tutorials yet">
            {canCreate
              ? 'Give your first project a title above. You can then upload its recording and transcript in the Footage section.'
              : 'Published tutorials of this studio will show up here.'}
          </EmptyState>
        )
      ) : (
        <ul className="rounded-lg border border-line bg-white">
          {list.data.tutorials.map((t) => (
            <TutorialRow key={t.id} tutorial={t} />
          ))}
        </ul>
      )}
    </main>
  );
}
