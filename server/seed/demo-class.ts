import { createClassSchema } from '@shared/schemas/class';
import { CraftClass, type Tutorial, type User } from '../models';
import { createClass } from '../services/classes';

const DAY_MS = 24 * 60 * 60 * 1000;

/** 18:00 in Chicago, `days` from now, written with Chicago's offset on that date. */
function eveningInChicago(days: number): string {
  const day = new Date(Date.now() + days * DAY_MS);
  const date = day.toLocaleDateString('en-CA', { timeZone: 'America/Chicago' });
  const offset = new Intl.DateTimeFormat('en', { timeZone: 'America/Chicago', timeZoneName: 'longOffset' })
    .formatToParts(day)
    .find((p) => p.type === 'timeZoneName')!
    .value.replace('GMT', '');
  return `${date}T18:00:00${offset || '+00:00'}`;
}

/**
 * A class of the published demo tutorial, three weeks after the first seeding, so the Classes page, the kit
 * planner and the public registration page have something to show. Seeded once: a later start leaves it be.
 */
export async function seedDemoClass(tutorial: Tutorial, coordinator: User): Promise<void> {
  if (await CraftClass.findOne({ where: { tutorialId: tutorial.id }, attributes: ['id'] })) return;
  const input = createClassSchema.parse({
    title: 'Round keepsake box: evening class',
    startsAt: eveningInChicago(21),
    timeZone: 'America/Chicago',
    durationMinutes: 120,
    place: 'Juniper Lane Paper Co., back room (demo address)',
    seats: 8,
    spares: 1,
    kitFeeCents: 1800,
    currency: 'USD',
    whatToBring: 'A craft knife or trimmer, a bone folder and reading glasses if you use them. Kits hold the paper and glue.',
  });
  await createClass(tutorial, coordinator, input);
}
