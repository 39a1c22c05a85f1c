// Object storage through the S3 client. `npm start` and `npm test` point it at a local
// S3-compatible fake (s3rver) on loopback; production points it at real storage.
import { GetObjectCommand, ListObjectsV2Command, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';

export function storeSettings() {
  return {
    endpoint: process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4569',
    region: process.env.S3_REGION ?? 'us-east-1',
    bucket: process.env.S3_BUCKET ?? 'antinode-uploads',
    accessKeyId: process.env.S3_ACCESS_KEY_ID ?? 'S3RVER',
    secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
  };
}

const globalForStore = globalThis as unknown as { antinodeS3?: S3Client };

export function storeClient(): S3Client {
  if (!globalForStore.antinodeS3) {
    const { endpoint, region, accessKeyId, secretAccessKey } = storeSettings();
    globalForStore.antinodeS3 = new S3Client({ endpoint, region, forcePathStyle: true, credentials: { accessKeyId, secretAccessKey } });
  }
  return globalForStore.antinodeS3;
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await storeClient().send(new PutObjectCommand({ Bucket: storeSettings().bucket, Key: key, Body: body, ContentType: contentType }));
}

export async function getObject(key: string): Promise<Uint8Array> {
  const answer = await storeClient().send(new GetObjectCommand({ Bucket: storeSettings().bucket, Key: key }));
  if (!answer.Body) throw new Error(`object ${key} has no body`);
  return answer.Body.transformToByteArray();
}

/** Every object's key and size in the bucket (pages through the listing). */
export async function listObjects(bucket = storeSettings().bucket): Promise<{ key: string; bytes: number }[]> {
  const objects: { key: string; bytes: number }[] = [];
  let token: string | undefined;
  do {
    const page = await storeClient().send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }));
    for (const item of page.Contents ?? []) if (item.Key) objects.push({ key: item.Key, bytes: item.Size ?? 0 });
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return objects;
}
