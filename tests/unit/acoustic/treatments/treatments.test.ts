import { describe, expect, it } from 'vitest';
import { analyzeRun, assessRisks, candidateTreatments, evaluateTreatment, quarterWaveLengthM } from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { toneInput } from '../risk/risk-fixtures';

describe('quarter-wave side-branch resonator', () => {
  it('L = c / 4f - delta, delta = 0.8216 a (Kinsler & Frey ch. 10; Norris & Sheng 1989 flanged end correction)', () => {
    expectClose(quarterWaveLengthM(240, 343.2, 0.05), 343.2 / (4 * 240) - 0.8216 * 0.05, 1e-12, '[calc] 0.31642 m');
    expectClose(quarterWaveLengthM(240, 343.2, 0.05), 0.31642, 1e-5, '[calc] value');
  });

  it('the engine agrees: that tube, closed at one end and flanged-open at the other, resonates at c / 4(L + delta) = 240 Hz (Kinsler & Frey ch. 10)', () => {
    const closedOpen = analyzeRun({ segments: [{ lengthM: quarterWaveLengthM(240, 343.2, 0.05), section: { shape: 'round', diameterM: 0.1 } }], start: { kind: 'closed' }, end: { kind: 'open', flange: 'flanged' }, wallLosses: false, maxHz: 400 });
    // ka = 0.22 at 240 Hz: the flanged end correction is 0.8216 a (1 - ~3 %) there (Norris & Sheng fit), so within 1 %
    expectClose(closedOpen.resonances[0].frequencyHz, 240, 2.4, 'f_1 within 1 %');
  });
});

describe('treatments evaluated by re-running the engine', () => {
  const [flag] = assessRisks(toneInput);

  it('retuning a length moves the resonance out of the tone window and clears the flag (before/after)', () => {
    const result = evaluateTreatment(toneInput, flag, { kind: 'retune-length' });
    expect(result.treatment.kind).toBe('retune-length');
    const delta = result.treatment.kind === 'retune-length' ? result.treatment.deltaLengthM ?? NaN : NaN;
    expect(Number.isFinite(delta)).toBe(true);
    expect(result.before.distanceHz).toBeLessThan(result.before.windowHz ?? 0);
    expect(result.after.distanceHz).toBeGreaterThan(result.after.windowHz ?? Infinity);
    expect(result.clears).toBe(true);
    // the change found is the smallest that clears: 5 % less does not
    const smaller = evaluateTreatment(toneInput, flag, { kind: 'retune-length', segmentIndex: 0, deltaLengthM: 0.95 * delta });
    expect(smaller.clears).toBe(false);
    // re-evaluating the explicit treatment gives the same after-state
    const again = evaluateTreatment(toneInput, flag, result.treatment);
    expect(again.after.valueHz).toBe(result.after.valueHz);
    // and the model it describes is flag-free
    expect(assessRisks({ ...toneInput, run: { ...toneInput.run, segments: [{ ...toneInput.run.segments[0], lengthM: toneInput.run.segments[0].lengthM + delta }, toneInput.run.segments[1]] } })).toHaveLength(0);
  });

  it('candidates: retune, resonator, lining and termination change, each with before and after', () => {
    const results = candidateTreatments(toneInput, flag);
    expect(results.map((result) => result.treatment.kind)).toEqual(['retune-length', 'side-branch-resonator', 'line-segment', 'change-termination']);
    for (const result of results) {
      expect(result.before).toEqual(flag.quantity);
      expect(result.description.length).toBeGreaterThan(10);
      expect(Number.isFinite(result.after.valueHz ?? NaN)).toBe(true);
    }
    const resonator = results[1];
    expect(resonator.treatment.kind === 'side-branch-resonator' && resonator.treatment.lengthM).toBeCloseTo(quarterWaveLengthM(240, 343.2, 0.05), 9);
    // lining the duct damps the resonance: its bandwidth grows, and the flagged coincidence window with it
    expect(results[2].after.windowHz ?? 0).toBeGreaterThanOrEqual(results[2].before.windowHz ?? Infinity);
  });

  it('bad treatment input throws a RangeError naming the field', () => {
    expect(() => evaluateTreatment(toneInput, flag, { kind: 'line-segment', segmentIndex: 7, thicknessM: 0.05, absorption: 0.5 })).toThrow(RangeError);
    expect(() => evaluateTreatment(toneInput, flag, { kind: 'line-segment', segmentIndex: 0, thicknessM: 0.05, absorption: 1.5 })).toThrow(/treatment.absorption must be between 0 and 1/);
  });
});
