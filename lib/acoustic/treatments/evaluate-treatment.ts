// Evaluates a treatment of a flag by re-running the engine on the changed model.
import { analyzeRun } from '../analyze-run';
import { speedOfSound } from '../air';
import { DEFAULT_TEMPERATURE_C } from '../constants';
import { equivalentRadiusM } from '../section';
import type { RiskFlag, RiskInput } from '../risk/risk-types';
import { applyTreatment, longestSegment } from './apply-treatment';
import { treatmentEffect } from './treatment-effect';
import { measureFlag } from './measure-flag';
import { quarterWaveLengthM } from './quarter-wave';
import { raisedFlags } from './raised-flags';
import { DEFAULT_SITE_TOLERANCE_M, searchRetune } from './retune-search';
import type { Treatment, TreatmentResult } from './treatment-types';
import type { Termination } from '../types';

/** Default resonator bore: half the host segment's equivalent diameter (product rule). */
const RESONATOR_BORE_FRACTION = 0.5;

/** Main-path segment whose far end lies nearest a pressure antinode of the resonance at the target. */
function segmentNearestAntinode(input: RiskInput, flag: RiskFlag): number {
  const resonance = analyzeRun(input.run).resonances.find((candidate) => candidate.order === flag.resonanceOrder);
  const antinodesM = resonance?.antinodesM ?? [];
  let best = longestSegment(input.run);
  let bestDistance = Infinity;
  let endM = 0;
  input.run.segments.forEach((segment, index) => {
    endM += segment.lengthM;
    for (const antinodeM of antinodesM) {
      if (Math.abs(antinodeM - endM) < bestDistance) {
        bestDistance = Math.abs(antinodeM - endM);
        best = index;
      }
    }
  });
  return best;
}

/** Makes every choice explicit: the searched length change, the resonator's segment, bore and length. */
function resolve(input: RiskInput, flag: RiskFlag, treatment: Treatment, notes: string[]): Treatment | null {
  if (treatment.kind === 'retune-length' && treatment.deltaLengthM === undefined) {
    const segmentIndex = treatment.segmentIndex ?? longestSegment(input.run);
    const search = searchRetune(input, flag, segmentIndex);
    notes.push(`length search: ${search.analyses} re-runs of the engine on segment ${segmentIndex + 1}, changes of at least ${(DEFAULT_SITE_TOLERANCE_M * 1000).toFixed(0)} mm (site tolerance)`);
    if (search.deltaLengthM === null) {
      notes.push('no change of that segment’s length a builder can hold moves the resonances further from the tones');
      return null;
    }
    return { kind: 'retune-length', segmentIndex, deltaLengthM: search.deltaLengthM };
  }
  if (treatment.kind === 'side-branch-resonator') {
    const segmentIndex = treatment.segmentIndex ?? segmentNearestAntinode(input, flag);
    const hostRadiusM = equivalentRadiusM(input.run.segments[segmentIndex].section);
    const diameterM = treatment.diameterM ?? 2 * hostRadiusM * RESONATOR_BORE_FRACTION;
    const tuneHz = treatment.tuneHz ?? flag.targetHz;
    const speedMps = speedOfSound(input.run.temperatureC ?? DEFAULT_TEMPERATURE_C);
    const lengthM = treatment.lengthM ?? quarterWaveLengthM(tuneHz, speedMps, diameterM / 2, hostRadiusM);
    return { kind: 'side-branch-resonator', segmentIndex, tuneHz, diameterM, lengthM };
  }
  return treatment;
}

/** How a treatment names main-path segments and run ends; the plan supplies its own stable labels. */
export interface TreatmentNames {
  segment(index: number): string;
  end(end: 'start' | 'end'): string;
}

/** Segments are numbered for people from 1 at the fan end, as in the section tables. */
const PLAIN_NAMES: TreatmentNames = { segment: (index) => `segment ${index + 1}`, end: (end) => `the ${end} termination` };

function terminationWords(termination: Termination): string {
  if (termination.kind === 'open') return `open (${termination.flange})`;
  if (termination.kind === 'lined') return `lined (absorption ${termination.absorption})`;
  return termination.kind === 'anechoic' ? 'absorbing (no reflection)' : termination.kind;
}

export function describeTreatment(treatment: Treatment, names: TreatmentNames = PLAIN_NAMES): string {
  switch (treatment.kind) {
    case 'line-segment':
      return `Line ${names.segment(treatment.segmentIndex)}${treatment.lengthM === undefined ? '' : ` over ${treatment.lengthM.toFixed(2)} m`} (${(treatment.thicknessM * 1000).toFixed(0)} mm ${treatment.absorption === undefined ? 'fibrous liner' : `liner, absorption ${treatment.absorption}`})`;
    case 'change-termination':
      return `Change ${names.end(treatment.end)} to ${terminationWords(treatment.termination)}`;
    case 'retune-length':
      return `${(treatment.deltaLengthM ?? 0) < 0 ? 'Shorten' : 'Lengthen'} ${names.segment(treatment.segmentIndex ?? 0)} by ${(Math.abs(treatment.deltaLengthM ?? 0) * 1000).toFixed(0)} mm`;
    case 'side-branch-resonator':
      return `Add a closed quarter-wave side branch at ${names.segment(treatment.segmentIndex ?? 0)}: ${(treatment.lengthM ?? 0).toFixed(3)} m long, ${((treatment.diameterM ?? 0) * 1000).toFixed(0)} mm bore, tuned to ${(treatment.tuneHz ?? 0).toFixed(1)} Hz`;
  }
}

export function evaluateTreatment(input: RiskInput, flag: RiskFlag, treatment: Treatment): TreatmentResult {
  const notes: string[] = [];
  const resolved = resolve(input, flag, treatment, notes);
  if (resolved === null) return { treatment, description: describeTreatment(treatment), before: flag.quantity, after: flag.quantity, clears: false, raises: [], effect: {}, notes };
  const treatedRun = applyTreatment(input.run, resolved);
  // One engine run of the treated model serves both the flag's measurement and the flags it raises.
  const treatedAnalysis = analyzeRun(treatedRun);
  const after = measureFlag(input, flag, treatedRun, treatedAnalysis);
  const raises = raisedFlags(input, treatedRun, treatedAnalysis).map((raised) => `${raised.severity}: ${raised.reason}`);
  const effect = treatmentEffect(input, flag, resolved, treatedRun, treatedAnalysis);
  return { treatment: resolved, description: describeTreatment(resolved), before: flag.quantity, after: after.quantity, clears: after.clears, raises, effect, notes };
}
