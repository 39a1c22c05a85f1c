// The parts of s3rver (the local S3 fake) that scripts/fakes/storage.ts uses.
declare module 's3rver' {
  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    directory?: string;
    configureBuckets?: { name: string; configs: string[] }[];
  }
  export default class S3rver {
    constructor(options: S3rverOptions);
    run(): Promise<{ address: string; port: number }>;
    close(): Promise<void>;
  }
}
