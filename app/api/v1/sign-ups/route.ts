import { signUpSchema } from '@/lib/auth/schemas';
import { requestSignUp } from '@/lib/auth/sign-up';
import { clientAddressOf } from '@/lib/http/client-address';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

// { name, email, password, teamName } → the same answer for every address; the mail follows
// (a confirmation link, or a notice to an address that already has an account).
export const POST = route({ access: 'public', maxBodyBytes: 4096 }, async ({ request, readJson }) => {
  const input = await readJson(signUpSchema);
  return json(await requestSignUp(input, clientAddressOf(request.headers)), 202);
});
