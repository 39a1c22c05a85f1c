// A fan's sound power at another speed than the one its data were measured at, by the fan laws: for the
// same fan at the same point of its curve, the sound power changes by 50 log10(n2 / n1) dB (ASHRAE
// Handbook, HVAC Applications, noise and vibration chapter, the fan laws; from memory). The octave
// spectrum is moved as a whole; the shift of the blade-pass tone between bands is left out.
import { requireAbove } from '../input-error';

/** Lw(n2) - Lw(n1), dB: 50 log10(n2 / n1). */
export function fanSpeedSoundPowerChangeDb(fromRpm: number, toRpm: number): number {
  requireAbove(fromRpm, 0, 'fromRpm');
  requireAbove(toRpm, 0, 'toRpm');
  // fan laws: Lw2 = Lw1 + 50 log10(n2 / n1)
  return 50 * Math.log10(toRpm / fromRpm);
}
