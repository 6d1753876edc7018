import { Link } from 'react-router-dom';
import type { ChecklistItemDto } from '@shared/schemas/review';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useChecklist } from '../api/get-checklist';

const MARK: Record<'yes' | 'no' | 'na', { sign: string; words: string; tone: string }> = {
  yes: { sign: '✓', words: 'Done', tone: 'text-sage' },
  no: { sign: '✗', words: 'To do', tone: 'text-rosehip' },
  na: { sign: '–', words: 'Does not apply', tone: 'text-pencil' },
};

/**
 * The review checklist the maker and the coordinator both see, each item marked in words (done,
 * to do, does not apply) with what was found and a link to the section that fixes it.
 */
export function ReviewChecklist({ tutorialId, sectionPath }: { tutorialId: string; sectionPath: (s: ChecklistItemDto['section']) => string | null }) {
  const q = useChecklist(tutorialId);
  return (
    <section aria-labelledby="review-checklist-title" className="rounded-lg border border-line bg-white p-5">
      <div className="flex flex-wrap items-baseline gap-x-3">
        <h2 id="review-checklist-title" className="text-lg">
          Review checklist
        </h2>
        {q.data && (
          <p className="text-sm text-pencil">
            {q.data.passed} of {q.data.total} done
            {q.data.openComments ? `; ${q.data.openComments} open ${q.data.openComments === 1 ? 'comment' : 'comments'}` : ''}
          </p>
        )}
      </div>
      {q.isPending && <Loading label="Checking" />}
      {q.error && <Notice kind="error">The checklist could not be worked out: {q.error.message}</Notice>}
      {q.data && (
        <ul className="mt-3 space-y-2">
          {q.data.items.map((item) => {
            const m = MARK[item.ok === null ? 'na' : item.ok ? 'yes' : 'no'];
            const to = item.ok === false ? sectionPath(item.section) : null;
            return (
              <li key={item.key} className="flex gap-2 text-sm">
                <span aria-hidden className={`w-4 shrink-0 text-center font-bold ${m.tone}`}>
                  {m.sign}
                </span>
                <div className="min-w-0">
                  <p>
                    <span className="font-medium">{item.label}</span> <span className={`text-xs font-semibold ${m.tone}`}>({m.words})</span>
                  </p>
                  <p className="text-xs text-pencil">
                    {item.detail}
                    {to && (
                      <>
                        {' '}
                        <Link to={to} className="text-kraft-dark underline">
                          Fix it
                        </Link>
                      </>
                    )}
                  </p>
                </div>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
