// A whole installation of the test's own: a throwaway PostgreSQL cluster with the database
// `antinode` migrated and the demo seeded, and a bucket of its own in the test's file store.
import { execFileSync } from 'node:child_process';
import { CreateBucketCommand, DeleteObjectCommand } from '@aws-sdk/client-s3';
import pg from 'pg';
import { listObjects, storeClient } from '@/lib/storage/object-store';
import { startThrowawayCluster, type ThrowawayCluster } from '../../integration/helpers/throwaway-cluster';

export interface Installation {
  cluster: ThrowawayCluster;
  databaseUrl: string;
  bucket: string;
  /** What an app process of this installation is given. */
  env: Record<string, string>;
  /** Runs one query on the installation's database. */
  query<T extends pg.QueryResultRow>(text: string, values?: unknown[]): Promise<T[]>;
}

async function onDatabase<T extends pg.QueryResultRow>(url: string, text: string, values: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query<T>(text, values)).rows;
  } finally {
    await client.end();
  }
}

/** An empty database `antinode` (made anew) in the cluster. */
export async function emptyDatabase(cluster: ThrowawayCluster): Promise<void> {
  await onDatabase(cluster.url(), 'drop database if exists antinode with (force)');
  await onDatabase(cluster.url(), 'create database antinode');
}

/** Deletes every object in the bucket. */
export async function emptyBucket(bucket: string): Promise<void> {
  for (const { key } of await listObjects(bucket)) await storeClient().send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}

export async function seededInstallation(label: string): Promise<Installation> {
  const cluster = await startThrowawayCluster(label);
  await emptyDatabase(cluster);
  const databaseUrl = cluster.url('antinode');
  const bucket = `antinode-${label}-${Date.now().toString(36)}`;
  await storeClient().send(new CreateBucketCommand({ Bucket: bucket }));
  const env = { DATABASE_URL: databaseUrl, S3_BUCKET: bucket };
  for (const step of ['up', 'seed']) {
    execFileSync(process.execPath, ['node_modules/tsx/dist/cli.mjs', 'scripts/migrate.ts', step], { env: { ...process.env, ...env }, stdio: 'pipe' });
  }
  return { cluster, databaseUrl, bucket, env, query: (text, values) => onDatabase(databaseUrl, text, values) };
}

/** Signs in on an instance with the demo's password: the cookies to send. */
export async function signInDemo(baseUrl: string, email: string): Promise<string> {
  const answer = await fetch(`${baseUrl}/api/v1/sessions`, {
    method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: 'antinode-demo' }),
  });
  if (answer.status !== 201) throw new Error(`signing in ${email} answered ${answer.status}: ${await answer.text()}`);
  return answer.headers.getSetCookie().map((value) => value.split(';')[0]).join('; ');
}
