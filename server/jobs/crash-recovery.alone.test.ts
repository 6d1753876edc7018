import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { afterAll, describe, expect, it } from 'vitest';
import PgBoss from 'pg-boss';
import { Recording } from '@server/models';
import { config } from '@server/config';
import { storage } from '@server/services/storage';
import { ffmpegMake } from '@server/services/media/test-clips';
import { makeStudio } from '../../tests/harness/factories';
import { testApp } from '../../tests/harness/app';
import { expirySeconds } from './index';
import { recordingKey } from './process-recording';

const app = testApp();
const root = path.resolve(import.meta.dirname, '../..');
// A queue of this test's own, so queue workers of other test files never take its job.
const queue = `process-recording-crash-${crypto.randomUUID().slice(0, 8)}`;
const children: ChildProcess[] = [];

/** A real worker process (server/jobs/worker-process.ts), resolved once it says it is ready. */
async function startWorker(): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server/jobs/worker-process.ts')], {
    cwd: root,
    env: { ...process.env, QUEUE_PROCESS_RECORDING: queue, JOB_STALE_SECONDS: '3' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  children.push(child);
  for await (const line of createInterface({ input: child.stdout! })) if (line.includes('"ready":true')) return child;
  throw new Error('the worker process stopped before it was ready');
}

/** The pids of processes whose parent is `pid` and whose command line names ffmpeg (Linux /proc). */
function ffmpegChildrenOf(pid: number): number[] {
  const out: number[] = [];
  for (const d of readdirSync('/proc')) {
    if (!/^\d+$/.test(d)) continue;
    try {
      const stat = readFileSync(`/proc/${d}/stat`, 'utf8');
      const ppid = Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
      if (ppid === pid && readFileSync(`/proc/${d}/cmdline`, 'utf8').includes('ffmpeg')) out.push(Number(d));
    } catch {
      // the process ended while we looked
    }
  }
  return out;
}

/** Gone, or a zombie nobody has reaped yet: either way it runs no more. */
const running = (pid: number) => existsSync(`/proc/${pid}`) && !/\) Z /.test(readFileSync(`/proc/${pid}/stat`, 'utf8'));

async function until<T>(what: string, fn: () => Promise<T | null | undefined | false>, ms: number): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

afterAll(() => {
  for (const c of children) if (c.exitCode === null) c.kill('SIGKILL');
});

describe('a job interrupted by a crash', () => {
  it('expiry fits the work: ten minutes for a small file, more for a large one, never past six hours', () => {
    expect(expirySeconds(5_000_000)).toBe(780);
    expect(expirySeconds(1_000_000_000)).toBe(600 + 10 * 180);
    expect(expirySeconds(200_000_000_000)).toBe(6 * 3600);
  });

  it('killing the worker mid-transcode kills its ffmpeg; the next worker starts the recording again, removes the partial file and finishes', async () => {
    const f = await makeStudio(app);
    const rec = await Recording.create({ tutorialId: f.tutorial.id, originalName: 'long take.mp4', mime: 'video/mp4', sizeBytes: 0, sourceKey: 'pending' });
    rec.sourceKey = recordingKey(rec.id, 'source.mp4');
    const source = storage.stagingPath(rec.sourceKey);
    await mkdir(path.dirname(source), { recursive: true });
    // 40 s of busy 1080p picture: seconds of work for the 720p preview, however fast the machine
    await ffmpegMake(source, [
      '-f',
      'lavfi',
      '-i',
      'testsrc2=size=1920x1080:rate=30:duration=40',
      '-c:v',
      'libx264',
      '-preset',
      'ultrafast',
      '-pix_fmt',
      'yuv420p',
    ]);
    await rec.update({ sourceKey: rec.sourceKey, sizeBytes: readFileSync(source).length });

    const first = await startWorker();
    const boss = new PgBoss({ connectionString: config.databaseUrl, schema: 'pgboss' });
    await boss.start();
    await boss.createQueue(queue);
    await boss.send(queue, { recordingId: rec.id }, { retryLimit: 3, retryDelay: 1, expireInSeconds: expirySeconds(rec.sizeBytes) });
    await boss.stop({ graceful: false, wait: false });

    // mid-transcode: the preview is under way and ffmpeg is a child of the worker
    await until('the preview to start', async () => (await rec.reload()).status === 'processing' && rec.progress >= 5, 180_000);
    const ffmpegPids = await until(
      'ffmpeg to run under the worker',
      async () => {
        const pids = ffmpegChildrenOf(first.pid!);
        return pids.length > 0 && pids;
      },
      30_000,
    );
    first.kill('SIGKILL');
    await until('the worker to die', async () => first.exitCode !== null || first.signalCode !== null, 10_000);

    // its ffmpeg dies with it, and the half-written preview is still on disk
    await until('ffmpeg to die with its parent', async () => ffmpegPids.every((p) => !running(p)), 10_000);
    const dir = path.dirname(source);
    expect(readdirSync(dir).some((n) => n.endsWith('.part'))).toBe(true);
    expect((await rec.reload()).status).toBe('processing');

    // a new worker takes it back (its heartbeat is stale) and finishes it
    const second = await startWorker();
    await until('the recording to be ready', async () => (await rec.reload()).status === 'ready', 240_000);
    expect(rec.progress).toBe(100);
    expect(readdirSync(dir).filter((n) => n.endsWith('.part'))).toEqual([]);
    expect(existsSync(storage.stagingPath(rec.previewKey!))).toBe(true);
    second.kill('SIGTERM');
  }, 600_000);
});
