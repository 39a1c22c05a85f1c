import { signOut, switchTeam } from '@/lib/auth/accounts';
import { switchTeamSchema } from '@/lib/auth/schemas';
import { json, route } from '@/lib/http/route';

export const DELETE = route({ access: 'signed-in' }, async ({ actor }) => {
  const cookie = await signOut(actor!.sessionId);
  return json({ signedIn: false }, 200, { 'set-cookie': cookie.serialize() });
});

// Switch the team this session works in.
export const PUT = route({ access: 'signed-in', maxBodyBytes: 1024 }, async ({ actor, readJson }) => {
  const { teamId } = await readJson(switchTeamSchema);
  await switchTeam(actor!.sessionId, actor!.user.id, teamId);
  return json({ activeTeamId: teamId });
});
