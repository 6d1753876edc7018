/**
 * A still from object storage against the same still from disk, in one run: one 1080p frame at
 * 3:37 of the 5-minute H.264 source (bench/still.bench.ts makes and caches it), grabbed by the
 * media service from the file on disk and from the local S3 fake through a presigned URL
 * (ffmpeg seeks on the input and reads by HTTP ranges). A counting loopback relay in front of
 * the fake shows how many bytes one still costs, against the whole file. Targets (issue 16):
 * the bucket within 1.5x of disk, the same frame, and far less than the file read per still.
 *
 *   npx tsx bench/still-bucket.bench.ts [--runs 9]
 */
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdtemp, readFile, rm, stat } from 'node:fs/promises';
import net from 'node:net';
import os from 'node:os';
import { join } from 'node:path';
import { FAKE_S3_KEYS, startFakeS3 } from '@server/fakes/s3';
import { grabFrame } from '@server/services/media/frames';
import { s3Storage } from '@server/services/storage-s3';
import { numberArg } from './lib';
import { ensureStillSource, STILL_SOURCE } from './still.bench';

const AT_MS = 217_000; // 3:37
const TARGET_RATIO = 1.5;
const runs = numberArg('runs', 9);

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2;
};
const md5 = async (file: string) =>
  createHash('md5')
    .update(await readFile(file))
    .digest('hex');

/** A TCP relay on loopback that counts the bytes the store sends back. */
async function countingRelay(targetPort: number) {
  const counter = { bytes: 0 };
  const server = net.createServer((client) => {
    const upstream = net.connect(targetPort, '127.0.0.1');
    upstream.on('data', (d: Buffer) => (counter.bytes += d.length));
    client.pipe(upstream).pipe(client);
    const end = () => {
      client.destroy();
      upstream.destroy();
    };
    client.on('error', end).on('close', end);
    upstream.on('error', end).on('close', end);
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  return { port: (server.address() as net.AddressInfo).port, counter, close: () => new Promise((r) => server.close(r)) };
}

async function main(): Promise<boolean> {
  await ensureStillSource();
  const work = await mkdtemp(join(os.tmpdir(), 'cardwright-bench-bucket-'));
  const fake = await startFakeS3({ port: 0, directory: join(work, 's3'), bucket: 'cardwright-bench' });
  const relay = await countingRelay(fake.port);
  try {
    const store = s3Storage(
      { endpoint: `http://127.0.0.1:${relay.port}`, bucket: 'cardwright-bench', region: 'us-east-1', ...FAKE_S3_KEYS, forcePathStyle: true },
      work,
    );
    const key = 'recordings/bench/source.mp4';
    const size = (await stat(STILL_SOURCE)).size;
    const upStarted = performance.now();
    await store.putStream(key, createReadStream(STILL_SOURCE), 'video/mp4');
    console.log(
      `uploaded the ${(size / 1e6).toFixed(1)} MB source to the local S3 fake in ${((performance.now() - upStarted) / 1000).toFixed(1)} s (multipart)`,
    );

    const fromDisk = join(work, 'disk.jpg');
    const fromBucket = join(work, 'bucket.jpg');
    const disk = () => grabFrame(STILL_SOURCE, AT_MS, fromDisk);
    // a fresh presigned URL per still, as the service makes one per pull
    const bucket = async () => grabFrame(await store.inputFor(key), AT_MS, fromBucket);
    const time = async (fn: () => Promise<unknown>) => {
      const t = performance.now();
      await fn();
      return performance.now() - t;
    };
    // warm-up: the page cache for the file (the fake reads the same kind of disk) and fluent-ffmpeg's checks
    await disk();
    await bucket();
    const d: number[] = [];
    const b: number[] = [];
    const bytes: number[] = [];
    // alternate so that both see the same machine load
    for (let i = 0; i < runs; i++) {
      d.push(await time(disk));
      relay.counter.bytes = 0;
      b.push(await time(bucket));
      bytes.push(relay.counter.bytes);
    }
    const diskMs = median(d);
    const bucketMs = median(b);
    const ratio = bucketMs / diskMs;
    const sameFrame = (await md5(fromDisk)) === (await md5(fromBucket));
    const readShare = median(bytes) / size;
    console.log(`still at 3:37 of the 5-minute 1080p source, median of ${runs}:`);
    console.log(`  from disk (baseline)            ${diskMs.toFixed(0).padStart(6)} ms  (min ${Math.min(...d).toFixed(0)}, max ${Math.max(...d).toFixed(0)})`);
    console.log(
      `  from the bucket (presigned URL) ${bucketMs.toFixed(0).padStart(6)} ms  (min ${Math.min(...b).toFixed(0)}, max ${Math.max(...b).toFixed(0)})`,
    );
    console.log(
      `  bytes from the bucket per still ${(median(bytes) / 1e6).toFixed(2)} MB of ${(size / 1e6).toFixed(1)} MB (${(readShare * 100).toFixed(1)} %): no full download`,
    );
    console.log(`  same frame from both: ${sameFrame ? 'yes' : 'NO'}`);
    const pass = ratio <= TARGET_RATIO && sameFrame && readShare < 0.25;
    console.log(`  ratio ${ratio.toFixed(2)}x, target <= ${TARGET_RATIO}x: ${pass ? 'PASS' : 'FAIL'}`);
    return pass;
  } finally {
    await relay.close();
    await fake.close();
    await rm(work, { recursive: true, force: true });
  }
}

void main().then((ok) => {
  if (!ok) process.exitCode = 1;
});
