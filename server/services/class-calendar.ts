import { createEvent } from 'ics';
import { isLink } from '@shared/classes/when';

export type CalendarClass = {
  id: string;
  title: string;
  startsAt: Date;
  durationMinutes: number;
  place: string;
  description: string;
  url: string;
  organizer: { name: string; email: string };
};

/**
 * The class as an iCalendar event (RFC 5545) through the `ics` package: a stable UID per class,
 * times in UTC, the place as LOCATION (and URL for a video call), METHOD:PUBLISH since the
 * attendee only adds it to their calendar (no replies are expected).
 */
export function classIcs(c: CalendarClass): string {
  const { error, value } = createEvent({
    uid: `class-${c.id}@cardwright.local`,
    productId: 'cardwright/classes',
    method: 'PUBLISH',
    title: c.title,
    description: c.description,
    location: c.place,
    url: isLink(c.place) ? c.place.trim() : c.url,
    start: c.startsAt.getTime(),
    startInputType: 'utc',
    startOutputType: 'utc',
    duration: { hours: Math.floor(c.durationMinutes / 60), minutes: c.durationMinutes % 60 },
    status: 'CONFIRMED',
    organizer: c.organizer,
  });
  if (error || !value) throw error ?? new Error('the calendar event could not be made');
  return value;
}
