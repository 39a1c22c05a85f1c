// Attenuation along a duct lined with absorbent.
import { DB_PER_NEPER, SABINE_LINED_DUCT_ABSORPTION_EXPONENT, SABINE_LINED_DUCT_COEFFICIENT_DB } from './constants';

/**
 * Sabine's lined-duct attenuation, dB per metre, frequency-independent (the lining's absorption
 * coefficient carries the frequency dependence; the formula is meant for mid frequencies,
 * roughly 250 Hz to 2 kHz, and overstates the effect at low frequency).
 */
export function sabineLinedDuctDbPerM(absorption: number, perimeterM: number, areaM2: number): number {
  // Sabine (1940), J. Acoust. Soc. Am. 12, 53: 1.05 alpha^1.4 P/S dB/m (12.6 alpha^1.4 P/S dB/ft, P/S in 1/in) — from memory
  return SABINE_LINED_DUCT_COEFFICIENT_DB * Math.pow(absorption, SABINE_LINED_DUCT_ABSORPTION_EXPONENT) * (perimeterM / areaM2);
}

/** The same attenuation in nepers per metre (amplitude). */
export function sabineLinedDuctNpPerM(absorption: number, perimeterM: number, areaM2: number): number {
  return sabineLinedDuctDbPerM(absorption, perimeterM, areaM2) / DB_PER_NEPER;
}
