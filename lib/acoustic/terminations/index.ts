// The termination family: reflection coefficient, terminating impedance and low-frequency end correction.
import { FLANGED_END_CORRECTION_PER_RADIUS, UNFLANGED_END_CORRECTION_PER_RADIUS } from '../constants';
import { cAdd, cDiv, cScale, cSub, complex, type Complex } from '../complex';
import type { Termination } from '../types';
import { anechoicReflection } from './anechoic';
import { closedReflection } from './closed';
import { linedReflection } from './lined';
import { flangedReflectionInto } from './open-flanged';
import { unflangedReflectionInto } from './open-unflanged';

/**
 * Pressure reflection coefficient of a termination for a plane wave arriving at it, at complex
 * frequency frequencyHz (real for ordinary use), for a duct of equivalent radius radiusM.
 */
export function terminationReflection(
  termination: Termination,
  frequencyHz: Complex,
  radiusM: number,
  speedOfSoundMps: number,
): Complex {
  switch (termination.kind) {
    case 'closed':
      return closedReflection();
    case 'anechoic':
      return anechoicReflection();
    case 'lined':
      return linedReflection(termination.absorption);
    case 'open': {
      const out = new Float64Array(2);
      openEndReflectionInto(termination.flange, frequencyHz.re, frequencyHz.im, radiusM, speedOfSoundMps, out, 0);
      return { re: out[0], im: out[1] };
    }
  }
}

/**
 * Reflection coefficient of an open end at complex frequency into out[offset] (re) and out[offset + 1] (im),
 * without allocation: the network evaluator's path, called at every step of the resonance search.
 */
export function openEndReflectionInto(
  flange: Extract<Termination, { kind: 'open' }>['flange'],
  frequencyRe: number,
  frequencyIm: number,
  radiusM: number,
  speedOfSoundMps: number,
  out: Float64Array,
  offset: number,
): void {
  // Helmholtz number ka = 2 pi f a / c
  const scale = (2 * Math.PI * radiusM) / speedOfSoundMps;
  if (flange === 'flanged') flangedReflectionInto(frequencyRe * scale, frequencyIm * scale, out, offset);
  else unflangedReflectionInto(frequencyRe * scale, frequencyIm * scale, out, offset);
}

/** Low-frequency end correction, m; 0 for ends that do not radiate. */
export function lowFrequencyEndCorrectionM(termination: Termination, radiusM: number): number {
  if (termination.kind !== 'open') return 0;
  return (termination.flange === 'flanged' ? FLANGED_END_CORRECTION_PER_RADIUS : UNFLANGED_END_CORRECTION_PER_RADIUS) * radiusM;
}

/** Terminating acoustic impedance from the reflection coefficient (infinite for R = 1). */
export function terminationImpedance(reflection: Complex, characteristicImpedance: number): Complex {
  // Kinsler & Frey, Fundamentals of Acoustics, ch. 10: Z = Zc (1 + R)/(1 - R)
  return cScale(cDiv(cAdd(complex(1), reflection), cSub(complex(1), reflection)), characteristicImpedance);
}

export { unflangedMagnitude, unflangedEndCorrectionPerRadius } from './open-unflanged';
export { flangedMagnitude, flangedEndCorrectionPerRadius } from './open-flanged';
