// Sound pressure level in a furnished room from one outlet's sound power, by Schultz's empirical relation.
import {
  FOOT_M,
  SCHULTZ_CONSTANT_DB,
  SCHULTZ_DISTANCE_COEFFICIENT_DB,
  SCHULTZ_FREQUENCY_COEFFICIENT_DB,
  SCHULTZ_VOLUME_COEFFICIENT_DB,
} from '../constants';
import { fieldPath, requireAbove } from '../input-error';

/**
 * Lp - Lw, dB, at distanceM from the outlet in a room of volumeM3, in the band centred on bandHz. The
 * relation is stated in feet and cubic feet; the SI inputs are converted first. Meant for ordinary
 * furnished rooms (offices, meeting rooms), not for very dead or very live ones.
 */
export function schultzRoomCorrectionDb(volumeM3: number, distanceM: number, bandHz: number, path = ''): number {
  const field = (name: string) => fieldPath(path, name);
  const volumeFt3 = requireAbove(volumeM3, 0, field('volumeM3')) / FOOT_M ** 3;
  const distanceFt = requireAbove(distanceM, 0, field('distanceM')) / FOOT_M;
  const hz = requireAbove(bandHz, 0, 'bandHz');
  // Schultz (1985), ASHRAE Transactions 91(1): Lp - Lw = 25 - 10 log r - 5 log V - 3 log f, r in ft, V in ft³
  return (
    SCHULTZ_CONSTANT_DB -
    SCHULTZ_DISTANCE_COEFFICIENT_DB * Math.log10(distanceFt) -
    SCHULTZ_VOLUME_COEFFICIENT_DB * Math.log10(volumeFt3) -
    SCHULTZ_FREQUENCY_COEFFICIENT_DB * Math.log10(hz)
  );
}
