// The kinds of background job, what each carries, and how each is retried.
import type { BillingEventIn } from '@/lib/billing/event-shape';
import type { MailMessage } from '@/lib/mail/send';

export interface JobData {
  /** Render and store one asked-for treatment schedule. */
  'render-schedule': { scheduleId: string; teamId: string };
  /** Analyse the plan's current version and store it (so every view reads a stored analysis). */
  'analyse-plan': { planId: string; teamId: string };
  /** Send one mail (its text is cleared from the job once sent: it may hold a link's token). */
  'send-mail': MailMessage & { label: string };
  /** A sign-up asked for: look the address up, then queue the confirmation link or the notice. */
  'sign-up-mail': { name: string; email: string; teamName: string; passwordHash: string; requestedAt: string };
  /** A password reset asked for: look the address up, then queue the link if it has an account. */
  'password-reset-mail': { email: string; requestedAt: string };
  /** A payment-service event, verified and recorded as received: apply it to its team. */
  'apply-billing-event': { billingEventId: string; event: BillingEventIn };
}

export type JobName = keyof JobData;

/** Kinds that only send mail, or decide which mail to send. */
export const MAIL_JOBS = ['sign-up-mail', 'password-reset-mail', 'send-mail'] as const satisfies readonly JobName[];

/** Retries with exponential backoff from retryDelay seconds; a job running past expireInSeconds is taken as lost and retried. */
export const JOB_QUEUES: Record<JobName, { retryLimit: number; retryDelay: number; retryBackoff: boolean; expireInSeconds: number; policy?: 'standard' | 'stately' }> = {
  // a 20-run render took 55 s on a busy 2-core machine (npm run bench); one running three minutes
  // is taken as lost (its worker died) and tried again
  'render-schedule': { retryLimit: 3, retryDelay: 5, retryBackoff: true, expireInSeconds: 180 },
  'analyse-plan': { retryLimit: 2, retryDelay: 10, retryBackoff: true, expireInSeconds: 120, policy: 'stately' },
  // a mail server away for a while: waits of 15–30 s, doubling each try, up to 16–32 minutes (under an hour in all)
  'send-mail': { retryLimit: 7, retryDelay: 15, retryBackoff: true, expireInSeconds: 60 },
  'sign-up-mail': { retryLimit: 4, retryDelay: 10, retryBackoff: true, expireInSeconds: 60 },
  'password-reset-mail': { retryLimit: 4, retryDelay: 10, retryBackoff: true, expireInSeconds: 60 },
  // the payment service away for a while: waits of 10–20 s, doubling each try, up to about 3 hours in all
  'apply-billing-event': { retryLimit: 10, retryDelay: 10, retryBackoff: true, expireInSeconds: 60 },
};
