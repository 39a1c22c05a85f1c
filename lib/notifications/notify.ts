// Queues a notification mail unless its recipient turned that kind off (the send-mail job sends
// it, retrying). A mail that cannot be queued is logged and never undoes the change it announces.
import { queueMail } from '@/lib/mail/queue';
import type { MailMessage } from '@/lib/mail/send';
import type { NotificationKind } from './kinds';
import { wantsMail } from './settings';

export async function notify(recipient: { id: string; email: string }, kind: NotificationKind, message: MailMessage): Promise<boolean> {
  if (!(await wantsMail(recipient.id, kind))) return false;
  try {
    await queueMail(`${kind} notice`, { ...message, to: recipient.email });
    return true;
  } catch (error) {
    console.error(`[notify] the ${kind} mail to ${recipient.email} was not queued`, error);
    return false;
  }
}
