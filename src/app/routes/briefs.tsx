import { useNavigate, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useBriefs } from '@/features/briefs/api/briefs';
import { BriefForm } from '@/features/briefs/components/brief-form';
import { BriefList } from '@/features/briefs/components/brief-list';
import { TargetsForm } from '@/features/briefs/components/targets-form';

/** Briefs: coordinators hand them out and set monthly targets; a maker sees theirs and starts each tutorial from it. */
export function BriefsRoute() {
  const { studioId = '' } = useParams();
  const navigate = useNavigate();
  const list = useBriefs(studioId);
  const d = list.data;
  return (
    <main className="mx-auto max-w-5xl px-4 py-8 sm:px-6">
      <h1 className="text-2xl">Briefs</h1>
      <hr className="score-rule my-4" />
      {list.isPending ? (
        <Loading label="Loading briefs" />
      ) : list.error ? (
        <Notice kind="error">{list.error.message}</Notice>
      ) : (
        d && (
          <div className="grid gap-8">
            {d.abilities.createBrief && (
              <section aria-labelledby="new-brief" className="rounded-lg border border-line bg-white p-4">
                <h2 id="new-brief" className="mb-3 text-lg">
                  Hand out a brief
                </h2>
                <BriefForm studioId={studioId} makers={d.makers} />
              </section>
            )}
            <section aria-labelledby="brief-list">
              <h2 id="brief-list" className="mb-3 text-lg">
                {d.abilities.createBrief ? 'Every brief' : 'Your briefs'}
              </h2>
              {d.briefs.length === 0 ? (
                <EmptyState title="No briefs yet">
                  {d.abilities.createBrief
                    ? 'Hand one out above: the maker gets an e-mail.'
                    : 'When a coordinator gives you a brief, it shows up here and in your e-mail.'}
                </EmptyState>
              ) : (
                <BriefList briefs={d.briefs} tutorialPath={paths.tutorial} onStarted={(t) => navigate(paths.tutorial(t.id))} />
              )}
            </section>
            <section aria-labelledby="targets">
              <h2 id="targets" className="mb-3 text-lg">
                Monthly targets
              </h2>
              <TargetsForm studioId={studioId} />
            </section>
          </div>
        )
      )}
    </main>
  );
}
