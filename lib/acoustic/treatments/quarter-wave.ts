// Tuning length of a closed quarter-wave side-branch resonator. Its closed tube presents
// Z = -j Zc cot kL at the mouth (Kinsler & Frey, Fundamentals of Acoustics, ch. 10), in series with
// the mouth's mass j omega rho t_i / S = j Zc k t_i, t_i the inner length correction of the mouth on
// the host duct's wall (tee-junction.ts), the same mass the engine puts at every tee. The branch
// shorts the duct where the sum vanishes: cot kL = k t_i, so L = (pi/2 - atan(k t_i)) / k,
// which is c / 4f - t_i to first order in k t_i (Munjal, Acoustics of Ducts and Mufflers, ch. 3).
import { requireAbove } from '../input-error';
import { branchMouthCorrectionM } from '../tee-junction';

export function quarterWaveLengthM(tuneHz: number, speedOfSoundMps: number, radiusM: number, hostRadiusM: number): number {
  requireAbove(tuneHz, 0, 'tuneHz');
  requireAbove(speedOfSoundMps, 0, 'speedOfSoundMps');
  requireAbove(radiusM, 0, 'radiusM');
  requireAbove(hostRadiusM, 0, 'hostRadiusM');
  const wavenumber = (2 * Math.PI * tuneHz) / speedOfSoundMps;
  // cot kL = k t_i
  return (Math.PI / 2 - Math.atan(wavenumber * branchMouthCorrectionM(radiusM, hostRadiusM))) / wavenumber;
}
