// The job worker: a process beside the web server (npm start and the tests start it, npm run stop
// stops it) that works the background jobs. On SIGTERM it takes no new job, lets the running ones
// finish, then exits. Bundled into .compute/jobs-worker.mjs (scripts/build-worker.ts).
import { closeComputePool } from '@/lib/compute/pool';
import { lowerPriority } from '@/lib/compute/priority';
import { sequelize } from '@/lib/db';
import { workAllQueues } from './handlers';
import { jobQueue, stopJobQueue } from './queue';

/** How often an idle worker looks for new jobs, s. */
const POLL_S = 1;
/**
 * Nice value of the worker (0 normal, 19 lowest; ANTINODE_JOBS_NICE): on a machine it shares with a
 * web instance, rendering gives way to answering requests. Threads started later inherit it.
 */
const JOBS_NICE = Number(process.env.ANTINODE_JOBS_NICE ?? 10);

lowerPriority(JOBS_NICE);

async function main(): Promise<void> {
  const boss = await jobQueue('worker');
  await workAllQueues(boss, POLL_S);
  console.log(`job worker ready (pid ${process.pid})`);
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`${signal}: taking no new jobs, finishing the running ones`);
    await stopJobQueue();
    await closeComputePool();
    await sequelize.close();
    console.log('job worker stopped');
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop('SIGTERM'));
  process.on('SIGINT', () => void stop('SIGINT'));
}

main().catch((error: unknown) => {
  console.error('the job worker could not start:', error);
  process.exit(1);
});
