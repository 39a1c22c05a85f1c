// The apply-billing-event job: a verified event, recorded as "queued" by the webhook, is applied
// to its team here, off the request. Applying re-reads the subscription from the payment service;
// when the service cannot be asked, the transaction rolls back and the job is tried again with
// backoff (lib/jobs/names.ts). The event's row is locked and its outcome checked first, so a job
// that runs twice (a worker lost mid-way) applies the event once.
import type PgBoss from 'pg-boss';
import { sequelize } from '@/lib/db';
import type { JobData } from '@/lib/jobs/names';
import { BillingEvent } from '@/models';
import { applyBillingEvent, type EventResult } from './apply-event';

type Job = Pick<PgBoss.JobWithMetadata<JobData['apply-billing-event']>, 'id' | 'data' | 'retryCount' | 'retryLimit'>;

async function applyOnce(billingEventId: string, event: JobData['apply-billing-event']['event']): Promise<EventResult> {
  return sequelize.transaction(async (transaction) => {
    const row = await BillingEvent.findByPk(billingEventId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) return { outcome: 'ignored', teamId: null, reason: `event record ${billingEventId} is gone` };
    if (row.outcome !== 'queued') return { outcome: 'duplicate', teamId: row.teamId, reason: `${event.id} was already applied (${row.outcome})` };
    const result = await applyBillingEvent(event, transaction);
    await row.update({ teamId: result.teamId, outcome: result.outcome === 'applied' ? 'applied' : 'ignored', reason: result.reason.slice(0, 500) }, { transaction });
    return result;
  });
}

export async function applyBillingEventJob(job: Job): Promise<EventResult> {
  const { billingEventId, event } = job.data;
  try {
    return await applyOnce(billingEventId, event);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    if (job.retryCount >= job.retryLimit) {
      // The last try: the record says so, for whoever reads the billing log; the Seats and billing
      // page still brings the team in line with the service when it opens (reconcile.ts).
      await BillingEvent.update({ outcome: 'failed', reason: `not applied after ${job.retryCount + 1} tries: ${message}`.slice(0, 500) }, { where: { id: billingEventId, outcome: 'queued' } });
    }
    console.warn(`[billing] event ${event.id} not applied yet (try ${job.retryCount + 1} of ${job.retryLimit + 1}): ${message}`);
    throw error;
  }
}
