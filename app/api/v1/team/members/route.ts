import { json, route } from '@/lib/http/route';
import { listMembers } from '@/lib/team/members';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'team.read' }, async ({ team }) => json({ members: await listMembers(team!.teamId) }));
