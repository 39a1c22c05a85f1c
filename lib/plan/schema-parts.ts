// The document schema's building blocks (sections, linings, terminations, fan, limits), shared by rooms and runs.
// Physical limits come from the engine's (lib/acoustic/input-limits.ts), so a document that saves is one it analyses.
import { z } from 'zod';
import { text } from '@/lib/text';
import {
  MAX_AIR_TEMPERATURE_C, MAX_FAN_BLADES, MAX_FAN_RPM, MAX_LINING_THICKNESS_M, MAX_ROOM_HEIGHT_M, MAX_SECTION_DIMENSION_M,
  MAX_SEGMENT_LENGTH_M, MIN_AIR_TEMPERATURE_C,
} from '@/lib/acoustic';
import { limited } from './saved-limits';

export { readSavedDocument } from './saved-limits';
export { MAX_ROOM_SIDE_M, MAX_SEGMENT_LENGTH_M } from '@/lib/acoustic';

export const MAX_ID_LENGTH = 40;
export const MAX_ITEMS = 5000;
export const MIN_SECTION_M = 0.01;
export const MIN_TEMPERATURE_C = MIN_AIR_TEMPERATURE_C;
export const MAX_TEMPERATURE_C = MAX_AIR_TEMPERATURE_C;

/**
 * Per plan (one drawing, usually one floor), where every run and room is analysed on each view:
 * 200 runs and 200 rooms are far more than one floor's air handlers, fan-coil units and quiet rooms;
 * 3000 segments hold them with their branches (the editor's drag benchmark uses a thousand).
 */
export const MAX_PLAN_RUNS = 200;
export const MAX_PLAN_ROOMS = 200;
export const MAX_PLAN_SEGMENTS = 3000;
/** Every run is a tree: one node more than its segments. */
export const MAX_PLAN_NODES = MAX_PLAN_SEGMENTS + MAX_PLAN_RUNS;

/**
 * Plan coordinates, px from the plan's origin: 100 000 px is more than ten times the widest stored
 * drawing (MAX_STORED_SIDE_PX in lib/uploads) and 25 times the blank grid.
 */
export const MAX_PLAN_COORDINATE_PX = 100000;

/**
 * Scale, metres per plan pixel. Above 1 m a pixel is wider than any duct, so no duct plan is drawn
 * that coarse (a 4000 px drawing would cover 4 km); below 0.1 mm a 4000 px drawing would be 0.4 m wide.
 */
export const MIN_METRES_PER_PIXEL = 0.0001;
export const MAX_METRES_PER_PIXEL = 1;

export const idSchema = text({ error: 'must be an id (text)' })
  .min(1, 'must not be empty')
  .max(MAX_ID_LENGTH, `must be at most ${MAX_ID_LENGTH} characters`);

export const finite = (what: string) => z.number({ error: `${what} must be a finite number` });

const sectionSizeM = finite('a section size')
  .min(MIN_SECTION_M, `must be at least ${MIN_SECTION_M} m (10 mm)`)
  .max(MAX_SECTION_DIMENSION_M, `must be at most ${MAX_SECTION_DIMENSION_M} m`);

export const sectionSchema = z.discriminatedUnion(
  'shape',
  [
    z.object({ shape: z.literal('round'), diameterM: sectionSizeM }),
    z.object({ shape: z.literal('rect'), widthM: sectionSizeM, heightM: sectionSizeM }),
  ],
  { error: "shape must be 'round' or 'rect'" },
);

const absorptionSchema = finite('absorption').min(0, 'must be between 0 and 1').max(1, 'must be between 0 and 1');

/** A positive quantity with an upper limit, e.g. `positiveAtMost('tuning', 20000, 'Hz')`. */
export const positiveAtMost = (what: string, most: number, unit: string) =>
  limited(finite(what).gt(0, `must be more than 0 ${unit}`), (value) => value <= most, `must be at most ${most} ${unit}`);

export const liningThicknessMSchema = positiveAtMost('lining thickness', MAX_LINING_THICKNESS_M, 'm');

/** Without absorption, fibrous liner of that thickness absorbs by band. */
export const liningSchema = z.object({ thicknessM: liningThicknessMSchema, absorption: absorptionSchema.optional() });

/** A measured wall's attenuation may not exceed this, dB/m (a lined duct's Sabine figure for a 100 mm duct is about 40; product rule). */
export const MAX_WALL_DB_PER_M = 50;

export const wallSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('rigid') }),
    z.object({ kind: z.literal('sheet-metal') }),
    z.object({
      kind: z.literal('measured'),
      attenuationDbPerM: z
        .array(finite('attenuation').min(0, 'must be at least 0 dB/m').max(MAX_WALL_DB_PER_M, `must be at most ${MAX_WALL_DB_PER_M} dB/m`))
        .length(8, 'give eight octave bands, 63 Hz to 8 kHz'),
    }),
  ],
  { error: "kind must be 'rigid', 'sheet-metal' or 'measured'" },
);

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
  blades: z.number().int('must be a whole number').min(1, 'must be at least 1').max(MAX_FAN_BLADES, `must be at most ${MAX_FAN_BLADES}`),
  rpm: positiveAtMost('speed', MAX_FAN_RPM, 'rpm'),
  minRpm: positiveAtMost('lowest speed', MAX_FAN_RPM, 'rpm').nullable().optional(),
  maxRpm: positiveAtMost('highest speed', MAX_FAN_RPM, 'rpm').nullable().optional(),
}).superRefine((fan, context) => {
  if (fan.minRpm != null && fan.maxRpm != null && fan.minRpm > fan.maxRpm) {
    context.addIssue({ code: 'custom', path: ['maxRpm'], message: `must be at least the lowest speed (${fan.minRpm} rpm)` });
  }
});

/** A length typed for one segment (an override, a treatment's length). */
export const lengthOverrideMSchema = positiveAtMost('length', MAX_SEGMENT_LENGTH_M, 'm');

/** A change of one segment's length, m, either way. */
export const lengthChangeMSchema = limited(finite('length change'), (deltaM) => Math.abs(deltaM) <= MAX_SEGMENT_LENGTH_M, `must be within ±${MAX_SEGMENT_LENGTH_M} m`);

/** A plan coordinate, px; `axis` names it in the message for a value that is not a number ('x', 'y'). */
export const planCoordinateSchema = (axis: string) =>
  limited(finite(axis), (px) => Math.abs(px) <= MAX_PLAN_COORDINATE_PX, `must be within ${MAX_PLAN_COORDINATE_PX} px of the plan's origin`);

export const metresPerPixelSchema = z
  .number({ error: 'must be a number' })
  .min(MIN_METRES_PER_PIXEL, `must be at least ${MIN_METRES_PER_PIXEL} (0.1 mm per pixel); set the scale again`)
  .max(MAX_METRES_PER_PIXEL, `must be at most ${MAX_METRES_PER_PIXEL} (1 m per pixel); set the scale again`);

/** A room's height (its length and width are checked by roomSideMSchema). */
export const withinRoomHeight = <T extends z.ZodType<number>>(schema: T): T =>
  limited(schema, (heightM) => heightM <= MAX_ROOM_HEIGHT_M, `must be at most ${MAX_ROOM_HEIGHT_M} m`);

/** A list of at most `most` things of a plan, e.g. `at most 200 runs`. */
export const planList = <T extends z.ZodType>(item: T, most: number, what: string) =>
  limited(z.array(item), (items) => items.length <= most, `at most ${most} ${what}`);

/** A segment's stable number within its run (the "3" of "A3"). */
export const segmentNumberSchema = z.number({ error: 'must be a whole number' }).int('must be a whole number').min(1, 'must be at least 1').max(MAX_ITEMS, `must be at most ${MAX_ITEMS}`);

/** A run's stable letter ("A", … "Z", "AA", …). */
export const runLetterSchema = z.string({ error: 'must be text' }).regex(/^[A-Z]{1,3}$/, 'must be one to three capital letters');
