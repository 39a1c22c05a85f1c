// Works the jobs waiting in some queues in this test's process, as the job worker would: fetch,
// run the kind's handler, mark done or failed (a failed one waits for its retry; not worked here).
import type PgBoss from 'pg-boss';
import { JOB_HANDLERS } from '@/lib/jobs/handlers';
import { MAIL_JOBS, type JobName } from '@/lib/jobs/names';
import { jobQueue } from '@/lib/jobs/queue';

/** Jobs of these kinds waiting to start now. */
export async function waitingJobs(names: readonly JobName[] = MAIL_JOBS): Promise<number> {
  const boss = await jobQueue();
  let total = 0;
  for (const name of names) total += (await boss.getQueueSize(name, { before: 'active' }));
  return total;
}

/** Runs every job of these kinds that is waiting now, and those they queue, until none waits; returns how many ran. */
export async function workWaitingJobs(names: readonly JobName[] = MAIL_JOBS): Promise<number> {
  const boss = await jobQueue();
  let ran = 0;
  for (let found = true; found;) {
    found = false;
    for (const name of names) {
      const [job] = await boss.fetch<unknown>(name, { includeMetadata: true, batchSize: 1 });
      if (!job) continue;
      found = true;
      ran += 1;
      const handler = JOB_HANDLERS[name] as (job: PgBoss.JobWithMetadata<unknown>) => Promise<unknown>;
      try {
        await boss.complete(name, job.id, (await handler(job)) as object);
      } catch (error) {
        await boss.fail(name, job.id, { message: error instanceof Error ? error.message : String(error) });
        throw error;
      }
    }
  }
  return ran;
}
