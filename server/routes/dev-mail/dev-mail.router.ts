import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import type { Config } from '../../config';
import { connectionOf } from '../../lib/connection';
import { openRoute } from '../../lib/route';
import { mailboxAbilities } from '../../policies';
import { allMail, anyMessage } from '../../services/outbox';
import { mailListPage, mailMessagePage } from '../../services/dev-mailbox-page';

// A bad id is a page that is not here (text, like every other answer of this tool), not a 400.
const messageParams = z.object({ id: z.string() });
const notFound = (res: Response) => void res.status(404).type('text/plain').send('Not found');

/** Whether this request may see every caught message: the mailbox policy's `devMailbox`, for this request's connection. */
export function devMailAllowed(req: Request, config: Pick<Config, 'env' | 'mail'>): boolean {
  return mailboxAbilities(config, connectionOf(req)).devMailbox;
}

/**
 * Every message the local fake SMTP server caught, for whoever develops on this machine (the
 * Outbox in the app shows each person only their own mail). The mailbox policy opens it only
 * while mail goes to the fake, never in production, and only to loopback connections; it asks for
 * no sign-in: it is a tool of the machine, not of a studio role.
 */
export function devMailRouter(config: Pick<Config, 'env' | 'mail'>) {
  const r = Router();
  r.use((req, res, next) => {
    if (!devMailAllowed(req, config)) return notFound(res);
    res.set('Cache-Control', 'no-store');
    next();
  });
  r.get(
    '/',
    openRoute({}, async ({ res }) => {
      res.type('html').send(mailListPage(await allMail()));
    }),
  );
  r.get(
    '/:id',
    openRoute({ params: messageParams }, async ({ params, res }) => {
      const id = z.uuid().safeParse(params.id);
      const m = id.success ? await anyMessage(id.data) : null;
      if (!m) return notFound(res);
      res.type('html').send(mailMessagePage(m));
    }),
  );
  return r;
}
