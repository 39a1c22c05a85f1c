// zod schema of a silencer or other loss put into a segment by hand (part of the plan document schema).
import { z } from 'zod';
import { text } from '@/lib/text';
import { finite } from '../schema-parts';

const OCTAVE_BANDS = 8;
/** Losses typed per band are from 0 dB up to this (a silencer's published insertion loss stays well below it). */
export const MAX_INSERT_LOSS_DB = 80;

const lossBands = z
  .array(finite('a loss').min(0, 'must be at least 0 dB (a loss, not a gain)').max(MAX_INSERT_LOSS_DB, `must be at most ${MAX_INSERT_LOSS_DB} dB`))
  .length(OCTAVE_BANDS, `needs ${OCTAVE_BANDS} octave bands, 63 Hz to 8 kHz`);
const label = text({ error: 'must be text' }).trim().min(1, 'give it a name').max(80, 'must be at most 80 characters');

export const pathInsertSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('silencer'), label, insertionLossDb: lossBands }),
  z.object({ kind: z.literal('loss'), label, lossDb: lossBands }),
], { error: "kind must be 'silencer' or 'loss'" });
