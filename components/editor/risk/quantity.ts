// A flagged quantity in words: what the run adds at the tone, the resonance and the interval the tone sweeps, or a band level.
import type { FlaggedQuantity, TreatmentEffect } from '@/lib/acoustic';
import { signedFixed } from '@/lib/signed-number';

/** A signed figure with a true minus sign: "+3.2", "−1.4". */
export function formatSigned(value: number, digits = 1): string {
  const text = Math.abs(value).toFixed(digits);
  return value < 0 && Number(text) !== 0 ? `−${text}` : `+${text}`;
}

export function formatQuantity(quantity: FlaggedQuantity): string {
  if (quantity.levelDb !== undefined) {
    return `${signedFixed(quantity.levelDb, 1)} dB${quantity.criterionDb !== undefined ? ` (criterion ${signedFixed(quantity.criterionDb, 1)} dB)` : ''}`;
  }
  const parts: string[] = [];
  if (quantity.gainDb !== undefined) parts.push(`the run adds ${formatSigned(quantity.gainDb)} dB`);
  if (quantity.valueHz !== undefined) parts.push(`resonance ${quantity.valueHz.toFixed(1)} Hz`);
  if (quantity.envelopeHz !== undefined) parts.push(`sweeps ${quantity.envelopeHz[0].toFixed(1)}–${quantity.envelopeHz[1].toFixed(1)} Hz`);
  return parts.join(', ');
}

const BAND_NAMES = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];

/** What a treatment does across the operating envelope, in words (empty when the engine reports nothing more). */
export function formatEffect(effect: TreatmentEffect | undefined): string {
  if (!effect) return '';
  const parts: string[] = [];
  if (effect.clearanceHz !== undefined) {
    const bandwidths = effect.clearanceBandwidths == null ? '' : ` (${formatSigned(effect.clearanceBandwidths)} bandwidths)`;
    parts.push(`clearance at the envelope's edges ${formatSigned(effect.clearanceHz)} Hz${bandwidths}`);
  }
  if (effect.insertionLossDb) parts.push(`insertion loss at the tone ${formatSigned(effect.insertionLossDb[0])} to ${formatSigned(effect.insertionLossDb[1])} dB across the envelope`);
  if (effect.sidePeakDb !== undefined && effect.sidePeakHz !== undefined) parts.push(`side peak ${formatSigned(effect.sidePeakDb)} dB at ${effect.sidePeakHz.toFixed(1)} Hz`);
  if (effect.bandLossDb) parts.push(`loss by band: ${effect.bandLossDb.map((lossDb, band) => `${BAND_NAMES[band]} ${signedFixed(lossDb, 1)}`).join(' · ')} dB`);
  return parts.join('; ');
}
