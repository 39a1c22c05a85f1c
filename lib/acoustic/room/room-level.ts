// Sound pressure level in a room from a source's sound power: the room equation
// Lp = Lw + 10 log10(Q / (4 pi r^2) + 4 / R) (Long, Architectural Acoustics, 2nd ed., ch. 8; Beranek).
import { inputError, requireAbove } from '../input-error';

/** Lp - Lw, dB, at distance distanceM from a source of directivity factor q in a room of constant roomConstantM2. */
export function roomEquationDb(q: number, distanceM: number, roomConstantM2: number): number {
  requireAbove(q, 0, 'q');
  requireAbove(distanceM, 0, 'distanceM');
  // R is infinite in a fully absorbing room (free field): 4/R = 0
  if (!(roomConstantM2 > 0)) throw inputError('roomConstantM2', 'must be > 0');
  // Long, Architectural Acoustics, ch. 8: Lp = Lw + 10 log(Q / 4 pi r^2 + 4 / R)
  return 10 * Math.log10(q / (4 * Math.PI * distanceM * distanceM) + 4 / roomConstantM2);
}

/** First notch of the comb filter from one reflection with path difference pathDifferenceM: f = c / (2 delta d), Hz (Kuttruff, Room Acoustics, ch. 1: interference of two coherent arrivals). */
export function firstCombNotchHz(pathDifferenceM: number, speedOfSoundMps: number): number {
  requireAbove(pathDifferenceM, 0, 'pathDifferenceM');
  return speedOfSoundMps / (2 * pathDifferenceM);
}
