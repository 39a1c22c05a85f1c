// The document schema's building blocks (sections, linings, terminations, fan), shared by rooms and runs.
import { z } from 'zod';
import { text } from '@/lib/text';

export const MAX_ID_LENGTH = 40;
export const MAX_ITEMS = 5000;
export const MIN_SECTION_M = 0.01;
export const MIN_TEMPERATURE_C = -40;
export const MAX_TEMPERATURE_C = 60;

export const idSchema = text({ error: 'must be an id (text)' })
  .min(1, 'must not be empty')
  .max(MAX_ID_LENGTH, `must be at most ${MAX_ID_LENGTH} characters`);

export const finite = (what: string) => z.number({ error: `${what} must be a finite number` });

const sectionSizeM = finite('a section size').min(MIN_SECTION_M, `must be at least ${MIN_SECTION_M} m (10 mm)`).max(10, 'must be at most 10 m');

export const sectionSchema = z.discriminatedUnion(
  'shape',
  [
    z.object({ shape: z.literal('round'), diameterM: sectionSizeM }),
    z.object({ shape: z.literal('rect'), widthM: sectionSizeM, heightM: sectionSizeM }),
  ],
  { error: "shape must be 'round' or 'rect'" },
);

const absorptionSchema = finite('absorption').min(0, 'must be between 0 and 1').max(1, 'must be between 0 and 1');

export const liningSchema = z.object({
  thicknessM: finite('lining thickness').gt(0, 'must be more than 0 m').max(1, 'must be at most 1 m'),
  absorption: absorptionSchema,
});

export const terminationSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('closed') }),
    z.object({ kind: z.literal('open'), flange: z.enum(['flanged', 'unflanged'], { error: "must be 'flanged' or 'unflanged'" }) }),
    z.object({ kind: z.literal('lined'), absorption: absorptionSchema }),
    z.object({ kind: z.literal('anechoic') }),
  ],
  { error: "kind must be 'closed', 'open', 'lined' or 'anechoic'" },
);

export const temperatureCSchema = finite('temperature')
  .min(MIN_TEMPERATURE_C, `must be at least ${MIN_TEMPERATURE_C} °C`)
  .max(MAX_TEMPERATURE_C, `must be at most ${MAX_TEMPERATURE_C} °C`);

export const fanSchema = z.object({
  blades: z.number().int('must be a whole number').min(1, 'must be at least 1').max(100, 'must be at most 100'),
  rpm: finite('speed').gt(0, 'must be more than 0 rpm').max(100000, 'must be at most 100000 rpm'),
});

export const lengthOverrideMSchema = finite('length').gt(0, 'must be more than 0 m').max(100000, 'must be at most 100 km');
