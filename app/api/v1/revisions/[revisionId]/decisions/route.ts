import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { decideRow, reviewTally } from '@/lib/reviews/data';
import { decisionSchema } from '@/lib/reviews/schemas';

type Params = { revisionId: string };

// Accept or flag one row of the revision, with a note (a flag needs one).
export const PUT = route<Params>({ access: 'review.write' }, async ({ team, actor, params, readJson }) => {
  const input = await readJson(decisionSchema);
  const decision = await decideRow(team!.teamId, auditActorOf(actor!), params.revisionId, input);
  return json({ decision, tally: await reviewTally(team!.teamId, params.revisionId) });
});
