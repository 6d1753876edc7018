import { Link } from 'react-router-dom';
import type { CalendarEntryDto } from '@shared/schemas/board';
import { daysOfMonth, weekdayIndex } from '@shared/board/dates';

const KIND: Record<CalendarEntryDto['kind'], string> = { due: 'Due', brief: 'Brief due', published: 'Published', scheduled: 'Publishes' };
const WEEKDAYS = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];

function time(e: CalendarEntryDto, timeZone: string) {
  return e.at ? ` ${new Intl.DateTimeFormat(undefined, { hour: '2-digit', minute: '2-digit', timeZone }).format(new Date(e.at))}` : '';
}

function Entry({ e, timeZone, link }: { e: CalendarEntryDto; timeZone: string; link: (e: CalendarEntryDto) => string }) {
  return (
    <li className="text-xs leading-snug">
      <span className={`font-medium ${e.kind === 'scheduled' || e.kind === 'published' ? 'text-ink' : 'text-kraft-dark'}`}>
        {KIND[e.kind]}
        {time(e, timeZone)}:
      </span>{' '}
      <Link to={link(e)} className="underline">
        {e.title}
      </Link>
    </li>
  );
}

/**
 * The month's due, brief, published and scheduled dates: a week grid on wide screens, a list of
 * the days that have something on narrow ones (seven columns do not fit a phone).
 */
export function MonthCalendar(props: { month: string; today: string; timeZone: string; entries: CalendarEntryDto[]; link: (e: CalendarEntryDto) => string }) {
  const days = daysOfMonth(props.month);
  const byDay = new Map<string, CalendarEntryDto[]>();
  for (const e of props.entries) byDay.set(e.day, [...(byDay.get(e.day) ?? []), e]);
  const lead = weekdayIndex(days[0]!);
  const label = (d: string) =>
    new Intl.DateTimeFormat(undefined, { weekday: 'long', day: 'numeric', month: 'long', timeZone: 'UTC' }).format(new Date(`${d}T00:00:00Z`));
  return (
    <div>
      <ol className="grid gap-2 md:hidden" aria-label="Dates this month">
        {days
          .filter((d) => byDay.has(d))
          .map((d) => (
            <li key={d} className="rounded-md border border-line bg-white p-2">
              <p className="text-sm font-medium">
                {label(d)}
                {d === props.today ? ' (today)' : ''}
              </p>
              <ul>
                {byDay.get(d)!.map((e, i) => (
                  <Entry key={i} e={e} timeZone={props.timeZone} link={props.link} />
                ))}
              </ul>
            </li>
          ))}
        {byDay.size === 0 && <li className="text-sm text-pencil">Nothing is due or publishing this month.</li>}
      </ol>
      <table className="hidden w-full table-fixed border-collapse md:table">
        <caption className="sr-only">Due and publish dates this month</caption>
        <thead>
          <tr>
            {WEEKDAYS.map((w) => (
              <th key={w} scope="col" className="py-1 text-xs font-medium text-pencil">
                {w}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {Array.from({ length: Math.ceil((lead + days.length) / 7) }, (_, week) => (
            <tr key={week}>
              {WEEKDAYS.map((_, col) => {
                const d = days[week * 7 + col - lead];
                return (
                  <td
                    key={col}
                    className={`h-20 border border-line p-1 align-top ${d ? 'bg-white' : 'bg-paper'} ${d === props.today ? 'outline outline-2 -outline-offset-2 outline-kraft' : ''}`}
                  >
                    {d && (
                      <>
                        <span className="text-xs text-pencil">
                          {Number(d.slice(8))}
                          {d === props.today && <span className="sr-only"> (today)</span>}
                        </span>
                        <ul>
                          {(byDay.get(d) ?? []).map((e, i) => (
                            <Entry key={i} e={e} timeZone={props.timeZone} link={props.link} />
                          ))}
                        </ul>
                      </>
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
