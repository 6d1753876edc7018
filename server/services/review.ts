import { Op } from 'sequelize';
import { STATE_LABELS, type TutorialState } from '@shared/schemas/tutorial';
import { Membership, Studio, User, type Tutorial } from '../models';
import { config } from '../config';
import { linkMail, sendMail } from './mail';

/**
 * E-mails the people a change of review state concerns: the maker when a coordinator acts, the
 * studio's coordinators and owners when a maker sends for review. The person acting gets none.
 * A mail failure is logged, never undoes the change.
 */
export async function notifyStateChange(o: { tutorial: Tutorial; from: TutorialState; by: User; note?: string }): Promise<void> {
  const t = o.tutorial;
  const studio = await Studio.findByPk(t.studioId, { attributes: ['name'] });
  const staff = await Membership.findAll({ where: { studioId: t.studioId, role: { [Op.in]: ['owner', 'coordinator'] } }, include: [{ model: User, as: 'user' }] });
  const author = t.authorId ? await User.findByPk(t.authorId) : null;
  const to = new Map<string, User>();
  if (t.state === 'in_review') for (const m of staff) to.set(m.user!.id, m.user!);
  else if (author) to.set(author.id, author);
  to.delete(o.by.id);
  const lines = [
    `${o.by.name} moved “${t.title}” from ${STATE_LABELS[o.from]} to ${STATE_LABELS[t.state as TutorialState]} in ${studio?.name ?? 'your studio'}.`,
    ...(o.note ? [`Their note: ${o.note}`] : []),
  ];
  for (const user of to.values()) {
    try {
      await sendMail(linkMail({ to: user.email, subject: `“${t.title}” is ${STATE_LABELS[t.state as TutorialState]}`, lines: [`Hello ${user.name},`, ...lines], link: `${config.publicUrl}/tutorials/${t.id}`, linkLabel: 'Open the tutorial' }));
    } catch (e) {
      console.error('[review mail]', (e as Error).message);
    }
  }
}
