// Sends a notification mail unless its recipient turned that kind off. A mail that cannot be
// sent is logged and never undoes the change it announces.
import { sendMail, type MailMessage } from '@/lib/mail/send';
import type { NotificationKind } from './kinds';
import { wantsMail } from './settings';

export async function notify(recipient: { id: string; email: string }, kind: NotificationKind, message: MailMessage): Promise<boolean> {
  if (!(await wantsMail(recipient.id, kind))) return false;
  try {
    await sendMail({ ...message, to: recipient.email });
    return true;
  } catch (error) {
    console.error(`[notify] the ${kind} mail to ${recipient.email} was not sent`, error);
    return false;
  }
}
