// Comments pinned on a plan or on a row of a revision's tables.
import { listCommentsQuerySchema, newCommentSchema, resolveCommentSchema } from '@/lib/comments/schemas';
import { EXAMPLE_IDS } from './examples';
import type { ApiOperation } from './types';

const COMMENT_FIELDS = 'id, planId, revisionId, parentId, xPx, yPx, target, body, authorName, resolved, resolvedByName, createdAt';

export const COMMENT_OPERATIONS: ApiOperation[] = [
  {
    method: 'GET', path: '/api/v1/comments', area: 'Comments', access: 'plan.read', summary: 'List a plan\'s comment threads',
    query: { schema: listCommentsQuerySchema, example: { planId: EXAMPLE_IDS.planId } }, body: { kind: 'none' },
    responses: { 200: { description: 'The threads.', fields: { threads: `Each: the first comment (${COMMENT_FIELDS}) and its answers` } } },
  },
  {
    method: 'POST', path: '/api/v1/comments', area: 'Comments', access: 'comment.write', summary: 'Write a comment, or answer one',
    description: 'Pinned at plan pixels (xPx, yPx), on a table row (target), or an answer (parentId). "@" and a member\'s name or e-mail mentions them by mail.',
    body: { kind: 'json', schema: newCommentSchema, example: { planId: EXAMPLE_IDS.planId, xPx: 412, yPx: 236, body: 'Hum near this grille at low fan speed.' }, exampleSummary: 'A comment pinned on the plan' },
    responses: { 201: { description: 'The comment.', fields: { comment: COMMENT_FIELDS, mailed: 'How many people were mentioned and mailed' } } },
  },
  {
    method: 'PATCH', path: '/api/v1/comments/{commentId}', area: 'Comments', access: 'comment.write', summary: 'Close out or reopen a thread',
    pathExample: { commentId: EXAMPLE_IDS.commentId },
    body: { kind: 'json', schema: resolveCommentSchema, example: { resolved: true }, exampleSummary: 'Close out' },
    responses: { 200: { description: 'The thread\'s first comment.', fields: { comment: COMMENT_FIELDS } } },
  },
];
