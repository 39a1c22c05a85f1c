import { signIn } from '@/lib/auth/accounts';
import { signInSchema } from '@/lib/auth/schemas';
import { clientAddress, json, route } from '@/lib/http/route';

// Sign in for scripts and API clients: { email, password } → the session cookie.
export const POST = route({ access: 'public', maxBodyBytes: 4096 }, async ({ request, readJson }) => {
  const input = await readJson(signInSchema);
  const cookie = await signIn(input.email, input.password, clientAddress(request));
  return json({ signedIn: true }, 201, { 'set-cookie': cookie.serialize() });
});
