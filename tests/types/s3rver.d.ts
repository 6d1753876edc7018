// s3rver ships without types; only what the local S3 fake (server/fakes/s3.ts) uses.
declare module 's3rver' {
  import type { AddressInfo } from 'node:net';
  export interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory: string;
    resetOnClose?: boolean;
    configureBuckets?: { name: string; configs?: (string | Buffer)[] }[];
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<AddressInfo>;
    close(): Promise<void>;
  }
}
