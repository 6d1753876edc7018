/**
 * Registrations: seat holds, payment, the waiting list and how a registration ends.
 *
 * No seat is sold twice: every change to who holds a seat runs in a transaction that first locks
 * the class row (SELECT ... FOR UPDATE), so registrations for one class queue up one after
 * another while other classes go on; a partial unique index keeps one live registration per
 * e-mail. Mail, calls to the payment provider and queue sends run after the commit.
 */
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { momentIn } from '@shared/classes/when';
import type { RegistrationStatus } from '@shared/schemas/class';
import { CraftClass, PaymentEvent, Registration, Studio, Tutorial, sequelize, type User } from '../models';
import { ConflictError, NotFoundError } from '../lib/errors';
import { attendeeAbilities } from '../policies';
import { config } from '../config';
import { scheduleHoldExpiry } from '../jobs/class-jobs';
import { closedReason, findClass, LIVE_STATUSES, registrationPath, seatCounts } from './classes';
import { sendCancelled, sendConfirmation, sendLinkAgain, sendOffer, sendWaitlisted, type ClassMailContext } from './class-mail';
import { createCheckout, expireCheckout, refundPayment, retrieveCheckout } from './payments';
import { registrationToken, tokenMatches } from './registration-token';

type After = (() => Promise<unknown>)[];

/** Runs what follows a commit (mail, provider calls) without failing the request that caused it. */
function runAfter(after: After): void {
  for (const f of after) void f().catch((e) => console.error('[classes]', (e as Error).message));
}

async function contextOf(classId: string, transaction?: Transaction): Promise<ClassMailContext> {
  const klass = await CraftClass.findByPk(classId, {
    include: [
      { model: Tutorial, as: 'tutorial' },
      { model: Studio, as: 'studio' },
    ],
    transaction,
  });
  if (!klass?.studio || !klass.tutorial) throw new NotFoundError('Class');
  return { klass, studio: klass.studio, tutorial: klass.tutorial };
}

async function lockClass(classId: string, transaction: Transaction): Promise<CraftClass> {
  const k = await CraftClass.findByPk(classId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!k) throw new NotFoundError('Class');
  return k;
}

async function lockRegistration(id: string, transaction: Transaction): Promise<Registration> {
  const r = await Registration.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  if (!r) throw new NotFoundError('Registration');
  return r;
}

/** Place on the waiting list (from 1), or null. */
export async function waitlistPlace(reg: Registration, transaction?: Transaction): Promise<number | null> {
  if (reg.status !== 'waitlisted') return null;
  return 1 + (await Registration.count({ where: { classId: reg.classId, status: 'waitlisted', seq: { [Op.lt]: reg.seq } }, transaction }));
}

/** Seat holds whose time ran out end here, inside the class's lock (the queue job may run late). */
async function expireOverdue(klass: CraftClass, t: Transaction, after: After): Promise<void> {
  const overdue = await Registration.findAll({
    where: { classId: klass.id, status: 'awaiting_payment', holdExpiresAt: { [Op.lte]: new Date() } },
    transaction: t,
    lock: t.LOCK.UPDATE,
  });
  for (const r of overdue) {
    await r.update({ status: 'expired', endReason: 'The seat was held for payment and the time ran out.' }, { transaction: t });
    if (r.checkoutSessionId) after.push(() => expireCheckout(r.checkoutSessionId!));
  }
}

/** The end of a hold: now plus the hold time, never before the provider's 30-minute minimum for a checkout. */
const holdUntil = (minutes: number) => new Date(Date.now() + Math.max(minutes, 30) * 60_000 + 30_000);

/**
 * Offers free seats to the waiting list, first come first served. A free class confirms them at
 * once; otherwise the seat is held for them (a day by default, never past the start) and they
 * are e-mailed a link to pay.
 */
async function fillFreedSeats(klass: CraftClass, t: Transaction, after: After): Promise<void> {
  if (closedReason(klass)) return;
  const { taken } = await seatCounts(klass.id, t);
  const free = klass.seats - taken;
  if (free <= 0) return;
  const next = await Registration.findAll({
    where: { classId: klass.id, status: 'waitlisted' },
    order: [['seq', 'ASC']],
    limit: free,
    transaction: t,
    lock: t.LOCK.UPDATE,
  });
  for (const r of next) {
    if (klass.kitFeeCents === 0) {
      await r.update({ status: 'confirmed', confirmedAt: new Date(), offeredAt: new Date() }, { transaction: t });
      after.push(async () => sendConfirmation(await contextOf(klass.id), r));
      continue;
    }
    const byStart = klass.startsAt.getTime();
    const hold = new Date(Math.min(Date.now() + config.classes.offerHours * 3600_000, byStart));
    await r.update(
      { status: 'awaiting_payment', offeredAt: new Date(), holdExpiresAt: hold, amountCents: klass.kitFeeCents, currency: klass.currency },
      { transaction: t },
    );
    after.push(async () => sendOffer(await contextOf(klass.id), r));
    after.push(() => scheduleHoldExpiry(r.id, hold));
  }
}

/** After more seats were added: offers them to the waiting list, in order. */
export async function offerFreedSeats(classId: string): Promise<void> {
  const after: After = [];
  await sequelize.transaction(async (t) => fillFreedSeats(await lockClass(classId, t), t, after));
  runAfter(after);
}

export type Registered = { registration: Registration; checkoutUrl: string | null; context: ClassMailContext };

/** The duplicate's 409: says so and mails the link again. */
class DuplicateRegistration extends ConflictError {}

/**
 * Registers a person for a class: a seat held for payment (with a checkout), a confirmed seat
 * (free class), or a place on the waiting list. A class that is cancelled or has started: 409.
 */
export async function register(classId: string, input: { name: string; email: string }, user: User | null): Promise<Registered> {
  const after: After = [];
  let existing: Registration | null = null;
  let reg: Registration;
  try {
    reg = await sequelize.transaction(async (t) => {
      const klass = await lockClass(classId, t);
      const closed = closedReason(klass);
      if (closed) throw new ConflictError(closed, { code: 'closed' });
      await expireOverdue(klass, t, after);
      await fillFreedSeats(klass, t, after);
      existing = await Registration.findOne({ where: { classId, email: input.email, status: { [Op.in]: [...LIVE_STATUSES] } }, transaction: t });
      if (existing) throw new DuplicateRegistration('duplicate');
      const { taken, waiting } = await seatCounts(classId, t);
      const seat = taken < klass.seats && waiting === 0;
      const status: RegistrationStatus = !seat ? 'waitlisted' : klass.kitFeeCents === 0 ? 'confirmed' : 'awaiting_payment';
      return Registration.create(
        {
          classId,
          userId: user && user.email === input.email ? user.id : null,
          name: input.name,
          email: input.email,
          status,
          amountCents: klass.kitFeeCents,
          currency: klass.currency,
          holdExpiresAt: status === 'awaiting_payment' ? holdUntil(config.classes.holdMinutes) : null,
          confirmedAt: status === 'confirmed' ? new Date() : null,
        },
        { transaction: t },
      );
    });
  } catch (e) {
    if (e instanceof DuplicateRegistration || e instanceof UniqueConstraintError) {
      runAfter(after);
      const dup = existing ?? (await Registration.findOne({ where: { classId, email: input.email, status: { [Op.in]: [...LIVE_STATUSES] } } }));
      if (dup) {
        const ctx = await contextOf(classId);
        runAfter([() => sendLinkAgain(ctx, dup)]);
      }
      throw new ConflictError('This e-mail address is already registered for this class. We sent the link to your registration to it again.', {
        code: 'duplicate',
        issues: [{ path: 'email', message: 'Already registered; check your inbox for the link' }],
      });
    }
    throw e;
  }
  runAfter(after);
  const context = await contextOf(classId);
  let checkoutUrl: string | null = null;
  if (reg.status === 'awaiting_payment') {
    try {
      checkoutUrl = await startCheckout(reg, context);
    } catch (e) {
      // No checkout, no hold: the seat goes back at once and nothing was charged.
      await endHold(reg.id, 'expired', 'The payment service did not answer, so no seat was held.');
      throw e;
    }
    await scheduleHoldExpiry(reg.id, reg.holdExpiresAt!);
  } else if (reg.status === 'confirmed') {
    runAfter([() => sendConfirmation(context, reg)]);
  } else {
    const place = (await waitlistPlace(reg)) ?? 1;
    runAfter([() => sendWaitlisted(context, reg, place)]);
  }
  return { registration: reg, checkoutUrl, context };
}

/**
 * A checkout for a held seat: the open one again, or a new one that ends with the hold (at least
 * 30 minutes, the provider's minimum, at most a day). Null when the seat turns out to be paid already.
 */
export async function startCheckout(reg: Registration, c: ClassMailContext): Promise<string | null> {
  if (reg.status !== 'awaiting_payment') throw new ConflictError('There is no seat waiting for payment on this registration');
  if (reg.checkoutSessionId) {
    const s = await retrieveCheckout(reg.checkoutSessionId);
    if (s?.status === 'open' && s.url) return s.url;
    if (s?.status === 'complete' && s.payment_status === 'paid') {
      await confirmPayment(s.id, typeof s.payment_intent === 'string' ? s.payment_intent : null);
      return null;
    }
  }
  const min = Date.now() + 30 * 60_000 + 30_000;
  const max = Date.now() + 24 * 3600_000 - 60_000;
  const hold = reg.holdExpiresAt?.getTime() ?? min;
  const expiresAt = new Date(Math.min(Math.max(hold, min), max));
  const attempt = reg.checkoutAttempt + 1;
  const token = registrationToken(reg.id);
  const page = `${config.publicUrl}${registrationPath(c.studio.slug, c.klass.id, reg.id, token)}`;
  const s = await createCheckout({
    registrationId: reg.id,
    attempt,
    amountCents: reg.amountCents,
    currency: reg.currency,
    productName: `Kit and seat: ${c.klass.title}`,
    email: reg.email,
    successUrl: `${page}&checkout=paid`,
    cancelUrl: `${page}&checkout=cancelled`,
    expiresAt,
  });
  await reg.update({ checkoutSessionId: s.id, checkoutUrl: s.url, checkoutAttempt: attempt, holdExpiresAt: expiresAt });
  return s.url;
}

/** Ends a seat hold that was not paid (time ran out, card declined, provider down) and offers the seat on. */
export async function endHold(registrationId: string, status: 'expired' | 'cancelled', reason: string): Promise<boolean> {
  const after: After = [];
  const ended = await sequelize.transaction(async (t) => {
    const first = await Registration.findByPk(registrationId, { transaction: t });
    if (!first) return false;
    const klass = await lockClass(first.classId, t);
    const r = await lockRegistration(registrationId, t);
    if (r.status !== 'awaiting_payment') return false;
    await r.update({ status, endReason: reason, cancelledAt: status === 'cancelled' ? new Date() : null }, { transaction: t });
    await fillFreedSeats(klass, t, after);
    return true;
  });
  runAfter(after);
  return ended;
}

export type PaymentOutcome = 'confirmed' | 'already confirmed' | 'refunded: no seat left' | 'unknown session' | 'ignored';

/**
 * A paid checkout confirms its registration once: a repeated or late event changes nothing. A
 * payment that arrives after its hold ended gets the seat if one is free, else a full refund.
 */
export async function confirmPayment(sessionId: string, paymentIntentId: string | null): Promise<PaymentOutcome> {
  const found = await Registration.findOne({ where: { checkoutSessionId: sessionId }, attributes: ['id', 'classId'] });
  if (!found) return 'unknown session';
  const after: After = [];
  const pending: { refund: { regId: string; pi: string } | null } = { refund: null };
  const outcome = await sequelize.transaction(async (t): Promise<PaymentOutcome> => {
    const klass = await lockClass(found.classId, t);
    const r = await lockRegistration(found.id, t);
    if (r.status === 'confirmed' || r.status === 'refunded') return r.status === 'confirmed' ? 'already confirmed' : 'ignored';
    const paid = { paidAt: new Date(), paymentIntentId, holdExpiresAt: null };
    if (r.status === 'awaiting_payment') {
      await r.update({ ...paid, status: 'confirmed', confirmedAt: new Date(), endReason: null }, { transaction: t });
      after.push(async () => sendConfirmation(await contextOf(klass.id), r));
      return 'confirmed';
    }
    // Paid after the hold ended (out of order): a free seat is theirs, unless people are waiting for it.
    const { taken, waiting } = await seatCounts(klass.id, t);
    if (!closedReason(klass) && taken < klass.seats && waiting === 0) {
      await r.update({ ...paid, status: 'confirmed', confirmedAt: new Date(), endReason: null, cancelledAt: null }, { transaction: t });
      after.push(async () => sendConfirmation(await contextOf(klass.id), r));
      return 'confirmed';
    }
    await r.update({ ...paid }, { transaction: t });
    if (paymentIntentId) pending.refund = { regId: r.id, pi: paymentIntentId };
    return 'refunded: no seat left';
  });
  if (pending.refund) {
    const { regId, pi } = pending.refund;
    const done = await refundPayment(pi, regId);
    const r = await Registration.findByPk(regId);
    if (r) {
      await r.update({
        status: 'refunded',
        refundId: done.id,
        refundedAt: new Date(),
        endReason: 'The payment arrived after the seat was released and the class was full, so it was refunded.',
      });
      after.push(async () =>
        sendCancelled(await contextOf(r.classId), r, {
          refundedCents: done.amount,
          byTeacher: false,
          reason: 'Your payment arrived after the seat hold ended and the class was full.',
        }),
      );
    }
  }
  runAfter(after);
  return outcome;
}

/**
 * Handles one verified event from the payment provider, once: the event id is recorded in the same
 * transaction as its effect, so a second delivery (or a retry after a crash) does nothing twice.
 */
export async function handlePaymentEvent(event: { id: string; type: string; data: { object: unknown } }): Promise<string> {
  const seen = await PaymentEvent.findByPk(event.id);
  if (seen) return `duplicate (${seen.outcome})`;
  const o = event.data.object as Record<string, unknown>;
  let outcome = 'ignored';
  if (event.type === 'checkout.session.completed' && o.payment_status === 'paid') {
    outcome = await confirmPayment(String(o.id), typeof o.payment_intent === 'string' ? o.payment_intent : null);
  } else if (event.type === 'checkout.session.expired') {
    const r = await Registration.findOne({ where: { checkoutSessionId: String(o.id) } });
    outcome = !r ? 'unknown session' : (await endHold(r.id, 'expired', 'The checkout closed before it was paid.')) ? 'hold ended' : 'nothing to change';
  } else if (event.type === 'payment_intent.payment_failed') {
    const meta = (o.metadata ?? {}) as Record<string, string>;
    const r = meta.registrationId ? await Registration.findByPk(meta.registrationId) : null;
    const message = ((o.last_payment_error ?? {}) as Record<string, string>).message ?? 'The payment did not go through.';
    if (!r) outcome = 'unknown session';
    else if (await endHold(r.id, 'cancelled', `${message} The seat was released; you can register again with another card.`)) {
      outcome = 'declined: seat released';
      // Nobody can pay on a session whose seat is gone.
      if (r.checkoutSessionId) await expireCheckout(r.checkoutSessionId);
    } else outcome = 'nothing to change';
  }
  await PaymentEvent.findOrCreate({ where: { id: event.id }, defaults: { id: event.id, type: event.type, outcome } });
  return outcome;
}

/** The attendee's view asks the provider when a payment is still open: a lost webhook (a restart) still confirms. */
export async function reconcile(reg: Registration): Promise<Registration> {
  if (reg.status !== 'awaiting_payment' || !reg.checkoutSessionId) return reg;
  const s = await retrieveCheckout(reg.checkoutSessionId);
  if (s?.status === 'complete' && s.payment_status === 'paid') await confirmPayment(s.id, typeof s.payment_intent === 'string' ? s.payment_intent : null);
  else if (s?.status === 'expired') await endHold(reg.id, 'expired', 'The checkout closed before it was paid.');
  else if (reg.holdExpiresAt && reg.holdExpiresAt.getTime() <= Date.now()) await expireHold(reg.id);
  return (await Registration.findByPk(reg.id))!;
}

/** The queue's hold expiry: closes the checkout first (a paid one confirms instead), then frees the seat. */
export async function expireHold(registrationId: string): Promise<string> {
  const r = await Registration.findByPk(registrationId);
  if (!r || r.status !== 'awaiting_payment') return 'nothing to do';
  if (!r.holdExpiresAt || r.holdExpiresAt.getTime() > Date.now()) return 'not yet';
  if (r.checkoutSessionId) {
    const s = await expireCheckout(r.checkoutSessionId);
    if (s?.status === 'complete' && s.payment_status === 'paid') return confirmPayment(s.id, typeof s.payment_intent === 'string' ? s.payment_intent : null);
  }
  // Closing the checkout may already have ended the hold (through its webhook event).
  const ended = await endHold(r.id, 'expired', 'The seat was held for payment and the time ran out.');
  return ended || (await r.reload()).status === 'expired' ? 'expired' : 'nothing to do';
}

/** Every hold past its time, for the minute-by-minute sweep (crash recovery). */
export async function sweepHolds(): Promise<number> {
  const overdue = await Registration.findAll({
    where: { status: 'awaiting_payment', holdExpiresAt: { [Op.lte]: new Date() } },
    attributes: ['id'],
    limit: 500,
  });
  for (const r of overdue) await expireHold(r.id);
  return overdue.length;
}

/**
 * Ends a registration and gives the seat on. A paid seat is refunded in full when `refund` is
 * set (the provider's refund first: if it fails, nothing changes).
 */
export async function cancelRegistration(registrationId: string, opts: { refund: boolean; byTeacher: boolean }): Promise<Registration> {
  const after: After = [];
  const reg = await sequelize.transaction(async (t) => {
    const first = await Registration.findByPk(registrationId, { transaction: t });
    if (!first) throw new NotFoundError('Registration');
    const klass = await lockClass(first.classId, t);
    const r = await lockRegistration(registrationId, t);
    if (!LIVE_STATUSES.includes(r.status as (typeof LIVE_STATUSES)[number]))
      throw new ConflictError(`This registration is already ${r.status.replace('_', ' ')}`);
    let refunded: number | null = null;
    if (r.status === 'confirmed' && r.paidAt && r.paymentIntentId && opts.refund) {
      const done = await refundPayment(r.paymentIntentId, r.id);
      refunded = done.amount;
      await r.update(
        {
          status: 'refunded',
          refundId: done.id,
          refundedAt: new Date(),
          cancelledAt: new Date(),
          endReason: opts.byTeacher ? 'Cancelled by the teacher, with a refund.' : 'Cancelled by the attendee, with a refund.',
        },
        { transaction: t },
      );
    } else {
      if (r.status === 'awaiting_payment' && r.checkoutSessionId) after.push(() => expireCheckout(r.checkoutSessionId!));
      await r.update(
        { status: 'cancelled', cancelledAt: new Date(), endReason: opts.byTeacher ? 'Cancelled by the teacher.' : 'Cancelled by the attendee.' },
        { transaction: t },
      );
    }
    const wasSeat = first.status === 'confirmed' || first.status === 'awaiting_payment';
    if (wasSeat) await fillFreedSeats(klass, t, after);
    after.push(async () => sendCancelled(await contextOf(klass.id), r, { refundedCents: refunded, byTeacher: opts.byTeacher }));
    return r;
  });
  runAfter(after);
  return reg;
}

/** The attendee cancels through their link: until the class's deadline, with a full refund. */
export async function cancelOwn(reg: Registration, klass: CraftClass): Promise<Registration> {
  if (!attendeeAbilities(reg, klass).withinDeadline)
    throw new ConflictError(
      `The cancellation deadline passed on ${momentIn(klass.cancellationDeadline!, klass.timeZone)}; write to the teacher if you cannot come.`,
      {
        code: 'deadline',
      },
    );
  return cancelRegistration(reg.id, { refund: true, byTeacher: false });
}

/** Ticks an attendee off at the door (or takes the tick back). */
export async function setCheckedIn(reg: Registration, checkedIn: boolean): Promise<Registration> {
  if (reg.status !== 'confirmed') throw new ConflictError('Only people with a confirmed seat can be ticked off at the door');
  return reg.update({ checkedInAt: checkedIn ? new Date() : null });
}

/** A registration by id whose link token matches; 404 otherwise (ids and tokens do not leak). */
export async function registrationByToken(id: string, token: string): Promise<Registration> {
  const r = await Registration.findByPk(id);
  if (!r || !tokenMatches(id, token)) throw NotFoundError.saying('This registration link is not valid');
  return r;
}

/** A class's roster: every registration, in the order they came. */
export function rosterOf(classId: string): Promise<Registration[]> {
  return Registration.findAll({ where: { classId }, order: [['seq', 'ASC']] });
}

/** A registration of a class, or 404. */
export async function findRegistrationOf(classId: string, id: string): Promise<Registration> {
  const r = await Registration.findOne({ where: { id, classId } });
  if (!r) throw new NotFoundError('Registration');
  return r;
}

/** The class context for mail, for routes that have a registration. */
export const registrationContext = (reg: Registration) => contextOf(reg.classId);

/** Cancels a whole class: refunds every paid seat, ends every other registration, mails everyone. */
export async function cancelClass(classId: string): Promise<{ refunded: number; cancelled: number }> {
  const k = await findClass(classId);
  if (k.status === 'cancelled') throw new ConflictError('This class is already cancelled');
  await k.update({ status: 'cancelled', cancelledAt: new Date() });
  const live = await Registration.findAll({ where: { classId, status: { [Op.in]: [...LIVE_STATUSES] } }, order: [['seq', 'ASC']] });
  let refunded = 0;
  let cancelled = 0;
  for (const r of live) {
    const done = await cancelRegistration(r.id, { refund: true, byTeacher: true });
    if (done.status === 'refunded') refunded++;
    else cancelled++;
  }
  return { refunded, cancelled };
}

/** Registrations of the signed-in person (by account or by address), newest class first. */
export function registrationsOf(user: User) {
  return Registration.findAll({
    where: { [Op.or]: [{ userId: user.id }, { email: user.email }] },
    include: [
      {
        model: CraftClass,
        as: 'class',
        include: [
          { model: Tutorial, as: 'tutorial' },
          { model: Studio, as: 'studio' },
        ],
      },
    ],
    order: [['createdAt', 'DESC']],
  });
}

/** Sends every confirmed attendee the teacher's message; returns how many. */
export async function messageAttendees(classId: string, send: (c: ClassMailContext, r: Registration) => Promise<void>): Promise<number> {
  const c = await contextOf(classId);
  const regs = await Registration.findAll({ where: { classId, status: { [Op.in]: ['confirmed', 'awaiting_payment'] } }, order: [['seq', 'ASC']] });
  runAfter(regs.map((r) => () => send(c, r)));
  return regs.length;
}
