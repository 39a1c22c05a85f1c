// Blade-pass frequency of a fan.
import { requireAbove } from './input-error';

/** Blade-pass frequency and its harmonics, Hz: n * blades * rpm / 60 (common practice, no source). */
export function bladePassHz(bladeCount: number, rpm: number, harmonic = 1): number {
  requireAbove(bladeCount, 0, 'bladeCount');
  requireAbove(rpm, 0, 'rpm');
  requireAbove(harmonic, 0, 'harmonic');
  return (harmonic * bladeCount * rpm) / 60;
}
