import { z } from 'zod';
import { text } from '@/lib/text';
import { metresPerPixelSchema, planDocumentSchema } from '@/lib/plan/schema';

// Shared by the plan forms and their routes.
export const planNameSchema = text({ error: 'Give the plan a name.' }).trim().min(1, 'Give the plan a name.').max(160, 'Keep the name under 160 characters.');

export const newPlanSchema = z.object({ name: planNameSchema });
export type NewPlanInput = z.input<typeof newPlanSchema>;

// A rename or archive carries the details version it was made from (409 when someone changed them since).
export const planMetaSchema = z
  .object({
    detailsVersion: z.number({ error: 'detailsVersion must be the version of the plan’s name and archive state the change is based on' }).int().min(1).max(2_147_483_647),
    name: planNameSchema.optional(),
    archived: z.boolean({ error: 'archived must be true or false' }).optional(),
  })
  .refine((value) => value.name !== undefined || value.archived !== undefined, 'Send a name or archived.');

export const savePlanSchema = z.object({
  version: z.number({ error: 'version must be the plan version you loaded' }).int().positive(),
  metresPerPixel: metresPerPixelSchema,
  document: planDocumentSchema,
});
export type SavePlanInput = z.infer<typeof savePlanSchema>;

// The flag whose treatments to evaluate: a room's (roomId) or a run's that feeds no room (runId).
export const evaluateTreatmentsSchema = z
  .object({
    roomId: text({ error: 'roomId must be text' }).min(1).max(40).nullable().optional(),
    runId: text({ error: 'runId must be text' }).min(1).max(40).nullable().optional(),
    flagId: text({ error: 'flagId must be the id of a flag in the risk list' }).min(1, 'flagId must not be empty').max(400),
  })
  .refine((value) => Boolean(value.roomId) || Boolean(value.runId), { message: 'Send the roomId or the runId of the flag.', path: ['roomId'] });
export type EvaluateTreatmentsInput = z.infer<typeof evaluateTreatmentsSchema>;

// Undoing a drawing upload: back to the drawing the plan had before (an earlier upload of the team), or none.
export const planBackgroundSchema = z.object({
  uploadId: text({ error: 'uploadId must be the id of an earlier drawing, or null' }).min(1).max(40).nullable(),
});
