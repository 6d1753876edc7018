import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { shiftMonth } from '@shared/board/dates';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useBoard } from '@/features/board/api/board';
import { BoardColumns } from '@/features/board/components/board-columns';
import { MonthCalendar } from '@/features/board/components/month-calendar';

const viewerZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
const monthName = (m: string) => new Intl.DateTimeFormat(undefined, { month: 'long', year: 'numeric', timeZone: 'UTC' }).format(new Date(`${m}-01T00:00:00Z`));

/** The studio board: tutorials by state, filters by maker and month, each maker against their target, and the month's calendar. */
export function BoardRoute() {
  const { studioId = '' } = useParams();
  const navigate = useNavigate();
  const timeZone = viewerZone();
  const [makerId, setMakerId] = useState('');
  const [month, setMonth] = useState<string | null>(null);
  const [onlyMonth, setOnlyMonth] = useState(false);
  const board = useBoard(studioId, { timeZone, makerId: makerId || undefined, month: month ?? undefined });
  const shown = month ?? board.data?.month;
  const b = board.data;
  return (
    <main className="mx-auto max-w-7xl px-4 py-8 sm:px-6">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-2xl">Board</h1>
        {b?.abilities.createBrief && (
          <Link to={paths.briefs(studioId)} className="text-sm text-kraft-dark underline">
            Hand out a brief
          </Link>
        )}
      </div>
      <hr className="score-rule my-4" />
      {board.isPending ? (
        <Loading label="Loading the board" />
      ) : board.error ? (
        <Notice kind="error">{board.error.message}</Notice>
      ) : (
        b &&
        shown && (
          <>
            <form className="mb-4 flex flex-wrap items-end gap-3" aria-label="Filter the board" onSubmit={(e) => e.preventDefault()}>
              <label className="flex flex-col gap-1 text-sm font-medium">
                Maker
                <select
                  className="rounded-md border border-field bg-white px-2 py-1.5 text-sm font-normal"
                  value={makerId}
                  onChange={(e) => setMakerId(e.target.value)}
                >
                  <option value="">Every maker</option>
                  {b.makers.map((m) => (
                    <option key={m.id} value={m.id}>
                      {m.name}
                    </option>
                  ))}
                </select>
              </label>
              <div className="flex items-center gap-1" role="group" aria-label="Month">
                <button type="button" className="rounded-md border border-field bg-white px-2 py-1.5 text-sm" onClick={() => setMonth(shiftMonth(shown, -1))}>
                  <span aria-hidden>‹</span> <span className="sr-only">Previous month</span>
                </button>
                <span className="min-w-36 text-center text-sm font-medium" aria-live="polite">
                  {monthName(shown)}
                </span>
                <button type="button" className="rounded-md border border-field bg-white px-2 py-1.5 text-sm" onClick={() => setMonth(shiftMonth(shown, 1))}>
                  <span aria-hidden>›</span> <span className="sr-only">Next month</span>
                </button>
              </div>
              <label className="flex items-center gap-2 text-sm">
                <input
                  type="checkbox"
                  checked={onlyMonth}
                  onChange={(e) => {
                    setOnlyMonth(e.target.checked);
                    setMonth(e.target.checked ? shown : null);
                  }}
                />
                Only tutorials due or publishing this month
              </label>
              <p className="text-xs text-pencil">Times in {timeZone}.</p>
            </form>

            {b.makers.length > 0 && (
              <section aria-labelledby="targets-title" className="mb-6">
                <h2 id="targets-title" className="mb-2 text-lg">
                  {monthName(shown)}: each maker against their target
                </h2>
                <ul className="grid gap-2 sm:grid-cols-2 lg:grid-cols-4">
                  {b.makers.map((m) => {
                    const done = m.published + m.scheduled;
                    return (
                      <li key={m.id} className="rounded-md border border-line bg-white p-3 text-sm">
                        <p className="font-medium">{m.name}</p>
                        <p>
                          {m.target === null
                            ? `${done} published or scheduled (no target set)`
                            : `${done} of ${m.target} published or scheduled${done >= m.target ? ': target met' : `: ${m.target - done} to go`}`}
                        </p>
                        <p className="text-xs text-pencil">
                          {m.published} published · {m.scheduled} scheduled · {m.due} due this month
                        </p>
                      </li>
                    );
                  })}
                </ul>
              </section>
            )}

            <BoardColumns columns={b.columns} timeZone={timeZone} tutorialPath={(id) => paths.tutorial(id)} />

            <section aria-labelledby="calendar-title" className="mt-8">
              <h2 id="calendar-title" className="mb-2 text-lg">
                Calendar: {monthName(shown)}
              </h2>
              <MonthCalendar
                month={shown}
                today={b.today}
                timeZone={timeZone}
                entries={b.calendar}
                link={(e) => (e.tutorialId ? paths.tutorial(e.tutorialId) : `${paths.briefs(studioId)}#brief-${e.briefId}`)}
              />
            </section>
            {b.columns.every((c) => c.cards.length === 0) && (
              <p className="mt-4 text-sm text-pencil">
                {b.filtered ? 'Nothing matches these filters.' : 'No tutorials yet. '}
                {!b.filtered && (
                  <button className="underline" onClick={() => navigate(paths.studio(studioId))}>
                    Start one on the Tutorials page.
                  </button>
                )}
              </p>
            )}
          </>
        )
      )}
    </main>
  );
}
