'use server';

import { cookies, headers } from 'next/headers';
import { startSession, switchTeam } from '@/lib/auth/accounts';
import { currentActor } from '@/lib/auth/current';
import { DEVICE_COOKIE } from '@/lib/auth/known-devices';
import { clientAddressOf } from '@/lib/http/client-address';
import { runAction, type ActionResult } from '@/lib/actions';
import { acceptInvitation } from '@/lib/team/accept';
import { acceptInvitationSchema } from '@/lib/team/schemas';
import { parseWith } from '@/lib/validation';

// Joins the team; the session moves to it (or a new session starts for a new account).
export async function acceptInvitationAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('acceptInvitation', async () => {
    const actor = await currentActor();
    const store = await cookies();
    const client = { address: clientAddressOf(await headers()), deviceToken: store.get(DEVICE_COOKIE)?.value ?? null };
    const { userId, teamId } = await acceptInvitation(parseWith(acceptInvitationSchema, input), actor?.user.id ?? null, client);
    if (actor?.user.id === userId) {
      await switchTeam(actor.sessionId, userId, teamId);
    } else {
      const cookie = await startSession(userId, teamId);
      store.set(cookie.name, cookie.value, cookie.attributes);
    }
    return null;
  });
}
