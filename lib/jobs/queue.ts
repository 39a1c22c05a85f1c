// Background jobs on the database the product already has (pg-boss: a job table in its own
// schema, `pgboss`, locked with SKIP LOCKED, so any number of app instances and job workers share
// it). The web process only sends jobs; the job worker (scripts/jobs-worker.ts) works them.
import PgBoss from 'pg-boss';
import { JOB_QUEUES, type JobData, type JobName } from './names';

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
    // Only the job worker keeps the queue tidy (expires stuck jobs, archives finished ones).
    supervise: role === 'worker',
    schedule: false,
  });
  boss.on('error', (error) => console.error(`[jobs] ${error.message}`));
  await boss.start();
  for (const [name, options] of Object.entries(JOB_QUEUES)) {
    if (!(await boss.getQueue(name))) await boss.createQueue(name, { name, ...options });
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

/** Sends a job; with a key on a stately queue, a second job with the same key is not added while one waits. */
export async function sendJob<N extends JobName>(name: N, data: JobData[N], key?: string, delayS = 0): Promise<string | null> {
  const boss = await jobQueue();
  return boss.send(name, data, { ...(key ? { singletonKey: key } : {}), ...(delayS > 0 ? { startAfter: delayS } : {}) });
}

/** Stops this process's queue connection (tests and shutdown); a worker waits for its running jobs. */
export async function stopJobQueue(): Promise<void> {
  const current = holder.antinodeJobs;
  holder.antinodeJobs = undefined;
  if (current) await (await current).stop({ graceful: true, wait: true, timeout: 30_000 });
}
