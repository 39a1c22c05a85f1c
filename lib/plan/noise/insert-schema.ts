// zod schema of a silencer, other loss or plenum put into a segment by hand (part of the plan document schema).
import { z } from 'zod';
import { text } from '@/lib/text';
import { MAX_ROOM_SIDE_M, MAX_SECTION_DIMENSION_M } from '@/lib/acoustic';
import { finite } from '../schema-parts';

const OCTAVE_BANDS = 8;
/** Losses typed per band are from 0 dB up to this (a silencer's published insertion loss stays well below it). */
export const MAX_INSERT_LOSS_DB = 80;

const lossBands = z
  .array(finite('a loss').min(0, 'must be at least 0 dB (a loss, not a gain)').max(MAX_INSERT_LOSS_DB, `must be at most ${MAX_INSERT_LOSS_DB} dB`))
  .length(OCTAVE_BANDS, `needs ${OCTAVE_BANDS} octave bands, 63 Hz to 8 kHz`);
const label = text({ error: 'must be text' }).trim().min(1, 'give it a name').max(80, 'must be at most 80 characters');

/** A plenum is a box of room scale at most; its sides are bounded like a room's (product rule). */
const side = (what: string) => finite(what).gt(0, 'must be more than 0 m').max(MAX_ROOM_SIDE_M, `must be at most ${MAX_ROOM_SIDE_M} m`);

export const plenumBoxSchema = z.object({
  lengthM: side('a length'),
  widthM: side('a width'),
  heightM: side('a height'),
  outletAreaM2: finite('an area').gt(0, 'must be more than 0 m²').max(MAX_SECTION_DIMENSION_M ** 2, `must be at most ${MAX_SECTION_DIMENSION_M ** 2} m²`),
  offsetM: finite('an offset').min(0, 'must be at least 0 m').max(MAX_ROOM_SIDE_M, `must be at most ${MAX_ROOM_SIDE_M} m`),
  absorption: finite('absorption').gt(0, 'must be more than 0 (a bare box is no plenum attenuator)').max(1, 'must be at most 1'),
}).superRefine((box, context) => {
  const endWallM2 = box.widthM * box.heightM;
  if (box.outletAreaM2 >= endWallM2) context.addIssue({ code: 'custom', path: ['outletAreaM2'], message: `must be less than the end wall it is in (${endWallM2.toFixed(2)} m²)` });
  if (box.offsetM > Math.max(box.widthM, box.heightM)) context.addIssue({ code: 'custom', path: ['offsetM'], message: `must be within the box (at most ${Math.max(box.widthM, box.heightM)} m)` });
});

export const pathInsertSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('silencer'), label, insertionLossDb: lossBands }),
  z.object({ kind: z.literal('loss'), label, lossDb: lossBands }),
  z.object({ kind: z.literal('plenum'), label, plenum: plenumBoxSchema }),
], { error: "kind must be 'silencer', 'loss' or 'plenum'" });
