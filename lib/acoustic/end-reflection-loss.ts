// End reflection loss of a duct outlet into a room.
import { speedOfSound } from './air';
import { DEFAULT_TEMPERATURE_C, END_REFLECTION_LOSS_A1_FLUSH, END_REFLECTION_LOSS_A1_FREE, END_REFLECTION_LOSS_A2 } from './constants';
import { inputError, requireAbove } from './input-error';
import type { Mounting } from './types';

/** ERL in dB per band for an outlet of diameter diameterM, flush with a wall or in free space. */
export function endReflectionLoss(diameterM: number, mounting: Mounting, bandsHz: number[], temperatureC = DEFAULT_TEMPERATURE_C): number[] {
  requireAbove(diameterM, 0, 'diameterM');
  if (mounting !== 'flush' && mounting !== 'free') throw inputError('mounting', "must be 'flush' or 'free'");
  if (!Array.isArray(bandsHz)) throw inputError('bandsHz', 'must be an array');
  const speedMps = speedOfSound(temperatureC);
  const shapeCoefficient = mounting === 'flush' ? END_REFLECTION_LOSS_A1_FLUSH : END_REFLECTION_LOSS_A1_FREE;
  return bandsHz.map((hz, index) => {
    requireAbove(hz, 0, `bandsHz[${index}]`);
    // ASHRAE RP-1314 (2007), from memory: ERL = 10 log10[1 + (a1 c / (pi f D))^a2]
    return 10 * Math.log10(1 + Math.pow((shapeCoefficient * speedMps) / (Math.PI * hz * diameterM), END_REFLECTION_LOSS_A2));
  });
}
