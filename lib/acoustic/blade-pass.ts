// Blade-pass frequency of a fan and its harmonics.
import { requireAbove, requireAboveAtMost } from './input-error';
import { MAX_FAN_BLADES, MAX_FAN_HARMONICS, MAX_FAN_RPM } from './input-limits';

/** Blade-pass frequency and its harmonics, Hz: n * blades * rpm / 60 (common practice, no source). */
export function bladePassHz(bladeCount: number, rpm: number, harmonic = 1): number {
  requireAboveAtMost(bladeCount, 0, MAX_FAN_BLADES, 'bladeCount');
  requireAboveAtMost(rpm, 0, MAX_FAN_RPM, 'rpm');
  requireAbove(harmonic, 0, 'harmonic');
  return (harmonic * bladeCount * rpm) / 60;
}

/** The first harmonicCount blade-pass harmonics, Hz (n = 1, 2, ...). */
export function bladePassHarmonicsHz(bladeCount: number, rpm: number, harmonicCount: number): number[] {
  requireAboveAtMost(harmonicCount, 0, MAX_FAN_HARMONICS, 'harmonicCount');
  return Array.from({ length: Math.floor(harmonicCount) }, (_, index) => bladePassHz(bladeCount, rpm, index + 1));
}
