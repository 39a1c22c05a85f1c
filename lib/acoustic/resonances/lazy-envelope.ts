// A resonance's pressureEnvelope is computed when first read (JSON.stringify, spread and property
// access all read it) and kept: a run of a hundred resonances would otherwise build tens of thousands
// of sample objects that most callers never look at.
import type { NetworkEvaluator } from '../network/evaluator';
import type { PressureEnvelopePoint, Resonance } from '../types';
import { modeShape } from './mode-shape';
import { EnvelopeSampler } from './pressure-envelope';

export function attachLazyEnvelope(resonance: Resonance, evaluator: NetworkEvaluator): Resonance {
  let cached: PressureEnvelopePoint[] | undefined;
  Object.defineProperty(resonance, 'pressureEnvelope', {
    enumerable: true,
    configurable: true,
    get(): PressureEnvelopePoint[] {
      cached ??= modeShape(evaluator, resonance.frequencyHz, new EnvelopeSampler()).pressureEnvelope ?? [];
      return cached;
    },
    set(value: PressureEnvelopePoint[]) {
      cached = value;
    },
  });
  return resonance;
}
