import os from 'node:os';
import path from 'node:path';
import { FAKE_S3_KEYS, startFakeS3 } from '../../server/fakes/s3';

/** The bucket the tests use in the local S3 fake. */
export const TEST_BUCKET = 'cardwright-test';

/** Starts the local S3 fake where `npm test` said (S3_FAKE_PORT), or nowhere when the run did not ask for one. */
export async function startS3ForTests() {
  if (!process.env.S3_FAKE_PORT) return null;
  return startFakeS3({
    port: Number(process.env.S3_FAKE_PORT),
    directory: process.env.S3_FAKE_DIR ?? path.join(os.tmpdir(), 'cardwright-test-s3'),
    bucket: TEST_BUCKET,
  });
}

/** The environment that points an app process at the fake (STORAGE=s3). */
export function fakeS3Env(): Record<string, string> {
  if (!process.env.S3_FAKE_PORT) throw new Error('S3_FAKE_PORT is not set: run the S3 tests through `npm test`, which starts the local fake');
  return {
    STORAGE: 's3',
    S3_ENDPOINT: `http://127.0.0.1:${process.env.S3_FAKE_PORT}`,
    S3_BUCKET: TEST_BUCKET,
    S3_REGION: 'us-east-1',
    S3_ACCESS_KEY_ID: FAKE_S3_KEYS.accessKeyId,
    S3_SECRET_ACCESS_KEY: FAKE_S3_KEYS.secretAccessKey,
  };
}

/** The S3 settings of the fake, in the shape of config.storage.s3 (without loading the config, which reads the environment once). */
export function fakeS3Settings() {
  const env = fakeS3Env();
  return { endpoint: env.S3_ENDPOINT, bucket: TEST_BUCKET, region: 'us-east-1', ...FAKE_S3_KEYS, forcePathStyle: true };
}
