import { z } from 'zod';
import { text } from '@/lib/text';
import { DECISIONS } from './decisions';

// Shared by the review controls and their routes.
export const decisionSchema = z.object({
  target: text({ error: 'target must name a row of the revision' }).min(1, 'target must name a row of the revision').max(200),
  decision: z.enum(DECISIONS, { error: 'decision must be accepted or flagged' }),
  note: text({ error: 'note must be text' }).trim().max(2000, 'Keep the note under 2000 characters.').optional().default(''),
}).refine((value) => value.decision !== 'flagged' || value.note.length > 0, { message: 'Say why the row is flagged.', path: ['note'] });
export type DecisionInput = z.input<typeof decisionSchema>;

export const finishReviewSchema = z.object({}).loose();
