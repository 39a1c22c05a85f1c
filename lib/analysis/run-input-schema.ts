// The body of POST /api/v1/analyze as a zod schema: the engine's RunInput (lib/acoustic/types.ts)
// with the field limits of lib/acoustic/input-limits.ts, for the API description. The route itself
// hands the body to the engine's validateRun (run-limits.ts), which also checks what a schema of
// single fields cannot: the run's total length and segment count, branch depth, and maxHz against
// the run's plane-wave cut-off. tests/unit/analysis/run-input-schema.test.ts keeps the two in step.
import { z } from 'zod';
import {
  MAX_AIR_TEMPERATURE_C, MAX_ANALYSIS_HZ, MAX_ECHOES, MAX_LINING_THICKNESS_M, MAX_RUN_SEGMENTS, MAX_SECTION_DIMENSION_M,
  MAX_SEGMENT_LENGTH_M, MIN_AIR_TEMPERATURE_C, MIN_SECTION_DIMENSION_M, OCTAVE_BANDS_HZ,
  type RunInput,
} from '@/lib/acoustic';

const dimensionM = (what: string) => z.number().min(MIN_SECTION_DIMENSION_M).max(MAX_SECTION_DIMENSION_M).describe(`${what}, m`);

const sectionSchema = z.discriminatedUnion('shape', [
  z.object({ shape: z.literal('round'), diameterM: dimensionM('Inside diameter') }),
  z.object({ shape: z.literal('rect'), widthM: dimensionM('Inside width'), heightM: dimensionM('Inside height') }),
]).describe('Free airway of the segment (inside any lining).');

const terminationSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('closed') }),
  z.object({ kind: z.literal('open'), flange: z.enum(['flanged', 'unflanged']) }),
  z.object({ kind: z.literal('lined'), absorption: z.number().min(0).max(1).describe('Energy absorption coefficient of the end, 0 to 1') }),
  z.object({ kind: z.literal('anechoic') }),
]).describe('How a run or branch ends.');

const wallSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('rigid') }),
  z.object({ kind: z.literal('sheet-metal') }),
  z.object({
    kind: z.literal('measured'),
    attenuationDbPerM: z.array(z.number().min(0)).length(OCTAVE_BANDS_HZ.length).describe(`dB per metre in the octave bands ${OCTAVE_BANDS_HZ.join(', ')} Hz`),
  }),
]).describe('The duct wall: rigid (air losses only), sheet metal (published octave-band attenuation) or measured.');

const liningSchema = z.object({
  thicknessM: z.number().positive().max(MAX_LINING_THICKNESS_M).describe('Liner thickness, m'),
  absorption: z.number().min(0).max(1).optional().describe('One absorption coefficient for every band; without it, fibrous liner of that thickness'),
}).describe('Lined inside; the section is then the free airway inside the lining.');

interface SegmentShape {
  lengthM: number;
  section: z.infer<typeof sectionSchema>;
  lining?: z.infer<typeof liningSchema>;
  wall?: z.infer<typeof wallSchema>;
  branches?: { segments: SegmentShape[]; end: z.infer<typeof terminationSchema> }[];
}

const segmentSchema: z.ZodType<SegmentShape> = z.lazy(() => z.object({
  lengthM: z.number().positive().max(MAX_SEGMENT_LENGTH_M).describe('Length along the duct axis, m'),
  section: sectionSchema,
  lining: liningSchema.optional(),
  wall: wallSchema.optional(),
  branches: z.array(z.object({ segments: z.array(segmentSchema).min(1), end: terminationSchema })).optional().describe('Tees at the segment\'s far end, each a branch run of its own'),
}));

export const runInputSchema = z.object({
  temperatureC: z.number().min(MIN_AIR_TEMPERATURE_C).max(MAX_AIR_TEMPERATURE_C).optional().describe('Air temperature in the duct, °C (default 20)'),
  segments: z.array(segmentSchema).min(1).max(MAX_RUN_SEGMENTS).describe('The main path from the start end, in order'),
  start: terminationSchema,
  end: terminationSchema,
  minHz: z.number().positive().max(MAX_ANALYSIS_HZ).optional().describe('Bottom of the frequency range, Hz'),
  maxHz: z.number().positive().max(MAX_ANALYSIS_HZ).optional().describe('Top of the frequency range, Hz (at most twice the run\'s plane-wave cut-off; default the cut-off or 2 kHz)'),
  walls: wallSchema.optional(),
  wallLosses: z.boolean().optional().describe('false: ideal walls that lose nothing at all (default true)'),
  maxEchoes: z.number().min(0).max(MAX_ECHOES).optional().describe('Echo chart: stop after this many arrivals (default 40)'),
  echoThreshold: z.number().min(1e-12).max(1).optional().describe('Echo chart: drop wavefronts weaker than this amplitude (default 0.001)'),
}).describe('One duct run: its segments from the start end, its two ends, and the analysis settings. SI units.');

// The schema describes exactly the engine's input type.
export type RunInputBody = z.infer<typeof runInputSchema>;
const sameShape: (body: RunInputBody) => RunInput = (body) => body;
void sameShape;
