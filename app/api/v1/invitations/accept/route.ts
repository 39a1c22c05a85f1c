import { startSession } from '@/lib/auth/accounts';
import { actorFromSessionId, sessionIdFromCookieHeader } from '@/lib/auth/actor';
import { deviceTokenFromCookieHeader } from '@/lib/auth/known-devices';
import { clientAddressOf } from '@/lib/http/client-address';
import { json, route } from '@/lib/http/route';
import { acceptInvitation } from '@/lib/team/accept';
import { acceptInvitationSchema } from '@/lib/team/schemas';

export const dynamic = 'force-dynamic';

// { token, name?, password? } → joins the team and answers with a session in it.
export const POST = route({ access: 'public', maxBodyBytes: 4096 }, async ({ request, readJson }) => {
  const input = await readJson(acceptInvitationSchema);
  const signedIn = await actorFromSessionId(sessionIdFromCookieHeader(request.headers.get('cookie')));
  const client = { address: clientAddressOf(request.headers), deviceToken: deviceTokenFromCookieHeader(request.headers.get('cookie')) };
  const { userId, teamId } = await acceptInvitation(input, signedIn?.user.id ?? null, client);
  const cookie = await startSession(userId, teamId);
  return json({ joined: { teamId } }, 201, { 'set-cookie': cookie.serialize() });
});
