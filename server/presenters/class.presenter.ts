import { formatMoney } from '@shared/money';
import { isLink } from '@shared/classes/when';
import type { ClassDto, ClassSummaryDto, MyClassDto, PublicClassDto, RegistrationDto, RegistrationRowDto, RegistrationStatus } from '@shared/schemas/class';
import type { CraftClass, Registration, Studio, Tutorial } from '../models';
import type { ClassAbilities } from '../policies';
import { config } from '../config';
import { classPublicPath, classTitle, closedReason, feeText, tutorialPublicUrl, whenText } from '../services/classes';

type Counts = { taken: number; waiting: number };
type Cautions = { lines: string[]; custom: boolean; defaults: string[] };

/** The class as anyone may read it on its public page: no roster. */
export function presentPublicClass(k: CraftClass, studio: Studio, t: Tutorial, counts: Counts, cautions: string[]): PublicClassDto {
  const closed = closedReason(k);
  const full = counts.taken >= k.seats || counts.waiting > 0;
  return {
    id: k.id,
    studio: { name: studio.name, slug: studio.slug },
    tutorial: { title: t.title, publicUrl: tutorialPublicUrl(t, studio) },
    title: classTitle(k, t),
    startsAt: k.startsAt.toISOString(),
    endsAt: new Date(k.startsAt.getTime() + k.durationMinutes * 60_000).toISOString(),
    timeZone: k.timeZone,
    when: whenText(k),
    durationMinutes: k.durationMinutes,
    place: k.place,
    placeIsLink: isLink(k.place),
    seats: k.seats,
    seatsLeft: Math.max(0, k.seats - counts.taken),
    waitlisted: counts.waiting,
    kitFeeCents: k.kitFeeCents,
    currency: k.currency,
    fee: feeText(k),
    whatToBring: k.whatToBring,
    cancellationDeadline: k.cancellationDeadline?.toISOString() ?? null,
    cautions,
    status: k.status,
    registration: closed
      ? { state: 'closed', reason: closed }
      : full
        ? { state: 'full', reason: 'Every seat is taken: you can join the waiting list.' }
        : { state: 'open', reason: null },
    publicPath: classPublicPath(studio.slug, k.id),
  };
}

/** One roster row; `place` is the position on the waiting list. */
export function presentRegistrationRow(r: Registration, place: number | null): RegistrationRowDto {
  return {
    id: r.id,
    name: r.name,
    email: r.email,
    status: r.status,
    endReason: r.endReason,
    amountCents: r.amountCents,
    currency: r.currency,
    holdExpiresAt: r.holdExpiresAt?.toISOString() ?? null,
    offeredAt: r.offeredAt?.toISOString() ?? null,
    paidAt: r.paidAt?.toISOString() ?? null,
    checkedIn: r.checkedInAt !== null,
    createdAt: r.createdAt.toISOString(),
    waitlistPlace: place,
  };
}

/** The class with its roster, for those who run it. */
export function presentClass(
  k: CraftClass,
  studio: Studio,
  t: Tutorial,
  regs: Registration[],
  counts: Counts,
  cautions: Cautions,
  abilities: ClassAbilities,
): ClassDto {
  const pub = presentPublicClass(k, studio, t, counts, cautions.lines);
  let place = 0;
  return {
    ...pub,
    studioId: k.studioId,
    tutorialId: k.tutorialId,
    seatsTaken: counts.taken,
    spares: k.spares,
    paper: k.paper,
    cautionsCustom: cautions.custom,
    defaultCautions: cautions.defaults,
    publicUrl: `${config.publicUrl}${pub.publicPath}`,
    registrations: regs.map((r) => presentRegistrationRow(r, r.status === 'waitlisted' ? ++place : null)),
    abilities,
  };
}

export function presentClassSummary(k: CraftClass, t: Tutorial, studio: Studio, counts: Counts): ClassSummaryDto {
  return {
    id: k.id,
    title: classTitle(k, t),
    startsAt: k.startsAt.toISOString(),
    when: whenText(k),
    timeZone: k.timeZone,
    place: k.place,
    seats: k.seats,
    seatsTaken: counts.taken,
    waitlisted: counts.waiting,
    status: k.status,
    kitFeeCents: k.kitFeeCents,
    currency: k.currency,
    fee: feeText(k),
    tutorialId: t.id,
    tutorialTitle: t.title,
    publicPath: classPublicPath(studio.slug, k.id),
    past: k.startsAt.getTime() + k.durationMinutes * 60_000 < Date.now(),
  };
}

const MESSAGES: Record<RegistrationStatus, string> = {
  awaiting_payment: 'Your seat is held while you pay the kit fee.',
  confirmed: 'You’re in: your seat is confirmed.',
  waitlisted: 'The class is full: you are on the waiting list.',
  cancelled: 'This registration was cancelled.',
  refunded: 'This registration was cancelled and the kit fee refunded.',
  expired: 'This seat hold ended before it was paid.',
};

/** The attendee's own page. */
export function presentRegistration(
  r: Registration,
  pub: PublicClassDto,
  opts: { place: number | null; links: { handout: string; calendar: string }; cancelNote: string | null; canCancel: boolean },
): RegistrationDto {
  return {
    id: r.id,
    status: r.status,
    name: r.name,
    email: r.email,
    endReason: r.endReason,
    holdExpiresAt: r.holdExpiresAt?.toISOString() ?? null,
    waitlistPlace: opts.place,
    amountCents: r.amountCents,
    currency: r.currency,
    fee: r.amountCents === 0 ? 'Free' : formatMoney(r.amountCents, r.currency),
    canPay: r.status === 'awaiting_payment' && r.amountCents > 0,
    canCancel: opts.canCancel,
    cancelNote: opts.cancelNote,
    message:
      r.endReason && (r.status === 'cancelled' || r.status === 'expired' || r.status === 'refunded')
        ? `${MESSAGES[r.status]} ${r.endReason}`
        : MESSAGES[r.status],
    class: pub,
    handoutUrl: r.status === 'confirmed' ? opts.links.handout : null,
    calendarUrl: r.status === 'confirmed' ? opts.links.calendar : null,
  };
}

export function presentMyClass(r: Registration, pub: PublicClassDto, links: { registration: string; handout: string }): MyClassDto {
  return {
    registrationId: r.id,
    status: r.status,
    class: pub,
    registrationUrl: links.registration,
    handoutUrl: r.status === 'confirmed' ? links.handout : null,
    tutorialUrl: pub.tutorial.publicUrl,
  };
}
