// The frequency range a run may be analysed over: at most a multiple of its plane-wave cut-off, and
// no more resonances below maxHz than one analysis lists. Throws a RangeError naming maxHz.
import { speedOfSound } from './air';
import { DEFAULT_MAX_HZ, DEFAULT_TEMPERATURE_C } from './constants';
import { inputError } from './input-error';
import { MAX_HZ_PER_CUTOFF, MAX_RESONANCES } from './input-limits';
import { lowestCutoffHz } from './run-cutoff';
import type { RunInput } from './types';

const formatHz = (hz: number): string => `${hz.toFixed(1)} Hz`;

/**
 * Resonances of a duct network below frequencyHz: about 2 L f / c for L metres of duct in all (the
 * mode spacing c / 2L of one duct, Kinsler & Frey, Fundamentals of Acoustics, ch. 10, summed over the
 * network's duct). The search counts them from near 0 Hz whatever minHz is, to number them.
 */
function resonancesBelow(frequencyHz: number, ductLengthM: number, speedOfSoundMps: number): number {
  return (2 * ductLengthM * frequencyHz) / speedOfSoundMps;
}

/** The run's fields are already valid; ductLengthM is all its duct, branches included. */
export function validateAnalysisRange(input: RunInput, ductLengthM: number): void {
  const speedOfSoundMps = speedOfSound(input.temperatureC ?? DEFAULT_TEMPERATURE_C);
  const cutoffHz = lowestCutoffHz(input.segments, speedOfSoundMps);
  const highestHz = MAX_HZ_PER_CUTOFF * cutoffHz;
  if (input.maxHz !== undefined && input.maxHz > highestHz) {
    throw inputError('maxHz', `must be <= ${highestHz.toFixed(1)} (${MAX_HZ_PER_CUTOFF} × the run's plane-wave cut-off, ${formatHz(cutoffHz)}): higher-order modes propagate there`);
  }
  const maxHz = input.maxHz ?? Math.min(DEFAULT_MAX_HZ, cutoffHz);
  const resonances = resonancesBelow(maxHz, ductLengthM, speedOfSoundMps);
  if (resonances > MAX_RESONANCES) {
    const allowedHz = (MAX_RESONANCES * speedOfSoundMps) / (2 * ductLengthM);
    throw inputError('maxHz', `must be <= ${allowedHz.toFixed(1)} for a run with ${ductLengthM.toFixed(0)} m of duct, branches included ` +
      `(below ${formatHz(maxHz)} it has about ${Math.round(resonances)} resonances; an analysis lists at most ${MAX_RESONANCES}): lower maxHz or shorten the run`);
  }
}
