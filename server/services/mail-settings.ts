import { MAIL_KIND_LABELS, MAIL_KINDS, type MailKind, type MailSettingsDto, type UpdateMailSettingsInput } from '@shared/schemas/mail-settings';
import { MailOptOut, sequelize, type Studio, type User } from '../models';

/** Which kinds of mail a person gets from a studio (all of them until they turn some off). */
export async function mailSettings(user: User, studio: Studio): Promise<MailSettingsDto> {
  const off = new Set((await MailOptOut.findAll({ where: { userId: user.id, studioId: studio.id }, attributes: ['kind'] })).map((r) => r.kind));
  return { studioId: studio.id, kinds: MAIL_KINDS.map((kind) => ({ kind, ...MAIL_KIND_LABELS[kind], enabled: !off.has(kind) })) };
}

/** Turns kinds of mail on or off for one person in one studio; kinds not named stay as they were. */
export async function updateMailSettings(user: User, studio: Studio, changes: UpdateMailSettingsInput): Promise<MailSettingsDto> {
  await sequelize.transaction(async (transaction) => {
    for (const [kind, on] of Object.entries(changes) as [MailKind, boolean][]) {
      const where = { userId: user.id, studioId: studio.id, kind };
      if (on) await MailOptOut.destroy({ where, transaction });
      else await MailOptOut.findOrCreate({ where, defaults: where, transaction });
    }
  });
  return mailSettings(user, studio);
}
