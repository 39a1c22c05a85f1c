// A flagged quantity in words: the resonance and how far it sits from its target, or a band level.
import type { FlaggedQuantity } from '@/lib/acoustic';

export function formatQuantity(quantity: FlaggedQuantity): string {
  if (quantity.levelDb !== undefined) {
    return `${quantity.levelDb.toFixed(1)} dB${quantity.criterionDb !== undefined ? ` (criterion ${quantity.criterionDb.toFixed(1)} dB)` : ''}`;
  }
  const parts: string[] = [];
  if (quantity.valueHz !== undefined) parts.push(`${quantity.valueHz.toFixed(1)} Hz`);
  if (quantity.distanceHz !== undefined) parts.push(`${quantity.distanceHz.toFixed(1)} Hz off`);
  if (quantity.windowHz !== undefined) parts.push(`window ${quantity.windowHz.toFixed(1)} Hz`);
  return parts.join(', ');
}
