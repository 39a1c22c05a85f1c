// Coincidence of a duct resonance with a tone or a room mode: within the resonance's own half
// bandwidth (the tone lies inside its -3 dB band) or within a percentage of the target frequency.
import type { Resonance } from '../types';

export const PERCENT = 100;

export function coincidenceWindowHz(resonance: Resonance, targetHz: number, percent: number): number {
  return Math.max((resonance.bandwidthHz ?? 0) / 2, (percent / PERCENT) * targetHz);
}

/** The resonance nearest the target frequency, or null. */
export function nearestResonance(resonances: Resonance[], targetHz: number): Resonance | null {
  let nearest: Resonance | null = null;
  for (const resonance of resonances) {
    if (nearest === null || Math.abs(resonance.frequencyHz - targetHz) < Math.abs(nearest.frequencyHz - targetHz)) nearest = resonance;
  }
  return nearest;
}

export const formatHz = (hz: number): string => `${hz.toFixed(1)} Hz`;

export function describeResonance(resonance: Resonance): string {
  const width = resonance.q === null || resonance.bandwidthHz === null ? 'undamped' : `Q ${resonance.q.toFixed(0)}, bandwidth ${formatHz(resonance.bandwidthHz)}`;
  return `Resonance ${resonance.order} at ${formatHz(resonance.frequencyHz)} (${width})`;
}
