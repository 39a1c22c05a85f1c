import { signIn } from '@/lib/auth/accounts';
import { deviceTokenFromCookieHeader, serializeCookie } from '@/lib/auth/known-devices';
import { signInSchema } from '@/lib/auth/schemas';
import { clientAddressOf } from '@/lib/http/client-address';
import { json, route } from '@/lib/http/route';

// Sign in for scripts and API clients: { email, password } → the session cookie (and the
// device cookie that lets this client through when others' failures slow the account down).
export const POST = route({ access: 'public', maxBodyBytes: 4096 }, async ({ request, readJson }) => {
  const input = await readJson(signInSchema);
  const client = { address: clientAddressOf(request.headers), deviceToken: deviceTokenFromCookieHeader(request.headers.get('cookie')) };
  const { session, device } = await signIn(input.email, input.password, client);
  const headers = new Headers();
  headers.append('set-cookie', session.serialize());
  headers.append('set-cookie', serializeCookie(device));
  return json({ signedIn: true }, 201, headers);
});
