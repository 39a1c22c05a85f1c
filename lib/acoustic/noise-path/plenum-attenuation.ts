// Attenuation of a lined plenum chamber between its inlet and one outlet.
import { DIRECTIVITY_PER_REFLECTING_PLANE } from '../constants';
import { fieldPath, inputError, requireAbove, requireBetween } from '../input-error';

export interface PlenumInput {
  outletAreaM2: number;
  /** Inner surface of the plenum, m². */
  surfaceAreaM2: number;
  /** Mean absorption coefficient of that surface, > 0 and <= 1. */
  absorption: number;
  /** Inlet to outlet, m. */
  distanceM: number;
  /** Between the inlet's axis and the line to the outlet, 0..90°. */
  angleDeg: number;
  /** Directivity of the inlet, default 2 (an inlet in a wall). */
  directivity?: number;
}

/**
 * dB: Wells' direct plus reverberant field at the outlet. It can come out below 0 dB for a small, hard
 * plenum with a large outlet, outside what the formula was meant for; the noise path then credits 0 dB.
 */
export function plenumAttenuationDb(p: PlenumInput, path = ''): number {
  const field = (name: string) => fieldPath(path, name);
  if (typeof p !== 'object' || p === null) throw inputError(path || 'p', 'must be an object');
  const outletAreaM2 = requireAbove(p.outletAreaM2, 0, field('outletAreaM2'));
  const surfaceAreaM2 = requireAbove(p.surfaceAreaM2, 0, field('surfaceAreaM2'));
  const absorption = requireAbove(p.absorption, 0, field('absorption'));
  requireBetween(absorption, 0, 1, field('absorption'));
  const distanceM = requireAbove(p.distanceM, 0, field('distanceM'));
  const angleRad = (requireBetween(p.angleDeg, 0, 90, field('angleDeg')) * Math.PI) / 180;
  const directivity = p.directivity === undefined ? DIRECTIVITY_PER_REFLECTING_PLANE : requireAbove(p.directivity, 0, field('directivity'));
  // Wells (1958), Noise Control 4: TL = -10 log10[S_out (Q cos θ / (4π r²) + (1 - α)/(S α))]
  const direct = (directivity * Math.cos(angleRad)) / (4 * Math.PI * distanceM * distanceM);
  const reverberant = (1 - absorption) / (surfaceAreaM2 * absorption);
  return -10 * Math.log10(outletAreaM2 * (direct + reverberant));
}
