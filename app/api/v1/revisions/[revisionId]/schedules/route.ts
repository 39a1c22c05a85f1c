import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { issueSchedule, listSchedules } from '@/lib/schedules/data';

type Params = { revisionId: string };

export const GET = route<Params>({ access: 'schedule.read' }, async ({ team, params }) => (
  json({ schedules: await listSchedules(team!.teamId, params.revisionId) })
));

// Issue the treatment schedule of a revision: render, store with its checksum, record.
export const POST = route<Params>({ access: 'schedule.issue' }, async ({ team, actor, params }) => (
  json({ schedule: await issueSchedule(team!.teamId, auditActorOf(actor!), params.revisionId) }, 201)
));
