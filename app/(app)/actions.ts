'use server';

import { cookies } from 'next/headers';
import { z } from 'zod';
import { signOut, switchTeam } from '@/lib/auth/accounts';
import { currentActor } from '@/lib/auth/current';
import { lucia } from '@/lib/auth/lucia';
import { runAction, type ActionResult } from '@/lib/actions';
import { AppError } from '@/lib/errors';
import { parseWith } from '@/lib/validation';

export async function switchTeamAction(teamId: unknown): Promise<ActionResult<null>> {
  return runAction('switchTeam', async () => {
    const actor = await currentActor();
    if (!actor) throw new AppError('not_signed_in', 'Your session has ended. Sign in again.');
    await switchTeam(actor.sessionId, actor.user.id, parseWith(z.uuid('Pick one of your teams.'), teamId));
    return null;
  });
}

const signOutOptionsSchema = z.object({ everywhere: z.boolean({ error: 'everywhere must be true or false' }).optional() }).optional();

export async function signOutAction(options: { everywhere?: boolean } = {}): Promise<ActionResult<null>> {
  return runAction('signOut', async () => {
    const everywhere = parseWith(signOutOptionsSchema, options)?.everywhere ?? false;
    const actor = await currentActor();
    const store = await cookies();
    if (actor) {
      if (everywhere) await lucia.invalidateUserSessions(actor.user.id);
      const blank = await signOut(actor.sessionId);
      store.set(blank.name, blank.value, blank.attributes);
    }
    return null;
  });
}
