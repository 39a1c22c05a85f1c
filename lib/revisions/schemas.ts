import { z } from 'zod';
import { text } from '@/lib/text';

// Shared by the submit form and its route.
export const submitRevisionSchema = z.object({
  note: text({ error: 'note must be text' }).trim().max(2000, 'Keep the note under 2000 characters.').optional().default(''),
});
export type SubmitRevisionInput = z.input<typeof submitRevisionSchema>;
