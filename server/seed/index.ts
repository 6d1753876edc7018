import type { Role } from '@shared/schemas/roles';
import { Membership, Studio, Tutorial, User, sequelize } from '../models';
import { hashPassword } from '../services/passwords';
import { seedDemoFootage } from './demo-footage';
import { seedDemoCutList } from './demo-cut-list';
import { seedDemoWriteUp } from './demo-write-up';
import { seedDemoReview } from './demo-review';
import { seedDemoClass } from './demo-class';
import { liveContent } from '../services/versions/versions';

export const DEMO_PASSWORD = 'cardwright-demo';
export const DEMO_STUDIO = { name: 'Juniper Lane Paper Co.', slug: 'juniper-lane' };

/** The demo people shown on the sign-in page and in the README. */
export const DEMO_PEOPLE: { email: string; name: string; role: Role }[] = [
  { email: 'owner@example.com', name: 'Odile Marsh', role: 'owner' },
  { email: 'coordinator@example.com', name: 'Cass Whitlow', role: 'coordinator' },
  { email: 'maker@example.com', name: 'Mina Okafor', role: 'maker' },
  { email: 'student@example.com', name: 'Sam Ibarra', role: 'student' },
];

/** True while the demo studio exists, so the sign-in page can list the demo people. */
export async function demoPresent(): Promise<boolean> {
  return Boolean(await Studio.findOne({ where: { slug: DEMO_STUDIO.slug }, attributes: ['id'] }));
}

/**
 * Seeds the demo studio, people and tutorials. Idempotent: each part is looked up by a stable
 * key and created only when missing, so a second start changes nothing.
 */
export async function seedDemo(log: (s: string) => void = () => {}): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const [studio, createdStudio] = await Studio.findOrCreate({ where: { slug: DEMO_STUDIO.slug }, defaults: DEMO_STUDIO });
  const people: Record<Role, User> = {} as Record<Role, User>;
  await sequelize.transaction(async (transaction) => {
    for (const p of DEMO_PEOPLE) {
      const [user] = await User.findOrCreate({ where: { email: p.email }, defaults: { email: p.email, name: p.name, passwordHash }, transaction });
      await Membership.findOrCreate({
        where: { userId: user.id, studioId: studio.id },
        defaults: { userId: user.id, studioId: studio.id, role: p.role },
        transaction,
      });
      people[p.role] = user;
    }
  });
  const tutorials = [
    // The fully built demo is published, so its public page and exports work on first start.
    { slug: 'round-keepsake-box', title: 'Round keepsake box with a wrapped lid', state: 'published' as const, dueDate: '2026-12-15', author: people.maker },
    { slug: 'gatefold-birthday-card', title: 'Gatefold birthday card with a pocket', state: 'in_review' as const, dueDate: '2026-12-20', author: people.maker },
    { slug: 'hexagon-treat-box', title: 'Hexagon treat box', state: 'draft' as const, dueDate: '2027-01-15', author: people.maker },
  ];
  const made: Record<string, Tutorial> = {};
  for (const t of tutorials) {
    [made[t.slug]] = await Tutorial.findOrCreate({
      where: { studioId: studio.id, slug: t.slug },
      defaults: {
        studioId: studio.id,
        authorId: t.author.id,
        title: t.title,
        slug: t.slug,
        state: t.state,
        dueDate: t.dueDate,
        publishedAt: t.state === 'published' ? new Date() : null,
      },
    });
  }
  await seedDemoFootage(made['round-keepsake-box'], people.maker, log);
  await seedDemoCutList(made['round-keepsake-box']);
  await seedDemoWriteUp(made['round-keepsake-box'], people.maker);
  await seedDemoClass(made['round-keepsake-box'], people.coordinator);
  await seedDemoReview(made, people);
  await settlePublishedDemo(made['round-keepsake-box']);
  log(createdStudio ? `Seeded the demo studio "${studio.name}".` : 'Demo data already present.');
}

/**
 * The box is made published and filled in afterwards, and each of those writes starts an update
 * (DESIGN.md T4). On first seeding, what it holds is what readers see: keep that as its published
 * version, with no update pending. A box already seeded keeps whatever people did with it.
 */
async function settlePublishedDemo(box: Tutorial): Promise<void> {
  await box.reload();
  if (box.liveVersionId) return;
  await box.update({ updateState: null });
  await liveContent(box);
}
