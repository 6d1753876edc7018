/** When a class meets, in words, in the class's own time zone: "Sunday, March 14, 2027, 6:30 – 8:00 PM CDT". */
export function classWhen(startsAt: string | Date, durationMinutes: number, timeZone: string, locale = 'en-US'): string {
  const start = new Date(startsAt);
  const end = new Date(start.getTime() + durationMinutes * 60_000);
  const f = new Intl.DateTimeFormat(locale, {
    timeZone,
    weekday: 'long',
    year: 'numeric',
    month: 'long',
    day: 'numeric',
    hour: 'numeric',
    minute: '2-digit',
    timeZoneName: 'short',
  });
  return f.formatRange(start, end);
}

/** A moment in the class's time zone ("March 12, 2027, 6:00 PM CDT"), for deadlines and holds. */
export function momentIn(at: string | Date, timeZone: string, locale = 'en-US'): string {
  return new Intl.DateTimeFormat(locale, {
    timeZone,
    year: 'numeric',
    month: 'long',
    day: 'numeric',
    hour: 'numeric',
    minute: '2-digit',
    timeZoneName: 'short',
  }).format(new Date(at));
}

/** Is the place a video-call link rather than an address? */
export const isLink = (place: string) => /^https?:\/\/\S+$/i.test(place.trim());

/** The offset of a time zone at an instant, in minutes east of UTC (-300 for Chicago in winter). */
export function offsetMinutes(at: Date, timeZone: string): number {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
  }).formatToParts(at);
  const n = (t: string) => Number(parts.find((p) => p.type === t)?.value);
  const asUtc = Date.UTC(n('year'), n('month') - 1, n('day'), n('hour'), n('minute'), n('second'));
  return Math.round((asUtc - Math.floor(at.getTime() / 1000) * 1000) / 60_000);
}

/**
 * A wall-clock date and time in a time zone as ISO 8601 with its offset: ("2027-03-14", "18:30",
 * "America/Chicago") gives "2027-03-14T18:30:00-05:00". Null when the date or time does not read.
 */
export function zonedIso(date: string, time: string, timeZone: string): string | null {
  const d = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  const t = /^(\d{2}):(\d{2})$/.exec(time);
  if (!d || !t) return null;
  const wall = Date.UTC(Number(d[1]), Number(d[2]) - 1, Number(d[3]), Number(t[1]), Number(t[2]));
  // Twice: the offset at the guessed instant may differ from the one at the real instant (a DST change between).
  let off = offsetMinutes(new Date(wall), timeZone);
  off = offsetMinutes(new Date(wall - off * 60_000), timeZone);
  const sign = off < 0 ? '-' : '+';
  const abs = Math.abs(off);
  const hh = String(Math.floor(abs / 60)).padStart(2, '0');
  const mm = String(abs % 60).padStart(2, '0');
  return `${date}T${time}:00${sign}${hh}:${mm}`;
}
