// The actor for server components and server actions (reads the cookie through next/headers).
import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { cache } from 'react';
import { AppError } from '@/lib/errors';
import type { Action } from '@/lib/permissions';
import { actorFromSessionId, type Actor } from './actor';
import { assertMayAct } from './may-act';
import { lucia } from './lucia';

export const currentActor = cache(async (): Promise<Actor | null> => {
  const store = await cookies();
  return actorFromSessionId(store.get(lucia.sessionCookieName)?.value ?? null);
});

// For pages: send a signed-out visitor to the sign-in page.
export async function requireActor(): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  return actor;
}

// For server actions: throws a typed error the action turns into a message.
export async function authorize(action: Action): Promise<Actor & { team: NonNullable<Actor['team']> }> {
  const actor = await currentActor();
  if (!actor) throw new AppError('not_signed_in', 'Your session has ended. Sign in again.');
  await assertMayAct(actor.team, action);
  return actor as Actor & { team: NonNullable<Actor['team']> };
}
