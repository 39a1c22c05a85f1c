import { z } from 'zod';
import { text } from '@/lib/text';

// Shared by the project form and its route.
export const projectInputSchema = z.object({
  name: text({ error: 'Give the project a name.' }).trim().min(1, 'Give the project a name.').max(160, 'Keep the name under 160 characters.'),
  site: text({ error: 'The site must be text.' }).trim().max(240, 'Keep the site under 240 characters.').default(''),
});
export type ProjectInput = z.input<typeof projectInputSchema>;

// A change carries the version it was made from: a change based on an older copy of the project
// (someone renamed or archived it meanwhile) is refused with 409, never applied over theirs.
export const projectUpdateSchema = z
  .object({
    version: z.number({ error: 'version must be the project version the change is based on' }).int().min(1).max(2_147_483_647),
    name: projectInputSchema.shape.name.optional(),
    site: text({ error: 'The site must be text.' }).trim().max(240, 'Keep the site under 240 characters.').optional(),
    archived: z.boolean({ error: 'archived must be true or false' }).optional(),
  })
  .refine((value) => [value.name, value.site, value.archived].some((field) => field !== undefined), 'Send at least one of name, site, archived.');
export type ProjectUpdate = z.infer<typeof projectUpdateSchema>;
