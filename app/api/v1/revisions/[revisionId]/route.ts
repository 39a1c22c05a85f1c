import { json, route } from '@/lib/http/route';
import { getRevisionById } from '@/lib/revisions/data';
import { listDecisions, reviewTally } from '@/lib/reviews/data';

type Params = { revisionId: string };

export const GET = route<Params>({ access: 'plan.read' }, async ({ team, params }) => {
  const revision = await getRevisionById(team!.teamId, params.revisionId);
  const [decisions, tally] = await Promise.all([listDecisions(team!.teamId, revision.id), reviewTally(team!.teamId, revision.id)]);
  return json({ revision, decisions, tally });
});
