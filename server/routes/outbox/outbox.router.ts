import { Router } from 'express';
import { Membership, OutboxMessage } from '../../models';
import { currentUser, requireUser } from '../../middlewares/authenticate';
import { forbidden, notFound } from '../../lib/http-error';
import { validate } from '../../middlewares/validate';
import { idParams } from '@shared/schemas/studio';

/**
 * The local fake mailbox. It exists only while mail goes to the fake, and only studio owners
 * may read it: it is a development aid for following reset and invitation links.
 */
export function outboxRouter(enabled: boolean) {
  const r = Router();
  r.use((_req, _res, next) => next(enabled ? undefined : notFound('The outbox')));
  r.use(requireUser, async (req, _res, next) => {
    const owner = await Membership.findOne({ where: { userId: currentUser(req).id, role: 'owner' }, attributes: ['id'] });
    next(owner ? undefined : forbidden('Only studio owners can read the outbox'));
  });

  r.get('/', async (_req, res) => {
    const messages = await OutboxMessage.findAll({ order: [['createdAt', 'DESC']], limit: 200, attributes: ['id', 'from', 'to', 'subject', 'createdAt', 'attachments'] });
    res.json({ messages });
  });

  r.get('/:id', validate({ params: idParams }), async (req, res) => {
    const m = await OutboxMessage.findByPk(req.params.id as string);
    if (!m) throw notFound('Message');
    res.json({ message: m });
  });

  r.delete('/', async (_req, res) => {
    await OutboxMessage.destroy({ where: {} });
    res.status(204).end();
  });
  return r;
}
