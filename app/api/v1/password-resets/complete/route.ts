import { passwordResetSchema } from '@/lib/account/schemas';
import { resetPassword } from '@/lib/account/recovery';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

export const POST = route({ access: 'public', maxBodyBytes: 1024 }, async ({ readJson }) => {
  const { token, password } = await readJson(passwordResetSchema);
  await resetPassword(token, password);
  return json({ passwordChanged: true });
});
