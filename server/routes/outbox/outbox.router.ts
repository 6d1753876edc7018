import { Router } from 'express';
import type { OutboxDto, OutboxEntryDto } from '@shared/schemas/outbox';
import { idParams } from '@shared/schemas/studio';
import { NotFoundError } from '../../lib/errors';
import { route } from '../../lib/route';
import type { Config } from '../../config';
import { mailboxAbilities, outboxRecipient } from '../../policies';
import { clearMailFor, deleteMessageFor, mailFor, messageFor } from '../../services/outbox';
import { presentOutboxMessage, presentOutboxSummary } from '../../presenters/outbox.presenter';

/**
 * The signed-in person's own mail as the local fake caught it: the mailbox policy says when the
 * Outbox exists (while mail goes to the fake) and whose mail it shows (`outboxRecipient`: only
 * messages delivered to the person's address, whatever their role; another person's answers 404).
 * Every caught message is in the loopback-only /dev/mail instead.
 */
export function outboxRouter(config: Pick<Config, 'env' | 'mail'>) {
  const r = Router();
  r.use((_req, _res, next) => next(mailboxAbilities(config).outbox ? undefined : new NotFoundError('The outbox')));

  r.get(
    '/',
    route({}, async ({ user, res }) => {
      const messages = await mailFor(outboxRecipient(user));
      res.json({ messages: messages.map(presentOutboxSummary) } satisfies OutboxDto);
    }),
  );

  r.get(
    '/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      const m = await messageFor(outboxRecipient(user), params.id);
      res.json({ message: presentOutboxMessage(m) } satisfies OutboxEntryDto);
    }),
  );

  r.delete(
    '/:id',
    route({ params: idParams }, async ({ params, user, res }) => {
      await deleteMessageFor(outboxRecipient(user), params.id);
      res.status(204).end();
    }),
  );

  r.delete(
    '/',
    route({}, async ({ user, res }) => {
      await clearMailFor(outboxRecipient(user));
      res.status(204).end();
    }),
  );
  return r;
}
