// A-weighted level from octave-band levels 63 Hz to 8 kHz.
import { A_WEIGHTING_OCTAVE_DB, OCTAVE_BANDS_HZ } from '../constants';
import { inputError, requireFinite } from '../input-error';

/** L_A = 10 log10(sum 10^((L_i + A_i)/10)), A_i from IEC 61672-1 (2013), Table 3, dB(A). */
export function aWeightedLevelDb(octaveDb: number[]): number {
  if (!Array.isArray(octaveDb) || octaveDb.length !== OCTAVE_BANDS_HZ.length) throw inputError('octaveDb', `must have ${OCTAVE_BANDS_HZ.length} bands`);
  const energy = octaveDb.reduce((sum, levelDb, band) => sum + 10 ** ((requireFinite(levelDb, `octaveDb[${band}]`) + A_WEIGHTING_OCTAVE_DB[band]) / 10), 0);
  return 10 * Math.log10(energy);
}
