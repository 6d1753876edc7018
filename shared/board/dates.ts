/**
 * Calendar dates for the board, as plain `YYYY-MM-DD` strings: a due date is a day, not an
 * instant, so it is compared as a day in the viewer's time zone and never shifts with it.
 */

const DAY_MS = 86_400_000;

/** Days from `from` to `to` (both YYYY-MM-DD); negative when `to` is earlier. */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / DAY_MS);
}

/** The day (YYYY-MM-DD) an instant falls on in an IANA time zone. */
export function dayIn(instant: Date | string, timeZone: string): string {
  const d = typeof instant === 'string' ? new Date(instant) : instant;
  // en-CA writes dates as YYYY-MM-DD.
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(d);
}

/** The month (YYYY-MM) of a day. */
export const monthOf = (day: string): string => day.slice(0, 7);

/** The days of a month (YYYY-MM), first to last. */
export function daysOfMonth(month: string): string[] {
  const [y, m] = month.split('-').map(Number) as [number, number];
  const count = new Date(Date.UTC(y, m, 0)).getUTCDate();
  return Array.from({ length: count }, (_, i) => `${month}-${String(i + 1).padStart(2, '0')}`);
}

/** The month before or after (YYYY-MM), `by` months away. */
export function shiftMonth(month: string, by: number): string {
  const [y, m] = month.split('-').map(Number) as [number, number];
  const d = new Date(Date.UTC(y, m - 1 + by, 1));
  return `${d.getUTCFullYear()}-${String(d.getUTCMonth() + 1).padStart(2, '0')}`;
}

/** Day of the week of a YYYY-MM-DD day, Monday 0 to Sunday 6 (ISO 8601 starts weeks on Monday). */
export function weekdayIndex(day: string): number {
  return (new Date(`${day}T00:00:00Z`).getUTCDay() + 6) % 7;
}

export type DueKind = 'overdue' | 'today' | 'this_week';
/** How a due date stands, in words as well as a kind (a colour alone would not tell everyone). */
export type DueStatus = { kind: DueKind; days: number; words: string };

/**
 * Whether a tutorial's due date is past, today or within the coming week (the next six days),
 * seen from `today`. A published tutorial has been delivered: it is never overdue.
 */
export function dueStatus(dueDate: string | null, today: string, published = false): DueStatus | null {
  if (!dueDate || published) return null;
  const days = daysBetween(today, dueDate);
  if (days < 0) return { kind: 'overdue', days: -days, words: `Overdue by ${-days} ${-days === 1 ? 'day' : 'days'}` };
  if (days === 0) return { kind: 'today', days: 0, words: 'Due today' };
  if (days <= 6) return { kind: 'this_week', days, words: days === 1 ? 'Due this week: tomorrow' : `Due this week: in ${days} days` };
  return null;
}
