// Visco-thermal boundary-layer attenuation of plane waves in a rigid-walled duct.
import type { AirProperties } from './air';

/**
 * Kirchhoff attenuation coefficient divided by sqrt(frequency): alpha(f) = coefficient * sqrt(f) Np/m.
 * The complex wavenumber is then k = omega/c + alpha (1 - j) (time convention exp(+j omega t)):
 * the boundary layer both attenuates the wave and slows it by the same relative amount.
 */
export function kirchhoffAttenuationPerSqrtHz(perimeterM: number, areaM2: number, air: AirProperties): number {
  const kinematicViscosityM2S = air.dynamicViscosityPaS / air.densityKgM3;
  // Kirchhoff (1868), Ann. Phys. 134, 177; as in Kinsler & Frey, Fundamentals of Acoustics, ch. 9:
  // alpha = (P / 2S)(1/c) sqrt(omega nu / 2) [1 + (gamma - 1)/sqrt(Pr)]
  return (
    (perimeterM / (2 * areaM2)) *
    (1 / air.speedOfSoundMps) *
    Math.sqrt((2 * Math.PI * kinematicViscosityM2S) / 2) *
    (1 + (air.heatCapacityRatio - 1) / Math.sqrt(air.prandtlNumber))
  );
}

/** Kirchhoff attenuation at a real frequency, Np/m. */
export function kirchhoffAttenuationNpPerM(frequencyHz: number, perimeterM: number, areaM2: number, air: AirProperties): number {
  return kirchhoffAttenuationPerSqrtHz(perimeterM, areaM2, air) * Math.sqrt(frequencyHz);
}
