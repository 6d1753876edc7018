import { Op } from 'sequelize';
import type { z } from 'zod';
import type { schedulePublishSchema } from '@shared/schemas/board';
import { Studio, Tutorial, User } from '../models';
import { ConflictError, fieldError, UnavailableError } from '../lib/errors';
import { authorize, tutorialAbilities, type TutorialAbilities } from '../policies';
import { queuePublish, withdrawPublish, type PublishJob } from '../jobs/publish-jobs';
import { actorIn } from './access';
import { appLink, notify } from './notify';
import { moveTutorial } from './review';

/** A publish time must be at least this far ahead, so the job is queued before it is due. */
const LEAD_MS = 60_000;
/** And at most about a year ahead: a date further out is more likely a typo than a plan. */
const HORIZON_MS = 366 * 86_400_000;

/** "Wednesday, 20 January 2027, 09:00 (Europe/Berlin)": a time as the person who picked it reads it. */
export function formatPublishTime(at: Date, timeZone: string): string {
  const when = new Intl.DateTimeFormat('en-GB', {
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
    timeZone,
  }).format(at);
  return `${when.replace(' at ', ', ')} (${timeZone})`;
}

const unscheduled = { publishAt: null, publishTimeZone: null, publishScheduledById: null, publishJobId: null };

/**
 * Sets (or moves) the time an approved tutorial publishes itself: 409 unless it is approved,
 * 403 without the role, 400 for a time that is past or more than a year out. The job is queued
 * before the time is saved, and a queue that does not answer is a 503: nothing is saved then.
 */
export async function schedulePublish(o: {
  tutorial: Tutorial;
  abilities: TutorialAbilities;
  by: User;
  input: z.output<typeof schedulePublishSchema>;
}): Promise<Tutorial> {
  const { tutorial, input } = o;
  if (tutorial.state !== 'approved') throw new ConflictError('Only an approved tutorial can be scheduled to publish');
  authorize(o.abilities, 'schedulePublish', 'Only coordinators and owners schedule publishing');
  const at = new Date(input.at);
  const now = Date.now();
  if (at.getTime() < now + LEAD_MS) throw fieldError('at', 'Pick a time at least a minute from now', 'Pick a time in the future');
  if (at.getTime() > now + HORIZON_MS) throw fieldError('at', 'Pick a time within a year from now', 'Pick a time within a year');
  let jobId: string;
  try {
    jobId = await queuePublish(tutorial.id, at);
  } catch (e) {
    console.error('[schedule]', (e as Error).message);
    throw new UnavailableError('The publishing queue is not answering; nothing was scheduled. Try again in a minute.');
  }
  const old = tutorial.publishJobId;
  await tutorial.update({ publishAt: at, publishTimeZone: input.timeZone, publishScheduledById: o.by.id, publishJobId: jobId });
  if (old && old !== jobId) await withdrawPublish(old);
  return tutorial;
}

/** Cancels a scheduled publish (nothing scheduled: nothing to do). 403 without the role. */
export async function cancelSchedule(o: { tutorial: Tutorial; abilities: TutorialAbilities }): Promise<Tutorial> {
  const { tutorial } = o;
  if (!tutorial.publishAt) return tutorial;
  authorize(o.abilities, 'schedulePublish', 'Only coordinators and owners schedule publishing');
  const old = tutorial.publishJobId;
  await tutorial.update(unscheduled);
  if (old) await withdrawPublish(old);
  return tutorial;
}

/**
 * The queue job at the publish time. It publishes only if the tutorial is still approved and
 * still scheduled for this very time (a cancel, a new time, a send-back or a publish by hand
 * since then leave nothing to do), as the person who scheduled it and only if they still may.
 * The row is claimed first, so two workers never publish twice; a failure gives the claim back
 * and throws, and the queue tries again. The maker and the scheduler hear when it is out.
 */
export async function runScheduledPublish(job: PublishJob): Promise<'published' | 'skipped' | 'refused'> {
  const at = new Date(job.at);
  const t = await Tutorial.findByPk(job.tutorialId);
  if (!t || t.state !== 'approved' || t.publishAt?.getTime() !== at.getTime()) return 'skipped';
  const schedule = { publishAt: t.publishAt, publishTimeZone: t.publishTimeZone, publishScheduledById: t.publishScheduledById, publishJobId: t.publishJobId };
  const [claimed] = await Tutorial.update(unscheduled, { where: { id: t.id, state: 'approved', publishAt: { [Op.eq]: at } } });
  if (!claimed) return 'skipped';
  await t.reload();
  const scheduler = schedule.publishScheduledById ? await User.findByPk(schedule.publishScheduledById) : null;
  const abilities = scheduler ? tutorialAbilities(await actorIn(scheduler, t.studioId), t) : null;
  const tz = schedule.publishTimeZone ?? 'UTC';
  if (!scheduler || !abilities?.publish) {
    await mailOutcome(t, scheduler, { subject: `“${t.title}” did not go out as scheduled`, line: notAllowedLine(t, at, tz) });
    return 'refused';
  }
  try {
    await moveTutorial({
      tutorial: t,
      abilities,
      action: 'publish',
      by: scheduler,
      note: `Published as scheduled for ${formatPublishTime(at, tz)}`,
      notify: false,
      // Whoever scheduled it saw the Publish section's warnings then; a queue job has nobody to ask.
      confirmWarnings: true,
    });
  } catch (e) {
    await Tutorial.update(schedule, { where: { id: t.id, state: 'approved', publishAt: { [Op.is]: null } } }).catch(() => {});
    throw e;
  }
  await mailOutcome(t, scheduler, {
    subject: `“${t.title}” is published`,
    line: `“${t.title}” went out as scheduled for ${formatPublishTime(at, tz)}. Readers can see its page now.`,
  });
  return 'published';
}

const notAllowedLine = (t: Tutorial, at: Date, tz: string) =>
  `“${t.title}” was scheduled to publish at ${formatPublishTime(at, tz)}, but the person who scheduled it may no longer publish in this studio, so it stays approved. A coordinator can publish it or schedule it again.`;

/** The scheduled publish's e-mail to the tutorial's maker and the person who scheduled it (kind "scheduledPublish"). */
async function mailOutcome(t: Tutorial, scheduler: User | null, m: { subject: string; line: string }): Promise<void> {
  const studio = await Studio.findByPk(t.studioId, { attributes: ['id', 'name', 'slug'] });
  const maker = t.authorId ? await User.findByPk(t.authorId) : null;
  const published = t.state === 'published' && studio;
  await notify({
    studioId: t.studioId,
    kind: 'scheduledPublish',
    to: [maker, scheduler].filter((u): u is User => u !== null),
    subject: m.subject,
    lines: () => [m.line, ...(published ? [`The public page: ${appLink(`/t/${studio.slug}/${t.slug}`)}`] : [])],
    link: `/tutorials/${t.id}/publish`,
    linkLabel: 'Open the Publish section',
  });
}
