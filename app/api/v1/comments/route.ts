import { auditActorOf } from '@/lib/audit/record';
import { createComment, listThreads } from '@/lib/comments/data';
import { listCommentsQuerySchema, newCommentSchema } from '@/lib/comments/schemas';
import { json, route } from '@/lib/http/route';
import { announceMentions } from '@/lib/notifications/mention-mails';

// GET /api/v1/comments?planId=…[&revisionId=…]: the plan's comment threads.
export const GET = route({ access: 'plan.read' }, async ({ team, request }) => {
  const query = listCommentsQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return json({ threads: await listThreads(team!.teamId, query.planId, query.revisionId) });
});

// Write a comment pinned on the plan or a table row, or answer one; mentions are mailed.
export const POST = route({ access: 'comment.write' }, async ({ team, actor, readJson }) => {
  const input = await readJson(newCommentSchema);
  const who = auditActorOf(actor!);
  const created = await createComment(team!.teamId, who, input);
  const mentioned = await announceMentions(team!.teamId, who, created);
  return json({ comment: created.comment, mailed: mentioned.length }, 201);
});
