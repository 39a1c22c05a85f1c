// A closed end faced with absorbent.
import type { Complex } from '../complex';

/** Real reflection coefficient of an end of given energy absorption coefficient. */
export function linedReflection(absorption: number): Complex {
  // Kinsler & Frey, Fundamentals of Acoustics, ch. 6: alpha = 1 - |R|^2, so |R| = sqrt(1 - alpha), phase 0 (engine contract)
  return { re: Math.sqrt(1 - absorption), im: 0 };
}
