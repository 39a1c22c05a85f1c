import { z } from 'zod';

// Shared by the project form and its route.
export const projectInputSchema = z.object({
  name: z.string({ error: 'Give the project a name.' }).trim().min(1, 'Give the project a name.').max(160, 'Keep the name under 160 characters.'),
  site: z.string({ error: 'The site must be text.' }).trim().max(240, 'Keep the site under 240 characters.').default(''),
});
export type ProjectInput = z.input<typeof projectInputSchema>;
