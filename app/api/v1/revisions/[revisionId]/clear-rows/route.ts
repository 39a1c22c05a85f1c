import { auditActorOf } from '@/lib/audit/record';
import { json, route } from '@/lib/http/route';
import { checkClearRows } from '@/lib/reviews/data';
import { checkClearRowsSchema } from '@/lib/reviews/schemas';

type Params = { revisionId: string };

// Check every clear row at once: not yet marked, no risk mark, no open remark.
export const POST = route<Params>({ access: 'review.write', maxBodyBytes: 1024 }, async ({ team, actor, params, readJson }) => {
  await readJson(checkClearRowsSchema);
  return json(await checkClearRows(team!.teamId, auditActorOf(actor!), params.revisionId));
});
