// The speed of sound shown in the person's units. 1 ft = 0.3048 m exactly (NIST SP 811, appendix B).
import type { UnitSystem } from './length';

const METRES_PER_FOOT = 0.3048;

/** "343.2 m/s" in SI, "1126.0 ft/s" in imperial. */
export function formatSpeed(speedMps: number, system: UnitSystem): string {
  if (!Number.isFinite(speedMps)) return '—';
  return system === 'si' ? `${speedMps.toFixed(1)} m/s` : `${(speedMps / METRES_PER_FOOT).toFixed(1)} ft/s`;
}
