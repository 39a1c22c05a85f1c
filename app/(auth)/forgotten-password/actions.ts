'use server';

import { passwordResetRequestSchema, passwordResetSchema } from '@/lib/account/schemas';
import { requestPasswordReset, resetPassword, RESET_REQUESTED_MESSAGE } from '@/lib/account/recovery';
import { runAction, type ActionResult } from '@/lib/actions';
import { parseWith } from '@/lib/validation';

export async function requestPasswordResetAction(input: unknown): Promise<ActionResult<{ message: string }>> {
  return runAction('requestPasswordReset', async () => {
    await requestPasswordReset(parseWith(passwordResetRequestSchema, input).email);
    return { message: RESET_REQUESTED_MESSAGE };
  });
}

export async function resetPasswordAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('resetPassword', async () => {
    const { token, password } = parseWith(passwordResetSchema, input);
    await resetPassword(token, password);
    return null;
  });
}
