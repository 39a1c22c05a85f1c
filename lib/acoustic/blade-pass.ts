// Blade-pass frequency of a fan and its harmonics.
import { requireAbove } from './input-error';

/** Blade-pass frequency and its harmonics, Hz: n * blades * rpm / 60 (common practice, no source). */
export function bladePassHz(bladeCount: number, rpm: number, harmonic = 1): number {
  requireAbove(bladeCount, 0, 'bladeCount');
  requireAbove(rpm, 0, 'rpm');
  requireAbove(harmonic, 0, 'harmonic');
  return (harmonic * bladeCount * rpm) / 60;
}

/** The first harmonicCount blade-pass harmonics, Hz (n = 1, 2, ...). */
export function bladePassHarmonicsHz(bladeCount: number, rpm: number, harmonicCount: number): number[] {
  requireAbove(harmonicCount, 0, 'harmonicCount');
  return Array.from({ length: Math.floor(harmonicCount) }, (_, index) => bladePassHz(bladeCount, rpm, index + 1));
}
