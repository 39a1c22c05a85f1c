// The send-mail job: hands one mail to the SMTP server. A failed hand-over is tried again with
// backoff (lib/jobs/names.ts); once sent, the job's text is cleared from the queue's tables, since
// it may carry a link's token that works for hours or days.
import type PgBoss from 'pg-boss';
import { sequelize } from '@/lib/db';
import { sendMail } from '@/lib/mail/send';
import type { JobData } from './names';

/** Replaces a sent mail's text in its job row (pg-boss keeps finished jobs for days). */
async function clearText(jobId: string): Promise<void> {
  await sequelize.query(
    `update pgboss.job set data = jsonb_set(data, '{text}', '"(sent; text cleared)"') where name = 'send-mail' and id = $1`,
    { bind: [jobId] },
  );
}

export async function sendMailJob(job: Pick<PgBoss.Job<JobData['send-mail']>, 'id' | 'data'>): Promise<{ sent: string }> {
  const { label, to, subject, text } = job.data;
  await sendMail({ to, subject, text });
  await clearText(job.id).catch((error: unknown) => console.warn(`[mail] the ${label} job's text was not cleared:`, error));
  return { sent: label };
}
