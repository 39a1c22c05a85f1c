// Mail goes out through the send-mail job (lib/jobs/send-mail.ts): queued in the database, so a
// mail waiting when a server stops is still sent, by whichever job worker is running.
import { sendJob, type SendJobOptions } from '@/lib/jobs/queue';
import type { MailMessage } from './send';

/** Queues one mail; `label` names it in the logs (never the recipient's words). */
export async function queueMail(label: string, message: MailMessage, options: Pick<SendJobOptions, 'id' | 'transaction'> = {}): Promise<void> {
  await sendJob('send-mail', { label, to: message.to, subject: message.subject, text: message.text }, options);
}
