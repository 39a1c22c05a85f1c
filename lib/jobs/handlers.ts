// Which function works each kind of job (the job worker registers these with the queue).
import type PgBoss from 'pg-boss';
import { passwordResetMailJob } from '@/lib/account/recovery';
import { signUpMailJob } from '@/lib/auth/sign-up';
import { applyBillingEventJob } from '@/lib/billing/apply-event-job';
import { analysePlanJob } from './analyse-plan';
import type { JobData, JobName } from './names';
import { renderScheduleJob } from './render-schedule';
import { sendMailJob } from './send-mail';

export const JOB_HANDLERS: { [N in JobName]: (job: PgBoss.JobWithMetadata<JobData[N]>) => Promise<unknown> } = {
  'render-schedule': renderScheduleJob,
  'analyse-plan': (job) => analysePlanJob(job.data),
  'send-mail': sendMailJob,
  'sign-up-mail': signUpMailJob,
  'password-reset-mail': passwordResetMailJob,
  'apply-billing-event': applyBillingEventJob,
};

/** Registers every handler with the queue: one job at a time per kind, looking for new ones every `pollS` seconds. */
export async function workAllQueues(boss: PgBoss, pollS: number): Promise<void> {
  const options = { includeMetadata: true as const, batchSize: 1, pollingIntervalSeconds: pollS };
  for (const name of Object.keys(JOB_HANDLERS) as JobName[]) {
    const handler = JOB_HANDLERS[name] as (job: PgBoss.JobWithMetadata<unknown>) => Promise<unknown>;
    await boss.work<unknown>(name, options, async ([job]) => handler(job!));
  }
}
