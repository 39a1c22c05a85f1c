// The resonances of an engine answer as plain data, each carrying its pressure envelope only when it
// was asked for (envelope-request.ts). The engine computes an envelope when it is first read
// (lib/acoustic/resonances/lazy-envelope.ts), so the ones not asked for are never computed, nor sent
// between threads. Runs in the compute worker, right after the engine.
import type { PressureEnvelopePoint, Resonance, RunAnalysis } from '@/lib/acoustic';
import { AppError } from '@/lib/errors';
import { wantsEnvelope, type EnvelopeRequest } from './envelope-request';

/**
 * Envelope samples one answer may carry (product rule): about 20 MB of JSON. The envelopes of every
 * resonance of a long run up to a high maxHz come to more (each has 8 samples per half wavelength).
 */
export const MAX_ENVELOPE_SAMPLES_PER_ANSWER = 500_000;

/** Counts the samples of the envelopes put into one answer. */
export class EnvelopeBudget {
  private used = 0;

  take(points: PressureEnvelopePoint[]): PressureEnvelopePoint[] {
    this.used += points.length;
    if (this.used > MAX_ENVELOPE_SAMPLES_PER_ANSWER) {
      throw new AppError(
        'too_much_work',
        `The pressure envelopes asked for come to more than ${MAX_ENVELOPE_SAMPLES_PER_ANSWER.toLocaleString('en')} samples, more than one answer carries. ` +
          'Ask for the orders you will draw (envelopes=3,4,10), or reduce the frequency range (maxHz).',
        { field: 'envelopes' },
      );
    }
    return points;
  }
}

/** The resonance's own fields but its envelope, without reading the envelope (reading it computes it). */
export function withoutEnvelope(resonance: Resonance): Resonance {
  const plain: Record<string, unknown> = {};
  for (const key of Object.keys(resonance)) if (key !== 'pressureEnvelope') plain[key] = resonance[key as keyof Resonance];
  return plain as unknown as Resonance;
}

export function withEnvelopesAsked(analysis: RunAnalysis, request: EnvelopeRequest, budget = new EnvelopeBudget()): RunAnalysis {
  const resonances = analysis.resonances.map((resonance) => {
    const plain = withoutEnvelope(resonance);
    if (wantsEnvelope(request, resonance.order)) plain.pressureEnvelope = budget.take(resonance.pressureEnvelope ?? []);
    return plain;
  });
  return { ...analysis, resonances };
}
