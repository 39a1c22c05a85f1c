import { z } from 'zod';

// Shared by the submit form and its route.
export const submitRevisionSchema = z.object({
  note: z.string({ error: 'note must be text' }).trim().max(2000, 'Keep the note under 2000 characters.').optional().default(''),
});
export type SubmitRevisionInput = z.input<typeof submitRevisionSchema>;
