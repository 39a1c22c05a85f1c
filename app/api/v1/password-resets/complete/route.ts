import { passwordResetSchema } from '@/lib/account/schemas';
import { resetPassword } from '@/lib/account/recovery';
import { deviceTokenFromCookieHeader, serializeCookie } from '@/lib/auth/known-devices';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

export const POST = route({ access: 'public', maxBodyBytes: 1024 }, async ({ request, readJson }) => {
  const { token, password } = await readJson(passwordResetSchema);
  const device = await resetPassword(token, password, deviceTokenFromCookieHeader(request.headers.get('cookie')));
  return json({ passwordChanged: true }, 200, { 'set-cookie': serializeCookie(device) });
});
