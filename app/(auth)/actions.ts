'use server';

import { cookies, headers } from 'next/headers';
import type { Cookie } from 'lucia';
import { signIn } from '@/lib/auth/accounts';
import { DEVICE_COOKIE, type PlainCookie } from '@/lib/auth/known-devices';
import { signInSchema, signUpConfirmSchema, signUpSchema } from '@/lib/auth/schemas';
import { confirmSignUp, requestSignUp } from '@/lib/auth/sign-up';
import { runAction, type ActionResult } from '@/lib/actions';
import { clientAddressOf } from '@/lib/http/client-address';
import { parseWith } from '@/lib/validation';

async function setCookies(...list: (Cookie | PlainCookie)[]): Promise<void> {
  const store = await cookies();
  for (const cookie of list) store.set(cookie.name, cookie.value, cookie.attributes);
}

async function deviceToken(): Promise<string | null> {
  return (await cookies()).get(DEVICE_COOKIE)?.value ?? null;
}

export async function signInAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('signIn', async () => {
    const { email, password } = parseWith(signInSchema, input);
    const signedIn = await signIn(email, password, { address: clientAddressOf(await headers()), deviceToken: await deviceToken() });
    await setCookies(signedIn.session, signedIn.device);
    return null;
  });
}

export async function signUpAction(input: unknown): Promise<ActionResult<{ message: string }>> {
  return runAction('signUp', async () => requestSignUp(parseWith(signUpSchema, input), clientAddressOf(await headers())));
}

export async function confirmSignUpAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('confirmSignUp', async () => {
    const { token } = parseWith(signUpConfirmSchema, input);
    const signedIn = await confirmSignUp(token, await deviceToken());
    await setCookies(signedIn.session, signedIn.device);
    return null;
  });
}
