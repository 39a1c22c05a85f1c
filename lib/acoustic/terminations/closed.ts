// Rigid (closed) end.
import type { Complex } from '../complex';

/** Pressure reflection coefficient of a rigid end: R = +1 (Kinsler & Frey, Fundamentals of Acoustics, ch. 10). */
export function closedReflection(): Complex {
  return { re: 1, im: 0 };
}
