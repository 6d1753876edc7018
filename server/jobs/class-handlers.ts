import { Op } from 'sequelize';
import { CraftClass, Registration, Studio, Tutorial } from '../models';
import { sendReminder } from '../services/class-mail';
import { expireHold, sweepHolds } from '../services/registrations';

/**
 * The class reminder a day before: to every confirmed attendee not yet reminded. Each person is
 * claimed (reminder_sent_at set) before their mail goes, and released again if it fails, so a
 * retried job neither skips anyone nor mails anyone twice. A job for a start time the class no
 * longer has (it moved) does nothing; the new time has its own job.
 */
export async function sendClassReminders(data: { classId: string; startsAt: string }): Promise<number> {
  const klass = await CraftClass.findByPk(data.classId, {
    include: [
      { model: Tutorial, as: 'tutorial' },
      { model: Studio, as: 'studio' },
    ],
  });
  if (!klass?.tutorial || !klass.studio || klass.status === 'cancelled') return 0;
  if (klass.startsAt.toISOString() !== data.startsAt) return 0;
  const ctx = { klass, studio: klass.studio, tutorial: klass.tutorial };
  const due = await Registration.findAll({ where: { classId: klass.id, status: 'confirmed', reminderSentAt: { [Op.is]: null } }, order: [['seq', 'ASC']] });
  let sent = 0;
  let failure: unknown = null;
  for (const r of due) {
    const [claimed] = await Registration.update({ reminderSentAt: new Date() }, { where: { id: r.id, reminderSentAt: { [Op.is]: null } } });
    if (!claimed) continue;
    try {
      await sendReminder(ctx, r);
      sent++;
    } catch (e) {
      failure = e;
      await Registration.update({ reminderSentAt: null }, { where: { id: r.id } });
    }
  }
  if (failure) throw failure;
  return sent;
}

export { expireHold, sweepHolds };
