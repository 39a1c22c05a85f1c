// The render-schedule job: renders and stores one asked-for treatment schedule; after its last
// try, the schedule says it failed and what to do.
import type PgBoss from 'pg-boss';
import { failAskedSchedule, renderAskedSchedule } from '@/lib/schedules/data';
import type { JobData } from './names';

export async function renderScheduleJob(job: PgBoss.JobWithMetadata<JobData['render-schedule']>): Promise<{ outcome: string }> {
  const { scheduleId, teamId } = job.data;
  try {
    return { outcome: await renderAskedSchedule(teamId, scheduleId) };
  } catch (error) {
    if (job.retryCount >= job.retryLimit) {
      await failAskedSchedule(teamId, scheduleId, error instanceof Error ? error.message.slice(0, 200) : 'unknown error');
    }
    throw error;
  }
}
