// The S3 fake: s3rver, storing objects under .data on loopback, with the uploads bucket.
import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';
import { S3_BUCKET, type FakeProfile } from './profiles';

export async function startStorageFake(profile: FakeProfile): Promise<() => Promise<void>> {
  mkdirSync(profile.s3Directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: profile.s3Port,
    silent: true,
    directory: profile.s3Directory,
    configureBuckets: [{ name: S3_BUCKET, configs: [] }],
  });
  await server.run();
  return () => server.close();
}
