/**
 * Who may open which mailbox while mail goes to the local fake SMTP server instead of a real one.
 *
 * - The Outbox (in the app) shows a signed-in person the mail addressed to them, and only that:
 *   a message for someone else answers 404, so a reset link never reaches another account.
 * - The development mailbox (/dev/mail) shows every caught message. It is a tool of the machine,
 *   not of a studio role, so it asks for no sign-in; it answers only this machine.
 */

/** Where a request comes from, as its socket and headers say: plain values the route unpacks. */
export type Connection = {
  /** The socket's own peer address, never a forwarded header. */
  remoteAddress: string | undefined;
  /** Whether any proxy header (X-Forwarded-For, Forwarded, X-Real-IP) came with it. */
  forwarded: boolean;
  /** The Host header, with or without a port. */
  host: string;
};

/** What the rules need of the configuration. */
type MailSetting = { env: string; mail: { fake: boolean } };

const LOOPBACK_HOSTS = new Set(['127.0.0.1', 'localhost', '[::1]', '::1']);
const isLoopbackAddress = (a: string | undefined) => !!a && (a === '::1' || a.startsWith('127.') || a.startsWith('::ffff:127.'));

/**
 * Whether a connection may see every caught message: the fake mailer is on, this is not
 * production, the connection itself comes from this machine, no proxy stands between (a proxy on
 * this machine would make everyone look local), and the Host names the loopback (so a page on
 * another site cannot reach it by DNS rebinding).
 */
function devMailboxOpen(setting: MailSetting, c: Connection): boolean {
  if (!setting.mail.fake || setting.env === 'production') return false;
  if (!isLoopbackAddress(c.remoteAddress) || c.forwarded) return false;
  return LOOPBACK_HOSTS.has(c.host.replace(/:\d+$/, '').toLowerCase());
}

/** Which mailboxes this request may open: the Outbox while mail is fake, /dev/mail from this machine only. */
export function mailboxAbilities(setting: MailSetting, connection?: Connection) {
  return {
    outbox: setting.mail.fake,
    devMailbox: connection ? devMailboxOpen(setting, connection) : false,
  };
}

/** The one address whose mail a person reads in the Outbox: their own (recipients are kept in lower case). */
export function outboxRecipient(user: { email: string }): string {
  return user.email.trim().toLowerCase();
}
