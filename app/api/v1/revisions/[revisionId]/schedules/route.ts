import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { issueSchedule, listSchedules } from '@/lib/schedules/data';

type Params = { revisionId: string };

export const GET = route<Params>({ access: 'schedule.read' }, async ({ team, params }) => (
  json({ schedules: await listSchedules(team!.teamId, params.revisionId) })
));

// Ask for the treatment schedule of a revision: recorded now (202), rendered and stored with its
// checksum by the job worker; GET shows its progress.
export const POST = route<Params>({ access: 'schedule.issue' }, async ({ team, actor, params }) => (
  json({ schedule: await issueSchedule(team!.teamId, auditActorOf(actor!), params.revisionId) }, 202)
));
