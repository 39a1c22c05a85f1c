// The kinds of background job, what each carries, and how each is retried.

export interface JobData {
  /** Render and store one asked-for treatment schedule. */
  'render-schedule': { scheduleId: string; teamId: string };
  /** Analyse the plan's current version and store it (so every view reads a stored analysis). */
  'analyse-plan': { planId: string; teamId: string };
}

export type JobName = keyof JobData;

/** Retries with exponential backoff from retryDelay seconds; a job running past expireInSeconds is taken as lost and retried. */
export const JOB_QUEUES: Record<JobName, { retryLimit: number; retryDelay: number; retryBackoff: boolean; expireInSeconds: number; policy?: 'standard' | 'stately' }> = {
  'render-schedule': { retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 300 },
  'analyse-plan': { retryLimit: 2, retryDelay: 10, retryBackoff: true, expireInSeconds: 120, policy: 'stately' },
};
