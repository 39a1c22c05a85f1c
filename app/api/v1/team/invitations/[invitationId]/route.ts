import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { revokeInvitation } from '@/lib/team/invitations';

export const dynamic = 'force-dynamic';

export const DELETE = route<{ invitationId: string }>({ access: 'members.manage' }, async ({ team, actor, params }) => {
  await revokeInvitation(team!.teamId, auditActorOf(actor!), params.invitationId);
  return json({ revoked: true });
});
