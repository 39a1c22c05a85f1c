// Background jobs on the database the product already has (pg-boss: a job table in its own
// schema, `pgboss`, locked with SKIP LOCKED, so any number of app instances and job workers share
// it). The web process only sends jobs; the job worker (scripts/jobs-worker.ts) works them.
import { createHash } from 'node:crypto';
import PgBoss from 'pg-boss';
import type { Transaction } from 'sequelize';
import { JOB_QUEUES, type JobData, type JobName } from './names';

/** How often the job worker looks for jobs whose worker died, s. */
const MAINTENANCE_S = 15;

const holder = globalThis as typeof globalThis & { antinodeJobs?: Promise<PgBoss> };

/** Connection string of the app's database (the job tables live beside the app's own). */
function databaseUrl(): string {
  return process.env.DATABASE_URL ?? 'postgres://antinode@127.0.0.1:54329/antinode';
}

async function startQueue(role: 'sender' | 'worker'): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: databaseUrl(),
    schema: 'pgboss',
    application_name: `antinode-jobs-${role}`,
    max: role === 'worker' ? 4 : 2,
    // Only the job worker keeps the queue tidy: every 15 s it hands a job whose worker died (past
    // its expireInSeconds) back for a retry, and archives finished ones.
    supervise: role === 'worker',
    maintenanceIntervalSeconds: MAINTENANCE_S,
    schedule: false,
  });
  boss.on('error', (error) => console.error(`[jobs] ${error.message}`));
  await boss.start();
  for (const [name, options] of Object.entries(JOB_QUEUES)) {
    if (!(await boss.getQueue(name))) await boss.createQueue(name, { name, ...options });
    // A worker brings the stored retry and expiry settings up to date with names.ts (a new release's).
    else if (role === 'worker') await boss.updateQueue(name, { name, ...options });
  }
  return boss;
}

/** The queue, started once per process. */
export function jobQueue(role: 'sender' | 'worker' = 'sender'): Promise<PgBoss> {
  holder.antinodeJobs ??= startQueue(role).catch((error: unknown) => {
    holder.antinodeJobs = undefined;
    throw error;
  });
  return holder.antinodeJobs;
}

export interface SendJobOptions {
  /** On a stately queue, a second job with the same key is not added while one waits. */
  key?: string;
  /** Start no sooner than this many seconds from now. */
  delayS?: number;
  /** The job's own id: a second job with the same id is not added (a retried step sends its follow-up once). */
  id?: string;
  /** Added with this transaction: the job exists exactly when what the transaction wrote does. */
  transaction?: Transaction;
}

// pg-boss runs its statements on the transaction's own connection (a node-postgres client).
function inTransaction(transaction: Transaction): PgBoss.Db {
  const client = (transaction as unknown as { connection: { query(text: string, values: unknown[]): Promise<{ rows: unknown[] }> } }).connection;
  return { executeSql: (text, values) => client.query(text, values) };
}

/** Sends a job; returns its id, or null when one with the same key or id is already there. */
export async function sendJob<N extends JobName>(name: N, data: JobData[N], options: SendJobOptions = {}): Promise<string | null> {
  const boss = await jobQueue();
  const { key, delayS = 0, id, transaction } = options;
  return boss.send(name, data, {
    ...(key ? { singletonKey: key } : {}),
    ...(delayS > 0 ? { startAfter: delayS } : {}),
    ...(id ? { id } : {}),
    ...(transaction ? { db: inTransaction(transaction) } : {}),
  });
}

/** A job id made from another job's id and a word: the same each time that job runs (UUID layout of a SHA-256). */
export function followUpJobId(jobId: string, what: string): string {
  const hex = createHash('sha256').update(`${jobId}:${what}`).digest('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-5${hex.slice(13, 16)}-8${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}

/** Whether a job with this id was ever sent (waiting, running, done or archived). */
export async function jobExists(name: JobName, id: string): Promise<boolean> {
  const boss = await jobQueue();
  return (await boss.getJobById(name, id, { includeArchive: true })) !== null;
}

/** Stops this process's queue connection (tests and shutdown); a worker waits for its running jobs. */
export async function stopJobQueue(): Promise<void> {
  const current = holder.antinodeJobs;
  holder.antinodeJobs = undefined;
  if (current) await (await current).stop({ graceful: true, wait: true, timeout: 30_000 });
}
