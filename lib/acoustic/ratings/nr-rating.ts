// Noise rating (NR) of an octave-band spectrum.
import { inputError, requireFinite } from '../input-error';
import { NR_COEFFICIENTS } from './nr-curves';

/**
 * The NR value of levels in the bands 63 Hz to 8 kHz: the highest curve any band reaches, max over
 * bands of (L - a) / b, not rounded. Outside the charted curves the same straight lines are used as
 * they stand, so a very quiet spectrum gets a negative NR.
 */
export function nrRating(octaveDb: number[]): number {
  if (!Array.isArray(octaveDb) || octaveDb.length !== NR_COEFFICIENTS.length) {
    throw inputError('octaveDb', `must have ${NR_COEFFICIENTS.length} bands`);
  }
  // ISO R 1996 (1971): L_band = a + b·NR, so the band's rating is (L - a) / b
  return Math.max(
    ...octaveDb.map((levelDb, band) => (requireFinite(levelDb, `octaveDb[${band}]`) - NR_COEFFICIENTS[band].a) / NR_COEFFICIENTS[band].b),
  );
}
