import { z } from 'zod';
import { text } from '@/lib/text';
import { REVIEW_OUTCOMES } from '@/lib/revisions/states';
import { DECISIONS } from './decisions';

// Shared by the review controls and their routes.
export const decisionSchema = z.object({
  target: text({ error: 'target must name a row of the revision' }).min(1, 'target must name a row of the revision').max(200),
  decision: z.enum(DECISIONS, { error: 'decision must be checked or query' }),
  note: text({ error: 'note must be text' }).trim().max(2000, 'Keep the note under 2000 characters.').optional().default(''),
}).refine((value) => value.decision !== 'query' || value.note.length > 0, { message: 'Write the query: what should the acoustician answer or change?', path: ['note'] });
export type DecisionInput = z.input<typeof decisionSchema>;

// Checking every clear row takes no fields.
export const checkClearRowsSchema = z.strictObject({}, { error: 'Send an empty object: {}.' });

// Finishing: the outcome stamped on the revision and the engineer's overall note (it goes into the
// mail to the acoustician and the schedule's revision history).
export const finishReviewSchema = z.object({
  outcome: z.enum(REVIEW_OUTCOMES, { error: 'outcome must be accepted, accepted_with_notes, revise_resubmit or rejected' }),
  note: text({ error: 'note must be text' }).trim().max(4000, 'Keep the note under 4000 characters.').optional().default(''),
});
export type FinishReviewInput = z.input<typeof finishReviewSchema>;
