'use server';

import { cookies } from 'next/headers';
import { startSession, switchTeam } from '@/lib/auth/accounts';
import { currentActor } from '@/lib/auth/current';
import { runAction, type ActionResult } from '@/lib/actions';
import { acceptInvitation } from '@/lib/team/accept';
import { acceptInvitationSchema } from '@/lib/team/schemas';
import { parseWith } from '@/lib/validation';

// Joins the team; the session moves to it (or a new session starts for a new account).
export async function acceptInvitationAction(input: unknown): Promise<ActionResult<null>> {
  return runAction('acceptInvitation', async () => {
    const actor = await currentActor();
    const { userId, teamId } = await acceptInvitation(parseWith(acceptInvitationSchema, input), actor?.user.id ?? null);
    if (actor?.user.id === userId) {
      await switchTeam(actor.sessionId, userId, teamId);
    } else {
      const cookie = await startSession(userId, teamId);
      (await cookies()).set(cookie.name, cookie.value, cookie.attributes);
    }
    return null;
  });
}
