/**
 * Footage through the HTTP API, in one run against a fresh bench database:
 *  1. uploading a 1 GiB file over loopback: throughput and the server's memory growth
 *     (target: grows by less than 100 MB, since uploads stream to disk);
 *  2. a still at 3:37 of a 5-minute 1080p H.264 file through POST /api/recordings/:id/stills,
 *     beside the same grab by the ffmpeg command line (target: within 1.3x).
 *
 *   npx tsx bench/footage-api.bench.ts [--runs 7]
 */
import { execFile } from 'node:child_process';
import { existsSync, openSync, closeSync, writeSync, ftruncateSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { FFMPEG_PATH } from '@server/services/media/ffmpeg';
import { median } from './lib';
import { BenchClient, memoryOf, startBenchServer } from './support/client';
import { ensureStillSource, STILL_SOURCE } from './still.bench';

const run = promisify(execFile);
const OUT = fileURLToPath(new URL('./out/', import.meta.url));
const GIB = 1024 ** 3;

/** A 1 GiB file that passes the video signature check: a real mp4 header, then zeros (sparse, so quick to make). */
function makeBigUpload(header: Buffer): string {
  const file = path.join(OUT, 'upload-1gib.mp4');
  if (existsSync(file)) return file;
  const fd = openSync(file, 'w');
  writeSync(fd, header.subarray(0, 4096));
  ftruncateSync(fd, GIB);
  closeSync(fd);
  return file;
}

export async function benchFootageApi(runs = 7) {
  await ensureStillSource();
  // The workers run in the server, as `npm start` runs them: a still is made in the request.
  const server = await startBenchServer({ workers: true });
  const base = `http://127.0.0.1:${server.port}`;
  const c = new BenchClient(base);
  await c.signIn(server.email, server.password);
  try {
    // 1. upload
    const big = makeBigUpload(readFileSync(STILL_SOURCE).subarray(0, 4096));
    const before = memoryOf(server.pid);
    let peak = before.rss;
    const timer = setInterval(() => (peak = Math.max(peak, memoryOf(server.pid).rss)), 50);
    const t0 = performance.now();
    const up = await c.upload(`/api/tutorials/${server.tutorialId}/recordings`, big, 'big.mp4');
    const seconds = (performance.now() - t0) / 1000;
    clearInterval(timer);
    if (up.status !== 201) throw new Error(`upload answered ${up.status}: ${up.body}`);
    // Not a real video past its first bytes: removed, so its processing does not run beside the still timing.
    await c.request('DELETE', `/api/recordings/${JSON.parse(up.body).id as string}`);
    const growthMb = (peak - before.rss) / 1024 ** 2;
    console.log('upload of 1 GiB over loopback:');
    console.log(`  ${seconds.toFixed(1)} s, ${(1024 / seconds).toFixed(0)} MiB/s`);
    console.log(
      `  server memory ${(before.rss / 1024 ** 2).toFixed(0)} MB before, peak ${(peak / 1024 ** 2).toFixed(0)} MB during: grew ${growthMb.toFixed(0)} MB, target < 100 MB: ${growthMb < 100 ? 'PASS' : 'FAIL'}`,
    );

    // 2. still through the API
    const rec = await c.upload(`/api/tutorials/${server.tutorialId}/recordings`, STILL_SOURCE, 'five-minutes.mp4');
    const recId = JSON.parse(rec.body).id as string;
    // The still is timed once the worker has read the video and made its preview, so nothing else runs beside it.
    const readyBy = Date.now() + 15 * 60_000;
    for (;;) {
      const { json } = await c.request('GET', `/api/recordings/${recId}`);
      if (json.status === 'ready') break;
      if (json.status === 'failed' || Date.now() > readyBy) throw new Error(`the recording did not become ready: ${JSON.stringify(json.status)}`);
      await new Promise((r) => setTimeout(r, 1000));
    }
    const viaCli = path.join(OUT, 'still-cli-api.jpg');
    const cli = () => run(FFMPEG_PATH, ['-y', '-ss', '217', '-i', STILL_SOURCE, '-frames:v', '1', '-q:v', '2', viaCli]);
    const api = async () => {
      const r = await c.request('POST', `/api/recordings/${recId}/stills`, { atMs: 217_000, mode: 'exact' });
      if (r.status !== 201) throw new Error(`still answered ${r.status}`);
    };
    await api();
    await cli();
    const a: number[] = [];
    const b: number[] = [];
    for (let i = 0; i < runs; i++) {
      let t = performance.now();
      await api();
      a.push(performance.now() - t);
      t = performance.now();
      await cli();
      b.push(performance.now() - t);
    }
    const ratio = median(a) / median(b);
    console.log(`still at 3:37 of a 5-minute 1920x1080 H.264 file, median of ${runs}:`);
    console.log(`  ffmpeg command line          ${median(b).toFixed(0).padStart(6)} ms`);
    console.log(`  POST /api/recordings/:id/stills ${median(a).toFixed(0).padStart(6)} ms`);
    console.log(`  ratio ${ratio.toFixed(2)}x, target <= 1.3x: ${ratio <= 1.3 ? 'PASS' : 'FAIL'}`);
    return { growthMb, mibPerSecond: 1024 / seconds, ratio };
  } finally {
    server.child.kill('SIGTERM');
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const i = process.argv.indexOf('--runs');
  benchFootageApi(i > 0 ? Number(process.argv[i + 1]) : 7).then(
    (r) => {
      if (!(r.growthMb < 100 && r.ratio <= 1.3)) process.exitCode = 1;
    },
    (e) => {
      console.error(e);
      process.exitCode = 1;
    },
  );
}
