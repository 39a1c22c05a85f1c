import { json, route } from '@/lib/http/route';
import { PERMISSIONS } from '@/lib/permissions';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'signed-in' }, async ({ actor }) => {
  const { user, memberships, team } = actor!;
  return json({
    user,
    teams: memberships,
    activeTeam: team,
    allowedActions: team ? [...PERMISSIONS[team.role]] : [],
  });
});
