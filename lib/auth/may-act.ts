// The one server-side check behind every route handler and server action: the active team's
// role may take the action, and a write waits until a read-only team is in good standing.
import { assertTeamWritable } from '@/lib/billing/standing';
import { forbidden } from '@/lib/errors';
import { can, isWriteAction, type Action } from '@/lib/permissions';
import type { TeamMembership } from './actor';

export async function assertMayAct(team: TeamMembership | null, action: Action): Promise<TeamMembership> {
  if (!team || !can(team.role, action)) throw forbidden();
  if (isWriteAction(action)) await assertTeamWritable(team.teamId);
  return team;
}
