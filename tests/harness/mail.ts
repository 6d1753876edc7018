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
