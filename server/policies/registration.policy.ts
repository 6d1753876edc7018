import type { RegistrationStatus } from '@shared/schemas/class';

type RegistrationLike = { status: RegistrationStatus; paidAt: Date | null };
type ClassLike = { startsAt: Date; cancellationDeadline: Date | null };

/**
 * What the holder of a registration's link may do with it (the link's token is their key; no
 * sign-in). The handout and the calendar invitation come with a confirmed seat. A seat, a held
 * seat or a place on the waiting list can be given up until the class starts, except that a paid
 * seat past the cancellation deadline is the teacher's to refund.
 */
export function attendeeAbilities(reg: RegistrationLike, klass: ClassLike, now = Date.now()) {
  const live = reg.status === 'confirmed' || reg.status === 'awaiting_payment' || reg.status === 'waitlisted';
  const pastDeadline = reg.status === 'confirmed' && reg.paidAt !== null && klass.cancellationDeadline !== null && klass.cancellationDeadline.getTime() < now;
  const started = klass.startsAt.getTime() <= now;
  return {
    readHandout: reg.status === 'confirmed',
    readCalendar: reg.status === 'confirmed',
    /** What the attendee's page offers. */
    cancel: live && !pastDeadline && !started,
    /** A paid seat may be given up on one's own before the cancellation deadline only. */
    withinDeadline: !pastDeadline,
  };
}
