// The one rounding of analysis answers, on the way out: every number to its stated precision (within
// half a step, or to 4 significant figures), fields it does not know passed through, the engine's own
// answer untouched. (Precision is a product rule, stated in DEVELOPERS.md; no outside source.)
import { describe, expect, it } from 'vitest';
import { analyzeRun, type RunAnalysis } from '@/lib/acoustic';
import { roundedRunAnalysis, roundedRunResult } from '@/lib/analysis/round-answer';
import { withEnvelopesAsked } from '@/lib/analysis/select-envelopes';

const round = (diameterM: number) => ({ shape: 'round' as const, diameterM });
const input = {
  segments: [
    { lengthM: 1.23456789, section: round(0.2) },
    { lengthM: 0.7654321, section: round(0.3), branches: [{ segments: [{ lengthM: 0.9, section: round(0.1) }], end: { kind: 'open' as const, flange: 'flanged' as const } }] },
    { lengthM: 2.1111111, section: round(0.25) },
  ],
  start: { kind: 'closed' as const },
  end: { kind: 'open' as const, flange: 'unflanged' as const },
  maxHz: 600,
};

const withinStep = (rounded: number, value: number, step: number) => expect(Math.abs(rounded - value)).toBeLessThanOrEqual(step / 2 + 1e-12 * Math.abs(value));
const withinFigures = (rounded: number, value: number) => expect(Math.abs(rounded - value)).toBeLessThanOrEqual(0.5e-3 * Math.abs(value) + 1e-300);

describe('roundedRunAnalysis', () => {
  const full = withEnvelopesAsked(analyzeRun(input), { kind: 'all' });
  const fullCopy = structuredClone(full);
  const rounded = roundedRunAnalysis(full);

  it('rounds every number to its stated precision and leaves the engine answer as it was', () => {
    expect(full).toEqual(fullCopy);
    withinStep(rounded.lengthM, full.lengthM, 1e-4);
    withinStep(rounded.cutoffHz, full.cutoffHz, 1e-3);
    withinStep(rounded.speedOfSoundMps, full.speedOfSoundMps, 1e-3);
    withinStep(rounded.endCorrectionM.end, full.endCorrectionM.end, 1e-4);
    expect(rounded.resonances.length).toBeGreaterThan(4);
    rounded.resonances.forEach((resonance, index) => {
      const original = full.resonances[index];
      withinStep(resonance.frequencyHz, original.frequencyHz, 1e-3);
      withinFigures(resonance.q!, original.q!);
      withinFigures(resonance.bandwidthHz!, original.bandwidthHz!);
      withinFigures(resonance.dampingHz, original.dampingHz);
      resonance.nodesM.forEach((x, at) => withinStep(x, original.nodesM[at], 1e-4));
      resonance.antinodesM.forEach((x, at) => withinStep(x, original.antinodesM[at], 1e-4));
      expect(resonance.pressureEnvelope).toHaveLength(original.pressureEnvelope!.length);
      resonance.pressureEnvelope!.forEach((point, at) => {
        withinStep(point.positionM, original.pressureEnvelope![at].positionM, 1e-4);
        withinFigures(point.relative, original.pressureEnvelope![at].relative);
      });
    });
    rounded.reflections.forEach((reflection, index) => {
      withinStep(reflection.atM, full.reflections[index].atM, 1e-4);
      reflection.bands.forEach((band, at) => {
        withinFigures(band.magnitude, full.reflections[index].bands[at].magnitude);
        withinStep(band.phaseRad, full.reflections[index].bands[at].phaseRad, 1e-4);
      });
    });
    expect(rounded.reflections.some((reflection) => reflection.bandsWithBranch)).toBe(true);
    rounded.echoes.forEach((echo, index) => {
      withinStep(echo.delayS, full.echoes[index].delayS, 1e-6);
      withinFigures(echo.amplitude, full.echoes[index].amplitude);
    });
  });

  it('prints short decimals: no frequency beyond 3 places, no position beyond 4', () => {
    const decimals = (value: number) => (String(value).split('.')[1] ?? '').length;
    for (const resonance of rounded.resonances) {
      expect(decimals(resonance.frequencyHz)).toBeLessThanOrEqual(3);
      for (const x of [...resonance.nodesM, ...resonance.antinodesM, ...resonance.pressureEnvelope!.map((point) => point.positionM)]) expect(decimals(x)).toBeLessThanOrEqual(4);
    }
    expect(JSON.stringify(rounded).length).toBeLessThan(0.7 * JSON.stringify(full).length);
  });

  it('passes through fields it does not know, and keeps null Q and bandwidth null', () => {
    const extended = { ...full, note: 'kept', resonances: [{ ...full.resonances[0], q: null, bandwidthHz: null, extraHz: 1.23456789 }] } as unknown as RunAnalysis;
    const out = roundedRunAnalysis(extended) as RunAnalysis & { note: string };
    expect(out.note).toBe('kept');
    expect(out.resonances[0]).toMatchObject({ q: null, bandwidthHz: null, extraHz: 1.23456789 });
  });
});

describe('roundedRunResult', () => {
  it('rounds the analysis, the path places and the fan tones', () => {
    const analysis = withEnvelopesAsked(analyzeRun(input), { kind: 'none' });
    const result = roundedRunResult({
      runId: 'r', name: 'Supply', problem: null, analysis,
      path: [{ segmentId: 's', startM: 0, endM: 1.23456789, fromNodeId: 'a', toNodeId: 'b' }],
      fanTonesHz: [100.8333333], nearFanTone: { 1: 100.8333333, 2: null },
    });
    expect(result.path[0].endM).toBe(1.2346);
    expect(result.fanTonesHz).toEqual([100.833]);
    expect(result.nearFanTone).toEqual({ 1: 100.833, 2: null });
    expect(result.analysis).toEqual(roundedRunAnalysis(analysis));
    expect(roundedRunResult({ ...result, analysis: null, problem: 'x' }).analysis).toBeNull();
  });
});
