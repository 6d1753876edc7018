import { Op } from 'sequelize';
import { simpleParser, type ParsedMail } from 'mailparser';
import { OutboxMessage } from '@server/models';

/**
 * The newest message the fake SMTP server kept for an address, waiting up to five seconds for
 * it (mail is sent after the API answers).
 */
export async function lastMailTo(address: string) {
  for (let i = 0; i < 50; i++) {
    const m = await OutboxMessage.findOne({ where: { to: address }, order: [['createdAt', 'DESC']] });
    if (m) return m;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${address}`);
}

/** The newest message to an address whose subject matches, waiting up to `seconds` for it. */
export async function mailTo(address: string, subject: RegExp, seconds = 10) {
  for (let i = 0; i < seconds * 10; i++) {
    const list = await OutboxMessage.findAll({ where: { to: address }, order: [['createdAt', 'DESC']] });
    const m = list.find((x) => subject.test(x.subject));
    if (m) return m;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${address} with a subject like ${subject}`);
}

/** Every message to an address, oldest first (no waiting). */
export function mailsTo(address: string) {
  return OutboxMessage.findAll({ where: { to: { [Op.eq]: address } }, order: [['createdAt', 'ASC']] });
}

/** The message as sent, attachments and all, parsed back. */
export async function parsed(m: OutboxMessage): Promise<ParsedMail> {
  if (!m.raw) throw new Error('the fake SMTP server kept no raw copy of this message');
  return simpleParser(m.raw);
}
