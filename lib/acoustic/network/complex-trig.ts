// cos z and sin z of a complex argument z = phase + j growth, without allocation:
// cos z = cos a cosh b - j sin a sinh b, sin z = sin a cosh b + j cos a sinh b (Abramowitz & Stegun 4.3.55-56).

/** Below this |growth| cosh and sinh come from their Taylor series (next terms below 1e-17 relative). */
export const SMALL_GROWTH = 0.05;

/** Writes [Re cos z, Im cos z, Re sin z, Im sin z] into out. */
export function complexCosSin(phase: number, growth: number, out: Float64Array): void {
  let coshGrowth: number;
  let sinhGrowth: number;
  if (growth < SMALL_GROWTH && growth > -SMALL_GROWTH) {
    const squared = growth * growth;
    coshGrowth = 1 + squared * (0.5 + squared * (1 / 24 + squared * (1 / 720 + squared / 40320)));
    sinhGrowth = growth * (1 + squared * (1 / 6 + squared * (1 / 120 + squared * (1 / 5040 + squared / 362880))));
  } else {
    const expGrowth = Math.exp(growth);
    coshGrowth = 0.5 * (expGrowth + 1 / expGrowth);
    sinhGrowth = coshGrowth - 1 / expGrowth;
  }
  const cosPhase = Math.cos(phase);
  const sinPhase = Math.sin(phase);
  out[0] = cosPhase * coshGrowth;
  out[1] = -sinPhase * sinhGrowth;
  out[2] = sinPhase * coshGrowth;
  out[3] = cosPhase * sinhGrowth;
}
