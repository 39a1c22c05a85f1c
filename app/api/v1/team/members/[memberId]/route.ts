import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { changeMemberRole, removeMember } from '@/lib/team/members';
import { roleChangeSchema } from '@/lib/team/schemas';

export const dynamic = 'force-dynamic';

export const PATCH = route<{ memberId: string }>({ access: 'members.manage', maxBodyBytes: 1024 }, async ({ team, actor, params, readJson }) => {
  const { role } = await readJson(roleChangeSchema);
  return json({ member: await changeMemberRole(team!.teamId, auditActorOf(actor!), params.memberId, role) });
});

export const DELETE = route<{ memberId: string }>({ access: 'members.manage' }, async ({ team, actor, params }) => {
  await removeMember(team!.teamId, auditActorOf(actor!), params.memberId);
  return json({ removed: true });
});
