import { deviceTokenFromCookieHeader, serializeCookie } from '@/lib/auth/known-devices';
import { signUpConfirmSchema } from '@/lib/auth/schemas';
import { confirmSignUp } from '@/lib/auth/sign-up';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

// { token } from the mailed link → the account and its team, and a session in it.
export const POST = route({ access: 'public', maxBodyBytes: 1024 }, async ({ request, readJson }) => {
  const { token } = await readJson(signUpConfirmSchema);
  const { session, device } = await confirmSignUp(token, deviceTokenFromCookieHeader(request.headers.get('cookie')));
  const headers = new Headers();
  headers.append('set-cookie', session.serialize());
  headers.append('set-cookie', serializeCookie(device));
  return json({ signedUp: true }, 201, headers);
});
