// zod schemas of rooms and chosen treatments, part of the one plan document schema.
import { z } from 'zod';
import { text } from '@/lib/text';
import { MAX_ANALYSIS_HZ, MAX_SECTION_DIMENSION_M, NC_CURVES, SURFACE_NAMES, type SurfaceName } from '@/lib/acoustic';
import {
  finite, idSchema as id, lengthChangeMSchema, lengthOverrideMSchema, liningSchema, liningThicknessMSchema, MAX_ROOM_SIDE_M, planCoordinateSchema, positiveAtMost,
  terminationSchema, withinRoomHeight,
} from '../schema-parts';

const OCTAVE_BAND_COUNT = 8;
export { MAX_ROOM_SIDE_M };
/** The published NC curves run from NC 15 to NC 70 (ANSI S12.2); ratings between them are interpolated. */
export const MIN_NC = NC_CURVES[0].rating;
export const MAX_NC = NC_CURVES[NC_CURVES.length - 1].rating;
const MAX_TEXT = 400;


export const roomSideMSchema = finite('a room dimension').gt(0, 'must be more than 0 m').max(MAX_ROOM_SIDE_M, `must be at most ${MAX_ROOM_SIDE_M} m`);
export const roomNameSchema = text({ error: 'must be text' }).trim().min(1, 'give the room a name').max(120, 'must be at most 120 characters');
export const criterionNcSchema = finite('NC').min(MIN_NC, `must be at least NC ${MIN_NC}, the lowest published curve`).max(MAX_NC, `must be at most NC ${MAX_NC}`);

const coordinateM = finite('a position').min(0, 'must be inside the room (at least 0 m)').max(MAX_ROOM_SIDE_M, `must be at most ${MAX_ROOM_SIDE_M} m`);
export const roomPointSchema = z.object({ xM: coordinateM, yM: coordinateM, zM: coordinateM });

export const absorptionBandsSchema = z
  .array(finite('absorption').min(0, 'must be between 0 and 1').max(1, 'must be between 0 and 1'))
  .length(OCTAVE_BAND_COUNT, `needs ${OCTAVE_BAND_COUNT} octave bands, 63 Hz to 8 kHz`);

const surfaceSchema = z.object({ finishId: id.nullable(), absorption: absorptionBandsSchema });

export const surfacesSchema = z.object(
  Object.fromEntries(SURFACE_NAMES.map((name) => [name, surfaceSchema])) as Record<SurfaceName, typeof surfaceSchema>,
);

export const soundPowerBandsSchema = z
  .array(finite('sound power').min(-20, 'must be at least -20 dB').max(160, 'must be at most 160 dB'))
  .length(OCTAVE_BAND_COUNT, `needs ${OCTAVE_BAND_COUNT} octave bands, 63 Hz to 8 kHz`);

/** At most this many further outlets and listeners in one room (product rule: a room's diffusers and seats worth checking). */
export const MAX_EXTRA_OUTLETS = 16;
export const MAX_EXTRA_LISTENERS = 16;
const listenerNameSchema = text({ error: 'must be text' }).trim().min(1, 'give the listener a name').max(40, 'must be at most 40 characters');

export const extraOutletSchema = roomPointSchema.extend({ id, nodeId: id.nullable() });
export const roomListenerSchema = roomPointSchema.extend({ id, name: listenerNameSchema });
export const roomCorrectionSchema = z.enum(['furnished', 'bare'], { error: "must be 'furnished' (Schultz) or 'bare' (the room equation)" });

/** A room as stored; positions inside the box are checked in the document's refinement. */
export const roomSchema = z.object({
  id,
  name: roomNameSchema,
  x: planCoordinateSchema('x'),
  y: planCoordinateSchema('y'),
  lengthM: roomSideMSchema,
  widthM: roomSideMSchema,
  heightM: withinRoomHeight(roomSideMSchema),
  surfaces: surfacesSchema,
  criterionNc: criterionNcSchema,
  outlet: roomPointSchema.extend({ nodeId: id.nullable() }),
  listener: roomPointSchema,
  outletSoundPowerDb: soundPowerBandsSchema.nullable(),
  extraOutlets: z.array(extraOutletSchema).max(MAX_EXTRA_OUTLETS, `at most ${MAX_EXTRA_OUTLETS} further outlets in one room`).optional(),
  extraListeners: z.array(roomListenerSchema).max(MAX_EXTRA_LISTENERS, `at most ${MAX_EXTRA_LISTENERS} further listeners in one room`).optional(),
  roomCorrection: roomCorrectionSchema.optional(),
});

const segmentIndex = z.number().int('must be a whole number').min(0, 'must be at least 0');

export const treatmentSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('line-segment'), segmentIndex, lengthM: lengthOverrideMSchema.optional(), thicknessM: liningThicknessMSchema, absorption: finite('absorption').min(0).max(1).optional() }),
  z.object({ kind: z.literal('change-termination'), end: z.enum(['start', 'end']), termination: terminationSchema }),
  z.object({ kind: z.literal('retune-length'), segmentIndex: segmentIndex.optional(), deltaLengthM: lengthChangeMSchema.optional() }),
  z.object({ kind: z.literal('side-branch-resonator'), segmentIndex: segmentIndex.optional(), tuneHz: positiveAtMost('tuning', MAX_ANALYSIS_HZ, 'Hz').optional(), diameterM: positiveAtMost('bore', MAX_SECTION_DIMENSION_M, 'm').optional(), lengthM: lengthOverrideMSchema.optional() }),
], { error: 'kind must be line-segment, change-termination, retune-length or side-branch-resonator' });

const quantitySchema = z.object({
  valueHz: finite('frequency').optional(),
  distanceHz: finite('distance').optional(),
  windowHz: finite('window').optional(),
  levelDb: finite('level').optional(),
  criterionDb: finite('criterion').optional(),
  gainDb: finite('gain').optional(),
  gainAtHz: finite('frequency').optional(),
  envelopeHz: z.tuple([finite('frequency'), finite('frequency')]).optional(),
});

export const planChangeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('length-override'), segmentId: id, lengthM: lengthOverrideMSchema }),
  z.object({ kind: z.literal('lining'), segmentId: id, lining: liningSchema }),
  z.object({ kind: z.literal('termination'), nodeId: id, termination: terminationSchema }),
]);

/** What the element held before a treatment changed it, so removing the treatment can put it back. */
export const planChangePreviousSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('length-override'), segmentId: id, lengthM: lengthOverrideMSchema.nullable() }),
  z.object({ kind: z.literal('lining'), segmentId: id, lining: liningSchema.nullable() }),
  z.object({ kind: z.literal('termination'), nodeId: id, termination: terminationSchema }),
]);

export const planTreatmentSchema = z.object({
  id,
  runId: id,
  roomId: id.nullable(),
  flagId: text().min(1).max(MAX_TEXT),
  flagKind: z.enum(['resonance-near-tone', 'resonance-near-room-mode', 'level-above-criterion']),
  flagSubject: text().min(1).max(MAX_TEXT),
  flagReason: text().max(2000),
  treatment: treatmentSchema,
  description: text().max(2000),
  before: quantitySchema,
  after: quantitySchema,
  clears: z.boolean(),
  planChange: planChangeSchema.nullable(),
  /** Set when the treatment was added (absent in lists saved before removal could revert). */
  previous: planChangePreviousSchema.nullable().optional(),
});
