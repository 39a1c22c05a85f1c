import { passwordResetRequestSchema } from '@/lib/account/schemas';
import { requestPasswordReset, RESET_REQUESTED_MESSAGE } from '@/lib/account/recovery';
import { clientAddressOf } from '@/lib/http/client-address';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

// The same answer, at once, whether or not the address has an account; the mail follows.
export const POST = route({ access: 'public', maxBodyBytes: 1024 }, async ({ request, readJson }) => {
  const { email } = await readJson(passwordResetRequestSchema);
  await requestPasswordReset(email, clientAddressOf(request.headers));
  return json({ message: RESET_REQUESTED_MESSAGE }, 202);
});
