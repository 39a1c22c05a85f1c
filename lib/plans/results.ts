// The analysis of every run on a plan, computed from the document (never stored as truth
// for a draft). A run that cannot be analysed says why instead.
import { analyzeRun, bladePassHarmonicsHz, operatingEnvelope, toneIntervalHz, type RunAnalysis } from '@/lib/acoustic';
import { withoutEnvelope } from '@/lib/analysis/select-envelopes';
import type { PlanDocument } from '@/lib/plan/document';
import { toRunInputWithMap } from '@/lib/plan/to-run-input';
import { runFan } from '@/lib/plan/shared-fan';
import { RISK_OPTIONS } from './risk-context';

export interface PathPiece { segmentId: string; startM: number; endM: number; fromNodeId: string; toNodeId: string }

export interface RunResult {
  runId: string;
  name: string;
  problem: string | null;
  analysis: RunAnalysis | null;
  path: PathPiece[];
  fanTonesHz: number[];          // blade-pass frequency and its harmonics below the analysis band's top
  /**
   * Resonance order → the fan tone whose interval over the operating envelope (the fan's speed range or
   * belt slip, the supply air ±5 °C) the resonance's -3 dB band meets, as the flags judge it; null for
   * broad resonances and those no tone meets.
   */
  nearFanTone: Record<number, number | null>;
}

const FAN_HARMONICS = 5;

function fanTones(fan: PlanDocument['runs'][number]['fan'], maxHz: number): number[] {
  if (!fan || fan.blades <= 0 || fan.rpm <= 0) return [];
  return bladePassHarmonicsHz(fan.blades, fan.rpm, FAN_HARMONICS).filter((hz) => hz <= maxHz * 1.05);
}

export function analysePlanRun(document: PlanDocument, runId: string, metresPerPixel: number): RunResult {
  const run = document.runs.find((candidate) => candidate.id === runId);
  if (!run) throw new RangeError(`runs: no run with id ${runId}`);
  const base = { runId, name: run.name, fanTonesHz: [] as number[], nearFanTone: {} as Record<number, number | null> };
  try {
    const { input, path } = toRunInputWithMap(document, runId, metresPerPixel);
    const computed = analyzeRun(input);
    // Pressure envelopes are not kept: the results route computes the ones asked for (run-envelopes.ts).
    const analysis: RunAnalysis = { ...computed, resonances: computed.resonances.map(withoutEnvelope) };
    const fan = runFan(document, run).fan;
    const tones = fanTones(fan, analysis.resonances.at(-1)?.frequencyHz ?? 0);
    const nearFanTone: Record<number, number | null> = {};
    const envelope = fan ? operatingEnvelope({ ...fan, minRpm: fan.minRpm ?? null, maxRpm: fan.maxRpm ?? null }, run.temperatureC, RISK_OPTIONS) : null;
    const intervals = envelope && fan ? tones.map((toneHz) => ({ toneHz, interval: toneIntervalHz(toneHz, fan.rpm, envelope, run.temperatureC) })) : [];
    for (const resonance of analysis.resonances) {
      const halfHz = (resonance.bandwidthHz ?? 0) / 2;
      const near = resonance.broadband ? undefined : intervals.find(({ interval: [lowHz, highHz] }) => resonance.frequencyHz + halfHz >= lowHz && resonance.frequencyHz - halfHz <= highHz);
      nearFanTone[resonance.order] = near?.toneHz ?? null;
    }
    return { ...base, problem: null, analysis, path, fanTonesHz: tones, nearFanTone };
  } catch (error) {
    if (error instanceof Error && !(error instanceof TypeError)) {
      return { ...base, problem: error.message, analysis: null, path: [] };
    }
    throw error;
  }
}

/** A run's results without pressure envelopes (revisions frozen before envelopes came only on request carry some). */
export function runWithoutEnvelopes(result: RunResult): RunResult {
  if (!result.analysis) return result;
  return { ...result, analysis: { ...result.analysis, resonances: result.analysis.resonances.map(withoutEnvelope) } };
}

export function analysePlan(document: PlanDocument, metresPerPixel: number): RunResult[] {
  return document.runs.map((run) => analysePlanRun(document, run.id, metresPerPixel));
}
