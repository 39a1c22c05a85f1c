import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { resendInvitation } from '@/lib/team/invitations';

export const dynamic = 'force-dynamic';

export const POST = route<{ invitationId: string }>({ access: 'members.manage' }, async ({ team, actor, params }) =>
  json({ invitation: await resendInvitation(team!.teamId, auditActorOf(actor!), params.invitationId) }));
