import { auditActorOf } from '@/lib/audit/record';
import { setCommentResolved } from '@/lib/comments/data';
import { resolveCommentSchema } from '@/lib/comments/schemas';
import { json, route } from '@/lib/http/route';

type Params = { commentId: string };

// Resolve or reopen a thread.
export const PATCH = route<Params>({ access: 'comment.write' }, async ({ team, actor, params, readJson }) => {
  const input = await readJson(resolveCommentSchema);
  return json({ comment: await setCommentResolved(team!.teamId, auditActorOf(actor!), params.commentId, input.resolved) });
});
