// Who is asking: the signed-in user, their teams, and the team they are working in.
import type { Cookie } from 'lucia';
import type { Role } from '@/lib/permissions';
import { Membership, Team } from '@/models';
import type { UnitSystem } from '@/models/user';
import { lucia } from './lucia';

export interface TeamMembership { teamId: string; teamName: string; role: Role }

export interface Actor {
  sessionId: string;
  user: { id: string; email: string; name: string; unitSystem: UnitSystem };
  memberships: TeamMembership[];
  team: TeamMembership | null;  // the active team, or null for a user with no team
  refreshedCookie: Cookie | null; // set when the session was extended or ended
}

export async function actorFromSessionId(sessionId: string | null): Promise<Actor | null> {
  if (!sessionId) return null;
  const { session, user } = await lucia.validateSession(sessionId);
  if (!session || !user) return null;
  const rows = await Membership.findAll({
    where: { userId: user.id },
    include: [{ model: Team, as: 'team' }],
    order: [['createdAt', 'ASC']],
  });
  const memberships: TeamMembership[] = rows.map((row) => ({ teamId: row.teamId, teamName: row.team?.name ?? '', role: row.role }));
  const team = memberships.find((m) => m.teamId === session.activeTeamId) ?? memberships[0] ?? null;
  return {
    sessionId: session.id,
    user: { id: user.id, email: user.email, name: user.name, unitSystem: user.unitSystem },
    memberships,
    team,
    refreshedCookie: session.fresh ? lucia.createSessionCookie(session.id) : null,
  };
}

export function sessionIdFromCookieHeader(header: string | null): string | null {
  return lucia.readSessionCookie(header ?? '');
}
