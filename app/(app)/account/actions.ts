'use server';

import { revalidatePath } from 'next/cache';
import { changeEmail, changePassword } from '@/lib/account/changes';
import { emailChangeSchema, passwordChangeSchema } from '@/lib/account/schemas';
import { runAction, type ActionResult } from '@/lib/actions';
import { currentActor } from '@/lib/auth/current';
import { AppError } from '@/lib/errors';
import { parseWith } from '@/lib/validation';

async function signedIn() {
  const actor = await currentActor();
  if (!actor) throw new AppError('not_signed_in', 'Your session has ended. Sign in again.');
  return actor;
}

export async function changePasswordAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('changePassword', async () => {
    const actor = await signedIn();
    const { currentPassword, newPassword } = parseWith(passwordChangeSchema, input);
    await changePassword(actor.user.id, actor.sessionId, currentPassword, newPassword);
    return null;
  });
}

export async function changeEmailAction(input: unknown): Promise<ActionResult<{ email: string }>> {
  return runAction('changeEmail', async () => {
    const actor = await signedIn();
    const { currentPassword, email } = parseWith(emailChangeSchema, input);
    const changed = await changeEmail(actor.user.id, actor.sessionId, currentPassword, email);
    revalidatePath('/account');
    return { email: changed };
  });
}
