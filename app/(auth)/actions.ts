'use server';

import { cookies, headers } from 'next/headers';
import type { Cookie } from 'lucia';
import { signIn, signUp } from '@/lib/auth/accounts';
import { signInSchema, signUpSchema } from '@/lib/auth/schemas';
import { runAction, type ActionResult } from '@/lib/actions';
import { parseWith } from '@/lib/validation';

async function setCookie(cookie: Cookie): Promise<void> {
  (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
}

export async function signInAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('signIn', async () => {
    const { email, password } = parseWith(signInSchema, input);
    const forwarded = (await headers()).get('x-forwarded-for');
    await setCookie(await signIn(email, password, forwarded?.split(',')[0]?.trim() || null));
    return null;
  });
}

export async function signUpAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('signUp', async () => {
    const data = parseWith(signUpSchema, input);
    await setCookie(await signUp(data));
    return null;
  });
}
