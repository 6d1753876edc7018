import { afterAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { Recording, sequelize } from '@server/models';
import { makeStudio } from '../../tests/harness/factories';
import { testApp } from '../../tests/harness/app';
import { enqueueRecording, stopQueue } from './index';

const app = testApp();
afterAll(async () => {
  await stopQueue();
});

type JobRow = { retry_limit: number; retry_delay: number; retry_backoff: boolean; expire_seconds: number };

describe('the recording queue as the app fills it', () => {
  it('sends each recording with retries and back-off, and an expiry that fits its size (not pg-boss’s default)', async () => {
    const f = await makeStudio(app);
    const sizes = { small: 5_000_000, large: 2_000_000_000 };
    const rows: Record<string, JobRow> = {};
    for (const [what, sizeBytes] of Object.entries(sizes)) {
      const rec = await Recording.create({ tutorialId: f.tutorial.id, originalName: `${what}.mp4`, mime: 'video/mp4', sizeBytes, sourceKey: 'pending' });
      await enqueueRecording(rec.id);
      const [row] = await sequelize.query<JobRow>(
        `SELECT retry_limit, retry_delay, retry_backoff, EXTRACT(EPOCH FROM expire_in)::int AS expire_seconds FROM pgboss.job WHERE data->>'recordingId' = :id`,
        { replacements: { id: rec.id }, type: QueryTypes.SELECT },
      );
      rows[what] = row!;
    }
    for (const row of Object.values(rows)) expect(row).toMatchObject({ retry_limit: 3, retry_delay: 30, retry_backoff: true });
    // Ten minutes plus three a 100 MB (server/jobs/index.ts): 5 MB is 13 min, 2 GB is 70 min.
    expect(rows.small!.expire_seconds).toBe(600 + 180);
    expect(rows.large!.expire_seconds).toBe(600 + 20 * 180);
  });
});
