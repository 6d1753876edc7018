import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

/** The keys the local fake accepts (s3rver's own; it checks every request's signature against them). */
export const FAKE_S3_KEYS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } as const;

/**
 * A local S3-compatible store on loopback (s3rver: buckets as folders, SigV4 signatures and
 * presigned URLs checked, multipart uploads, single byte ranges), for development and tests with
 * STORAGE=s3. `directory` holds the bucket's files; the bucket is made if missing.
 */
export async function startFakeS3(opts: { port: number; directory: string; bucket: string; host?: string }) {
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    address: opts.host ?? '127.0.0.1',
    port: opts.port,
    silent: true,
    directory: opts.directory,
    configureBuckets: [{ name: opts.bucket }],
  });
  const address = await server.run();
  return {
    port: address.port,
    endpoint: `http://${opts.host ?? '127.0.0.1'}:${address.port}`,
    close: () => server.close(),
  };
}
