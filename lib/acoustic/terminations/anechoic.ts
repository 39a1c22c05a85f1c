// Anechoic (reflection-free) end.
import type { Complex } from '../complex';

/** A termination matched to the duct's characteristic impedance reflects nothing: R = 0. */
export function anechoicReflection(): Complex {
  return { re: 0, im: 0 };
}
