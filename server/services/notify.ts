import { Op } from 'sequelize';
import type { MailKind } from '@shared/schemas/mail-settings';
import { MailOptOut, type User } from '../models';
import { config } from '../config';
import { linkMail, sendMail, type Mail } from './mail';

/** An address in the app for a link in an e-mail ("/tutorials/…"). */
export const appLink = (path: string): string => `${config.publicUrl}${path}`;

/** The people among `userIds` who turned this kind of mail off for this studio. */
export async function optedOut(studioId: string, kind: MailKind, userIds: string[]): Promise<Set<string>> {
  if (userIds.length === 0) return new Set();
  const rows = await MailOptOut.findAll({ where: { studioId, kind, userId: { [Op.in]: userIds } }, attributes: ['userId'] });
  return new Set(rows.map((r) => r.userId));
}

export type Notice = {
  studioId: string;
  kind: MailKind;
  /** Everyone it concerns; duplicates and the people in `except` are dropped. */
  to: Iterable<User>;
  /** Usually the person acting: nobody is told of their own doing. */
  except?: Iterable<string>;
  subject: string;
  /** The message's paragraphs for one recipient (their greeting goes first). */
  lines: (user: User) => string[];
  /** Path in the app ("/tutorials/…"), made absolute here. */
  link: string;
  linkLabel: string;
  attachments?: Mail['attachments'];
};

/**
 * E-mails one kind of news to the people it concerns, in plain text and HTML with a link to the
 * place in the app, skipping whoever turned that kind off for the studio. A failed send is logged
 * and never undoes what caused it. Returns the addresses it went to.
 */
export async function notify(n: Notice): Promise<string[]> {
  const except = new Set(n.except ?? []);
  const people = new Map<string, User>();
  for (const u of n.to) if (!except.has(u.id)) people.set(u.id, u);
  const off = await optedOut(n.studioId, n.kind, [...people.keys()]);
  const sent: string[] = [];
  for (const user of people.values()) {
    if (off.has(user.id)) continue;
    try {
      const mail = linkMail({
        to: user.email,
        subject: n.subject,
        lines: [`Hello ${user.name},`, ...n.lines(user)],
        link: appLink(n.link),
        linkLabel: n.linkLabel,
      });
      await sendMail(n.attachments ? { ...mail, attachments: n.attachments } : mail);
      sent.push(user.email);
    } catch (e) {
      console.error(`[${n.kind} mail]`, (e as Error).message);
    }
  }
  return sent;
}
