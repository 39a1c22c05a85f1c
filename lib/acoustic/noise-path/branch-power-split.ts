// Share of the sound power that goes down one branch at a junction.
import { fieldPath, inputError, requireAbove } from '../input-error';

/**
 * dB lost to the other branches: the power divides in proportion to the cross-sections leaving the
 * junction, branchAreaM2 of totalAreaM2. Refuses a branch larger than the total.
 */
export function branchPowerSplitDb(branchAreaM2: number, totalAreaM2: number, path = ''): number {
  const field = (name: string) => fieldPath(path, name);
  requireAbove(branchAreaM2, 0, field('branchAreaM2'));
  requireAbove(totalAreaM2, 0, field('totalAreaM2'));
  if (branchAreaM2 > totalAreaM2) throw inputError(field('branchAreaM2'), 'must be <= totalAreaM2');
  // ASHRAE Handbook, HVAC Applications, noise and vibration chapter: branch power division 10 log(A_total / A_branch)
  return 10 * Math.log10(totalAreaM2 / branchAreaM2);
}
