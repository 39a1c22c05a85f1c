// Retuning: the change of one segment's length that puts the fan's tones as far as it can from every
// distinct resonance, over the whole operating envelope: the middle between neighbouring resonances,
// not the edge of a window. Clearance of a tone is the gap between the interval it sweeps and the
// nearest resonance's -3 dB band (negative: they overlap); the search maximises the smallest clearance
// over every tone below cut-off, each candidate re-running analyzeRun over a band around the tones.
// Changes smaller than the site tolerance are not offered: a builder cannot hold them, and the
// supply air's temperature moves resonances by more.
import { analyzeRun } from '../analyze-run';
import { speedOfSound } from '../air';
import { DEFAULT_TEMPERATURE_C } from '../constants';
import { toneInterval } from '../risk/assess-risks';
import { bladePassHarmonicsHz } from '../blade-pass';
import type { RiskFlag, RiskInput } from '../risk/risk-types';
import type { Resonance, RunAnalysis, RunInput } from '../types';
import { applyTreatment } from './apply-treatment';

/** A length change smaller than this is not offered, m (site tolerance; common practice, no source). */
export const DEFAULT_SITE_TOLERANCE_M = 0.025;
/** Candidate changes scanned each way before the best is refined. */
const SCAN_STEPS = 16;
const REFINEMENTS = 10;
/** A segment may shrink to this fraction of its length at most. */
const MIN_LENGTH_FRACTION = 0.1;
/** The search analyses the run over this band around the tones. */
const BAND_MARGIN = 0.3;
const DEFAULT_HARMONICS = 3;

export interface Clearance {
  /** Gap between the flag's interval and the nearest resonance band, Hz (negative: overlap), and in that resonance's bandwidths. */
  clearanceHz: number;
  clearanceBandwidths: number | null;
}

export interface RetuneResult {
  deltaLengthM: number | null;
  /** The flag's own clearance after the change. */
  clearance: Clearance | null;
  /** The smallest clearance over every tone after the change, Hz. */
  worstClearanceHz: number | null;
  analyses: number;
}

/** Gap from the interval to the -3 dB band of the nearest distinct resonance, Hz. */
export function clearanceOf(resonances: readonly Resonance[], [lowHz, highHz]: [number, number]): Clearance {
  let best: Clearance = { clearanceHz: Infinity, clearanceBandwidths: null };
  for (const resonance of resonances) {
    if (resonance.broadband) continue;
    const halfHz = (resonance.bandwidthHz ?? 0) / 2;
    const gapHz = resonance.frequencyHz < lowHz ? lowHz - resonance.frequencyHz - halfHz : resonance.frequencyHz > highHz ? resonance.frequencyHz - highHz - halfHz : -halfHz - Math.min(resonance.frequencyHz - lowHz, highHz - resonance.frequencyHz);
    if (gapHz < best.clearanceHz) best = { clearanceHz: gapHz, clearanceBandwidths: resonance.bandwidthHz ? gapHz / resonance.bandwidthHz : null };
  }
  return best;
}

/** The intervals of every fan tone below the run's cut-off (the flag's own for a room mode). */
function targetIntervals(input: RiskInput, flag: RiskFlag, cutoffHz: number): [number, number][] {
  const own = flag.quantity.envelopeHz ?? [flag.targetHz, flag.targetHz];
  if (flag.kind !== 'resonance-near-tone' || !input.fan) return [own];
  const tones = bladePassHarmonicsHz(input.fan.blades, input.fan.rpm, input.fan.harmonics ?? DEFAULT_HARMONICS);
  return tones.map((toneHz) => toneInterval(input, toneHz)).filter(([, highHz]) => highHz <= cutoffHz);
}

export function searchRetune(input: RiskInput, flag: RiskFlag, segmentIndex: number, siteToleranceM = DEFAULT_SITE_TOLERANCE_M): RetuneResult {
  let analyses = 0;
  const baseAnalysis = analyzeRun({ ...input.run, maxEchoes: 0 });
  const intervals = targetIntervals(input, flag, baseAnalysis.cutoffHz);
  const own = flag.quantity.envelopeHz ?? [flag.targetHz, flag.targetHz];
  if (intervals.length === 0) return { deltaLengthM: null, clearance: null, worstClearanceHz: null, analyses };
  const lowest = Math.min(...intervals.map(([lowHz]) => lowHz));
  const highest = Math.max(...intervals.map(([, highHz]) => highHz));
  const band = (run: RunInput): RunInput => ({ ...run, minHz: lowest * (1 - BAND_MARGIN), maxHz: Math.min(highest * (1 + BAND_MARGIN), baseAnalysis.cutoffHz), maxEchoes: 0 });
  const analysed = new Map<number, RunAnalysis>();
  const analyse = (deltaLengthM: number): RunAnalysis => {
    let analysis = analysed.get(deltaLengthM);
    if (!analysis) {
      analyses++;
      analysis = analyzeRun(band(applyTreatment(input.run, { kind: 'retune-length', segmentIndex, deltaLengthM })));
      analysed.set(deltaLengthM, analysis);
    }
    return analysis;
  };
  const worst = (deltaLengthM: number): number => Math.min(...intervals.map((interval) => clearanceOf(analyse(deltaLengthM).resonances, interval).clearanceHz));
  // Resonances repeat when a length changes by half a wavelength at the flag's target: no need to look further.
  const segmentLengthM = input.run.segments[segmentIndex].lengthM;
  const halfWavelengthM = speedOfSound(input.run.temperatureC ?? DEFAULT_TEMPERATURE_C) / (2 * flag.targetHz);
  const longestM = halfWavelengthM;
  const shortestM = Math.min(halfWavelengthM, (1 - MIN_LENGTH_FRACTION) * segmentLengthM);
  const candidates: number[] = [];
  for (let step = 1; step <= SCAN_STEPS; step++) {
    const lengthen = siteToleranceM + ((longestM - siteToleranceM) * step) / SCAN_STEPS;
    const shorten = siteToleranceM + ((shortestM - siteToleranceM) * step) / SCAN_STEPS;
    if (lengthen >= siteToleranceM) candidates.push(lengthen);
    if (shorten >= siteToleranceM && shortestM >= siteToleranceM) candidates.push(-shorten);
  }
  if (candidates.length === 0) return { deltaLengthM: null, clearance: null, worstClearanceHz: null, analyses };
  let best = candidates[0];
  for (const candidate of candidates) if (worst(candidate) > worst(best)) best = candidate;
  // Golden-section refinement between the best candidate's neighbours, keeping the sign and the tolerance.
  const stepM = (best > 0 ? longestM - siteToleranceM : shortestM - siteToleranceM) / SCAN_STEPS;
  let low = Math.max(siteToleranceM, Math.abs(best) - stepM);
  let high = Math.abs(best) + stepM;
  const sign = Math.sign(best);
  const ratio = (Math.sqrt(5) - 1) / 2;
  for (let refinement = 0; refinement < REFINEMENTS; refinement++) {
    const left = high - ratio * (high - low);
    const right = low + ratio * (high - low);
    if (worst(sign * left) >= worst(sign * right)) high = right;
    else low = left;
  }
  const refined = sign * ((low + high) / 2);
  const chosen = worst(refined) > worst(best) ? refined : best;
  // no length change of this segment that a builder can hold does better than leaving it
  if (worst(chosen) <= worst(0)) return { deltaLengthM: null, clearance: null, worstClearanceHz: null, analyses };
  return { deltaLengthM: chosen, clearance: clearanceOf(analyse(chosen).resonances, own), worstClearanceHz: worst(chosen), analyses };
}
