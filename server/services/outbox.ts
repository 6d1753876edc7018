import { Op, type WhereOptions } from 'sequelize';
import { OutboxMessage } from '../models';
import { NotFoundError } from '../lib/errors';

/**
 * The mail the local fake caught. The Outbox's functions take the one recipient whose mail may be
 * read (the mailbox policy's `outboxRecipient`); the development mailbox's take none.
 */

const SUMMARY = ['id', 'from', 'to', 'subject', 'createdAt', 'attachments'] as const;

/** Only mail delivered to this address: the fake's envelope recipients, kept in lower case. */
const addressedTo = (recipient: string): WhereOptions<OutboxMessage> => ({ recipients: { [Op.contains]: [recipient] } });

/** The newest 200 messages the local fake caught for one recipient. */
export function mailFor(recipient: string) {
  return OutboxMessage.findAll({ where: addressedTo(recipient), order: [['createdAt', 'DESC']], limit: 200, attributes: [...SUMMARY] });
}

/** One message for its recipient; 404 for anyone else, so ids of other people's mail tell nothing. */
export async function messageFor(recipient: string, id: string) {
  const m = await OutboxMessage.findOne({ where: { id, ...addressedTo(recipient) } });
  if (!m) throw new NotFoundError('Message');
  return m;
}

/** Deletes one of the recipient's messages (404 for anyone else's). */
export async function deleteMessageFor(recipient: string, id: string): Promise<void> {
  const n = await OutboxMessage.destroy({ where: { id, ...addressedTo(recipient) } });
  if (!n) throw new NotFoundError('Message');
}

/** Deletes every message addressed to the recipient, and nobody else's. */
export async function clearMailFor(recipient: string): Promise<number> {
  return OutboxMessage.destroy({ where: addressedTo(recipient) });
}

/** Every caught message, for the loopback-only development mailbox. */
export function allMail() {
  return OutboxMessage.findAll({ order: [['createdAt', 'DESC']], limit: 200, attributes: [...SUMMARY] });
}

/** Any one caught message, for the development mailbox; null when there is none with that id. */
export function anyMessage(id: string) {
  return OutboxMessage.findByPk(id);
}
