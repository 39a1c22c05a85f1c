// Words and numbers shared by the flags: a resonance described, frequencies formatted.
import type { Resonance } from '../types';

export const PERCENT = 100;

export const formatHz = (hz: number): string => `${hz.toFixed(1)} Hz`;

export function describeResonance(resonance: Resonance): string {
  const width = resonance.q === null || resonance.bandwidthHz === null ? 'undamped' : `Q ${resonance.q.toFixed(0)}, bandwidth ${formatHz(resonance.bandwidthHz)}`;
  return `Resonance ${resonance.order} at ${formatHz(resonance.frequencyHz)} (${width})`;
}
