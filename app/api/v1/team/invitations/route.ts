import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { createInvitation, listInvitations } from '@/lib/team/invitations';
import { invitationInputSchema } from '@/lib/team/schemas';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'members.manage' }, async ({ team }) => json({ invitations: await listInvitations(team!.teamId) }));

export const POST = route({ access: 'members.manage', maxBodyBytes: 2048 }, async ({ team, actor, readJson }) => {
  const input = await readJson(invitationInputSchema);
  return json({ invitation: await createInvitation(team!.teamId, auditActorOf(actor!), input) }, 201);
});
