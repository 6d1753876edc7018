/**
 * The e-mails of a class: confirmation (with the class handout PDF and a calendar invitation),
 * waiting list, a seat offered, reminder, cancellation and refund notices, and the teacher's
 * message to everyone. Each is plain text plus simple HTML, like the other mail.
 */
import { formatMoney } from '@shared/money';
import { palette } from '@shared/palette';
import { momentIn } from '@shared/classes/when';
import { Invitation, Membership, User, type CraftClass, type Registration, type Studio, type Tutorial } from '../models';
import { config } from '../config';
import { escapeHtml } from '../lib/html';
import { mailButton, mailSmallPrint, sendMail, type Mail } from './mail';
import { optedOut } from './notify';
import { newToken } from './tokens';
import { classCautions, classTitle, feeText, registrationPath, whenText } from './classes';
import { classIcs } from './class-calendar';
import { loadPublishBundle } from './publish/bundle';
import { handoutPdf } from './publish/handout';
import { registrationToken } from './registration-token';
import { endSentence } from '@shared/sentence';

export type ClassMailContext = { klass: CraftClass; studio: Studio; tutorial: Tutorial };

const INVITE_TTL_MS = 30 * 24 * 60 * 60_000;

/** The attendee's page, absolute, for links in mail. */
export const registrationUrl = (c: ClassMailContext, reg: Registration) =>
  `${config.publicUrl}${registrationPath(c.studio.slug, c.klass.id, reg.id, registrationToken(reg.id))}`;

/** Paragraphs (and bullet lists, as arrays) into text and HTML, with one link button. */
function compose(to: string, subject: string, blocks: (string | string[])[], link?: { href: string; label: string }, footer?: string): Mail {
  const text = [
    ...blocks.map((b) => (Array.isArray(b) ? b.map((l) => `- ${l}`).join('\n') : b)),
    ...(link ? [`${link.label}: ${link.href}`] : []),
    ...(footer ? [footer] : []),
    '— Cardwright',
  ].join('\n\n');
  const html = `<div style="font-family:Georgia,serif;color:${palette.ink};max-width:560px">
${blocks.map((b) => (Array.isArray(b) ? `<ul>${b.map((l) => `<li>${escapeHtml(l)}</li>`).join('')}</ul>` : `<p>${escapeHtml(b)}</p>`)).join('\n')}
${link ? mailButton(link.href, link.label) : ''}
${footer ? mailSmallPrint(footer) : ''}</div>`;
  return { to, subject, text, html };
}

function classFacts(c: ClassMailContext): string[] {
  const k = c.klass;
  return [
    `When: ${whenText(k)}`,
    `Where: ${k.place}`,
    ...(k.whatToBring.trim() ? [`What to bring: ${k.whatToBring.trim()}`] : []),
    `Kit fee: ${feeText(k)}`,
    ...(k.cancellationDeadline ? [`You can cancel from your registration page until ${momentIn(k.cancellationDeadline, k.timeZone)}.`] : []),
  ];
}

/**
 * How an attendee gets the student role: an account with this address joins the studio as a
 * student at once; otherwise the mail carries an invitation to make one (the usual invitation link).
 */
async function studentAccess(c: ClassMailContext, reg: Registration): Promise<string | null> {
  const user = await User.findOne({ where: { email: reg.email } });
  if (user) {
    if (!reg.userId) await reg.update({ userId: user.id });
    await Membership.findOrCreate({ where: { userId: user.id, studioId: c.studio.id }, defaults: { userId: user.id, studioId: c.studio.id, role: 'student' } });
    return endSentence(`Signed in to Cardwright as ${user.email}, you will find this class, its tutorial and handout under ${c.studio.name}`);
  }
  const inviter = c.klass.createdById ?? c.tutorial.authorId;
  if (!inviter) return null;
  const { token, hash } = newToken();
  await Invitation.create({
    studioId: c.studio.id,
    email: reg.email,
    role: 'student',
    tokenHash: hash,
    invitedById: inviter,
    expiresAt: new Date(Date.now() + INVITE_TTL_MS),
  });
  return `Make a free Cardwright account with this address to keep the tutorial and handout of your classes: ${config.publicUrl}/invite/${token}`;
}

/** The class handout: the tutorial's handout with the class's when and where and its cautions. */
export async function classHandoutPdf(c: ClassMailContext): Promise<Buffer> {
  const bundle = await loadPublishBundle(c.tutorial);
  const cautions = await classCautions(c.klass, c.tutorial);
  return handoutPdf(bundle, { paper: c.klass.paper, safetyNotes: cautions.lines, classNote: `Class: ${whenText(c.klass)} · ${c.klass.place}` });
}

/** The class as an .ics calendar file. */
export function classCalendar(c: ClassMailContext): string {
  return classIcs({
    id: c.klass.id,
    title: classTitle(c.klass, c.tutorial),
    startsAt: c.klass.startsAt,
    durationMinutes: c.klass.durationMinutes,
    place: c.klass.place,
    description: [`A ${c.studio.name} class.`, c.klass.whatToBring.trim() ? `What to bring: ${c.klass.whatToBring.trim()}` : ''].filter(Boolean).join('\n'),
    url: `${config.publicUrl}/c/${c.studio.slug}/${c.klass.id}`,
    organizer: { name: c.studio.name, email: config.mail.from.replace(/^.*<|>.*$/g, '') },
  });
}

/** "You're in": the handout PDF and the calendar invitation attached. */
export async function sendConfirmation(c: ClassMailContext, reg: Registration): Promise<void> {
  const title = classTitle(c.klass, c.tutorial);
  const cautions = await classCautions(c.klass, c.tutorial);
  const access = await studentAccess(c, reg);
  const paid = reg.paidAt
    ? `We received your payment of ${formatMoney(reg.amountCents, reg.currency)}.`
    : c.klass.kitFeeCents === 0
      ? 'This class is free.'
      : '';
  const mail = compose(
    reg.email,
    `You’re in: ${title}`,
    [
      `Hello ${reg.name},`,
      `Your seat in ${title} with ${c.studio.name} is confirmed. ${paid}`.trim(),
      classFacts(c),
      'The class handout (PDF) and a calendar invitation are attached.',
      'Safety in the class:',
      cautions.lines,
      ...(access ? [access] : []),
    ],
    { href: registrationUrl(c, reg), label: 'Your registration' },
  );
  const safeName = (c.tutorial.slug || 'class').replace(/[^a-z0-9-]/gi, '-');
  mail.attachments = [
    { filename: `${safeName}-handout.pdf`, content: await classHandoutPdf(c), contentType: 'application/pdf' },
    { filename: `${safeName}.ics`, content: Buffer.from(classCalendar(c), 'utf8'), contentType: 'text/calendar; charset=utf-8; method=PUBLISH' },
  ];
  await sendMail(mail);
}

export async function sendWaitlisted(c: ClassMailContext, reg: Registration, place: number): Promise<void> {
  const title = classTitle(c.klass, c.tutorial);
  await sendMail(
    compose(
      reg.email,
      `Waiting list: ${title}`,
      [
        `Hello ${reg.name},`,
        `${title} is full, so you are on the waiting list (number ${place}). If a seat frees up, we offer it to the waiting list in order and e-mail you.`,
        classFacts(c),
      ],
      { href: registrationUrl(c, reg), label: 'Your place on the waiting list' },
    ),
  );
}

export async function sendOffer(c: ClassMailContext, reg: Registration): Promise<void> {
  const title = classTitle(c.klass, c.tutorial);
  const until = reg.holdExpiresAt ? momentIn(reg.holdExpiresAt, c.klass.timeZone) : '';
  await sendMail(
    compose(
      reg.email,
      `A seat is free for you: ${title}`,
      [
        `Hello ${reg.name},`,
        `A seat opened up in ${title} and it is yours${until ? ` until ${until}` : ''}. Pay the kit fee of ${feeText(c.klass)} to keep it; after that it goes to the next person waiting.`,
        classFacts(c),
      ],
      { href: registrationUrl(c, reg), label: 'Keep the seat' },
    ),
  );
}

export async function sendReminder(c: ClassMailContext, reg: Registration): Promise<void> {
  const title = classTitle(c.klass, c.tutorial);
  const cautions = await classCautions(c.klass, c.tutorial);
  await sendMail(
    compose(
      reg.email,
      `Reminder: ${title} is tomorrow`,
      [`Hello ${reg.name},`, `A reminder that ${title} is coming up.`, classFacts(c), 'Safety in the class:', cautions.lines],
      { href: registrationUrl(c, reg), label: 'Your registration' },
    ),
  );
}

/** A seat given back: with the refund's amount when there was one. */
export async function sendCancelled(
  c: ClassMailContext,
  reg: Registration,
  opts: { refundedCents: number | null; byTeacher: boolean; reason?: string },
): Promise<void> {
  const title = classTitle(c.klass, c.tutorial);
  const refund =
    opts.refundedCents !== null
      ? `We refunded ${formatMoney(opts.refundedCents, reg.currency)} to the card you paid with; banks usually show it within 5 to 10 days.`
      : reg.paidAt
        ? 'The kit fee was not refunded.'
        : '';
  await sendMail(
    compose(reg.email, `${opts.refundedCents !== null ? 'Refunded' : 'Cancelled'}: ${title}`, [
      `Hello ${reg.name},`,
      `${opts.byTeacher ? `${c.studio.name} cancelled your registration` : 'Your registration was cancelled'} for ${title} (${whenText(c.klass)}).${opts.reason ? ` ${opts.reason}` : ''}`,
      ...(refund ? [refund] : []),
    ]),
  );
}

/** The same link again, for someone who registered twice. */
export async function sendLinkAgain(c: ClassMailContext, reg: Registration): Promise<void> {
  const title = classTitle(c.klass, c.tutorial);
  await sendMail(
    compose(
      reg.email,
      `Your registration: ${title}`,
      [`Hello ${reg.name},`, `You are already registered for ${title}; here is the link to your registration again.`],
      {
        href: registrationUrl(c, reg),
        label: 'Your registration',
      },
    ),
  );
}

/**
 * The teacher's own message to one attendee; skipped for a studio member who turned class
 * messages off in their e-mail settings (mail about their seat and payment always goes).
 */
export async function sendClassMessage(c: ClassMailContext, reg: Registration, subject: string, body: string): Promise<void> {
  if (reg.userId && (await optedOut(c.studio.id, 'classMail', [reg.userId])).size) return;
  const title = classTitle(c.klass, c.tutorial);
  await sendMail(
    compose(
      reg.email,
      subject,
      [`Hello ${reg.name},`, ...body.split(/\n{2,}/)],
      { href: registrationUrl(c, reg), label: 'Your registration' },
      endSentence(`You get this message because you registered for ${title} with ${c.studio.name}`),
    ),
  );
}
