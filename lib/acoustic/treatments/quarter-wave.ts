// Tuning length of a closed quarter-wave side-branch resonator: L = c / (4 f) - delta, delta the end
// correction of its open mouth (Kinsler & Frey, Fundamentals of Acoustics, ch. 10; Munjal, Acoustics of
// Ducts and Mufflers, ch. 3). The mouth opens on the duct wall, taken as flanged: delta = 0.8216 a
// (Norris & Sheng 1989); the choice of the flanged value is ours.
import { FLANGED_END_CORRECTION_PER_RADIUS } from '../constants';
import { requireAbove } from '../input-error';

export function quarterWaveLengthM(tuneHz: number, speedOfSoundMps: number, radiusM: number): number {
  requireAbove(tuneHz, 0, 'tuneHz');
  requireAbove(speedOfSoundMps, 0, 'speedOfSoundMps');
  requireAbove(radiusM, 0, 'radiusM');
  // Kinsler & Frey, ch. 10: closed-open tube, f1 = c / 4(L + delta)
  return speedOfSoundMps / (4 * tuneHz) - FLANGED_END_CORRECTION_PER_RADIUS * radiusM;
}
