import { z } from 'zod';
import { text } from '@/lib/text';

// Shared by the comment forms and their routes.
export const commentBodySchema = text({ error: 'Write the comment.' }).trim().min(1, 'Write the comment.').max(4000, 'Keep a comment under 4000 characters.');

export const newCommentSchema = z.object({
  planId: z.uuid({ error: 'planId must be a plan id' }),
  revisionId: z.uuid({ error: 'revisionId must be a revision id' }).nullable().optional().default(null),
  parentId: z.uuid({ error: 'parentId must be a comment id' }).nullable().optional().default(null),
  xPx: z.number({ error: 'xPx must be a number' }).finite().min(-100_000).max(100_000).nullable().optional().default(null),
  yPx: z.number({ error: 'yPx must be a number' }).finite().min(-100_000).max(100_000).nullable().optional().default(null),
  target: text({ error: 'target must be text' }).min(1).max(200).nullable().optional().default(null),
  body: commentBodySchema,
}).refine((value) => (value.xPx === null) === (value.yPx === null), { message: 'Give both xPx and yPx, or neither.', path: ['xPx'] });
export type NewCommentInput = z.input<typeof newCommentSchema>;

export const resolveCommentSchema = z.object({ resolved: z.boolean({ error: 'resolved must be true or false' }) });

export const listCommentsQuerySchema = z.object({
  planId: z.uuid({ error: 'Give planId, the plan whose comments to list.' }),
  revisionId: z.uuid({ error: 'revisionId must be a revision id' }).optional(),
});
