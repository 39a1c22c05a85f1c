import { json, route } from '@/lib/http/route';
import { changesSincePrevious } from '@/lib/revisions/changes-since';
import { getRevisionById } from '@/lib/revisions/data';
import { listDecisions, raisedQueries, reviewTally } from '@/lib/reviews/data';

type Params = { revisionId: string };

// The frozen revision, its review (marks, tally, queries) and what changed since the one before.
export const GET = route<Params>({ access: 'plan.read' }, async ({ team, actor, params }) => {
  const revision = await getRevisionById(team!.teamId, params.revisionId);
  const [decisions, tally, queries, changes] = await Promise.all([
    listDecisions(team!.teamId, revision.id), reviewTally(team!.teamId, revision.id), raisedQueries(team!.teamId, revision.id), changesSincePrevious(revision, actor!.user.unitSystem),
  ]);
  return json({ revision, decisions, tally, queries, changes });
});
