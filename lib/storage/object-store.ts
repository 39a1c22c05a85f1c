// Object storage through the S3 client. `npm start` and `npm test` point it at a local
// S3-compatible fake (s3rver) on loopback; production points it at real storage.
import { GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';

function settings() {
  return {
    endpoint: process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4569',
    region: process.env.S3_REGION ?? 'us-east-1',
    bucket: process.env.S3_BUCKET ?? 'antinode-uploads',
    accessKeyId: process.env.S3_ACCESS_KEY_ID ?? 'S3RVER',
    secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
  };
}

const globalForStore = globalThis as unknown as { antinodeS3?: S3Client };

function client(): S3Client {
  if (!globalForStore.antinodeS3) {
    const { endpoint, region, accessKeyId, secretAccessKey } = settings();
    globalForStore.antinodeS3 = new S3Client({ endpoint, region, forcePathStyle: true, credentials: { accessKeyId, secretAccessKey } });
  }
  return globalForStore.antinodeS3;
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await client().send(new PutObjectCommand({ Bucket: settings().bucket, Key: key, Body: body, ContentType: contentType }));
}

export async function getObject(key: string): Promise<Uint8Array> {
  const answer = await client().send(new GetObjectCommand({ Bucket: settings().bucket, Key: key }));
  if (!answer.Body) throw new Error(`object ${key} has no body`);
  return answer.Body.transformToByteArray();
}
