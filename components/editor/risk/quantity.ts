// A flagged quantity in words: what the run adds at the tone, the resonance and the interval the tone sweeps, or a band level.
import type { FlaggedQuantity } from '@/lib/acoustic';

/** A signed figure with a true minus sign: "+3.2", "−1.4". */
export function formatSigned(value: number, digits = 1): string {
  const text = Math.abs(value).toFixed(digits);
  return value < 0 && Number(text) !== 0 ? `−${text}` : `+${text}`;
}

export function formatQuantity(quantity: FlaggedQuantity): string {
  if (quantity.levelDb !== undefined) {
    return `${quantity.levelDb.toFixed(1)} dB${quantity.criterionDb !== undefined ? ` (criterion ${quantity.criterionDb.toFixed(1)} dB)` : ''}`;
  }
  const parts: string[] = [];
  if (quantity.gainDb !== undefined) parts.push(`${formatSigned(quantity.gainDb)} dB at the tone`);
  if (quantity.valueHz !== undefined) parts.push(`resonance ${quantity.valueHz.toFixed(1)} Hz`);
  if (quantity.envelopeHz !== undefined) parts.push(`sweeps ${quantity.envelopeHz[0].toFixed(1)}–${quantity.envelopeHz[1].toFixed(1)} Hz`);
  return parts.join(', ');
}
