import { passwordResetRequestSchema } from '@/lib/account/schemas';
import { requestPasswordReset, RESET_REQUESTED_MESSAGE } from '@/lib/account/recovery';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

// The same answer whether or not the address has an account.
export const POST = route({ access: 'public', maxBodyBytes: 1024 }, async ({ readJson }) => {
  const { email } = await readJson(passwordResetRequestSchema);
  await requestPasswordReset(email);
  return json({ message: RESET_REQUESTED_MESSAGE }, 202);
});
