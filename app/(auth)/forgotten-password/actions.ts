'use server';

import { cookies, headers } from 'next/headers';
import { passwordResetRequestSchema, passwordResetSchema } from '@/lib/account/schemas';
import { requestPasswordReset, resetPassword, RESET_REQUESTED_MESSAGE } from '@/lib/account/recovery';
import { runAction, type ActionResult } from '@/lib/actions';
import { DEVICE_COOKIE } from '@/lib/auth/known-devices';
import { clientAddressOf } from '@/lib/http/client-address';
import { parseWith } from '@/lib/validation';

export async function requestPasswordResetAction(input: unknown): Promise<ActionResult<{ message: string }>> {
  return runAction('requestPasswordReset', async () => {
    await requestPasswordReset(parseWith(passwordResetRequestSchema, input).email, clientAddressOf(await headers()));
    return { message: RESET_REQUESTED_MESSAGE };
  });
}

export async function resetPasswordAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('resetPassword', async () => {
    const { token, password } = parseWith(passwordResetSchema, input);
    const store = await cookies();
    const device = await resetPassword(token, password, store.get(DEVICE_COOKIE)?.value ?? null);
    store.set(device.name, device.value, device.attributes);
    return null;
  });
}
