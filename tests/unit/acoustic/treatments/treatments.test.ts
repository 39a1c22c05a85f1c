import { describe, expect, it } from 'vitest';
import { analyzeRun, assessRisks, candidateTreatments, evaluateTreatment, quarterWaveLengthM } from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { toneInput } from '../risk/risk-fixtures';

describe('quarter-wave side-branch resonator', () => {
  // A 100 mm branch on a 200 mm duct: d = b / a = 0.5, t_i = b (0.82 - 0.193 d - 1.09 d^2 + 1.27 d^3 - 0.71 d^4) = 0.56538 b
  // (Dubos et al. 1999, Acta Acustica 85, 153; coefficients from memory).
  const mouthCorrectionM = 0.05 * (0.82 - 0.193 * 0.5 - 1.09 * 0.25 + 1.27 * 0.125 - 0.71 * 0.0625);

  it('cot kL = k t_i: a closed tube (Z = -j Zc cot kL, Kinsler & Frey ch. 10) in series with its mouth mass j Zc k t_i', () => {
    const k = (2 * Math.PI * 240) / 343.2;
    const lengthM = quarterWaveLengthM(240, 343.2, 0.05, 0.1);
    expectClose(1 / Math.tan(k * lengthM), k * mouthCorrectionM, 1e-12, 'cot kL = k t_i');
    expect(lengthM).toBeGreaterThan(0);
    expect(lengthM).toBeLessThan(343.2 / (4 * 240));
    // to first order in k t_i, L = c / 4f - t_i (Munjal, Acoustics of Ducts and Mufflers, ch. 3): here within (k t_i)^3 / 3k
    expectClose(lengthM, 343.2 / (4 * 240) - mouthCorrectionM, (k * mouthCorrectionM) ** 3 / (3 * k) * 1.01, 'c / 4f - t_i');
    expectClose(lengthM, 0.329375, 1e-6, '[calc] 0.329375 m');
  });

  it('the engine agrees: the branch shorts its junction at 240 Hz, so a closed quarter-wave stretch before it rings there undamped', () => {
    // Closed start, L1 = c / 4f to the tee, anechoic beyond: at f the tuned branch's input impedance through its
    // mouth is zero, p = 0 at the junction, the stretch before it is a closed-to-pressure-release quarter-wave
    // tube at f (Kinsler & Frey ch. 10) and nothing leaks to the anechoic end: a resonance at f with no damping.
    const host = { shape: 'round' as const, diameterM: 0.2 };
    const branch = { segments: [{ lengthM: quarterWaveLengthM(240, 343.2, 0.05, 0.1), section: { shape: 'round' as const, diameterM: 0.1 } }], end: { kind: 'closed' as const } };
    const analysis = analyzeRun({
      segments: [
        { lengthM: 343.2 / (4 * 240), section: host, branches: [branch] },
        { lengthM: 1.5, section: host },
      ],
      start: { kind: 'closed' },
      end: { kind: 'anechoic' },
      wallLosses: false,
      temperatureC: 20,
      maxHz: 400,
    });
    const tuned = analysis.resonances.find((resonance) => Math.abs(resonance.frequencyHz - 240) < 5);
    expect(tuned, 'a resonance near 240 Hz').toBeDefined();
    expectClose(tuned?.frequencyHz ?? NaN, 240, 0.01, 'f at the tuning');
    expect(Math.abs(tuned?.dampingHz ?? NaN)).toBeLessThan(1e-6);
  });
});

describe('treatments evaluated by re-running the engine, judged by their effect across the envelope', () => {
  const [flag] = assessRisks(toneInput);

  it('the flag on the fixture: a sheet-metal closed–closed duct rings at the tone (high, over 10 dB)', () => {
    expect(flag.kind).toBe('resonance-near-tone');
    expect(flag.quantity.gainDb ?? 0).toBeGreaterThan(10);
  });

  it('retuning aims between neighbouring resonances, never below the 25 mm site tolerance, and clears every tone', () => {
    const result = evaluateTreatment(toneInput, flag, { kind: 'retune-length' });
    const delta = result.treatment.kind === 'retune-length' ? result.treatment.deltaLengthM ?? NaN : NaN;
    expect(Math.abs(delta)).toBeGreaterThanOrEqual(0.025);
    expect(result.clears).toBe(true);
    expect(result.after.gainDb ?? Infinity).toBeLessThan(3);
    expect(result.effect.clearanceHz ?? -1).toBeGreaterThan(0);
    expect(result.effect.clearanceBandwidths ?? 0).toBeGreaterThan(0);
    // the smallest change a builder can hold, the same way, leaves less clearance: the search does not stop at the window's edge
    const minimal = evaluateTreatment(toneInput, flag, { kind: 'retune-length', segmentIndex: 0, deltaLengthM: Math.sign(delta) * 0.025 });
    expect(minimal.effect.clearanceHz ?? Infinity).toBeLessThan(result.effect.clearanceHz ?? -Infinity);
    // re-evaluating the explicit treatment gives the same after-state, and the model it describes is flag-free
    const again = evaluateTreatment(toneInput, flag, result.treatment);
    expect(again.after.gainDb).toBe(result.after.gainDb);
    const segments = [...toneInput.run.segments];
    segments[0] = { ...segments[0], lengthM: segments[0].lengthM + delta };
    expect(assessRisks({ ...toneInput, run: { ...toneInput.run, segments } })).toHaveLength(0);
  });

  it('the side branch is judged by its insertion loss at the tone across the envelope, with the side peaks it makes', () => {
    const results = candidateTreatments(toneInput, flag);
    const kinds = results.map((result) => result.treatment.kind);
    expect(kinds.slice(0, 3)).toEqual(['retune-length', 'side-branch-resonator', 'line-segment']);
    const branch = results[1];
    expect(branch.treatment.kind === 'side-branch-resonator' && branch.treatment.lengthM).toBeCloseTo(quarterWaveLengthM(240, 343.2, 0.05, 0.1), 9);
    const [leastDb, mostDb] = branch.effect.insertionLossDb ?? [NaN, NaN];
    expect(leastDb).toBeLessThanOrEqual(mostDb);
    expect(mostDb).toBeGreaterThan(3);
    expect(Number.isFinite(branch.effect.sidePeakDb ?? NaN)).toBe(true);
    for (const result of results) {
      expect(result.before).toEqual(flag.quantity);
      expect(result.description.length).toBeGreaterThan(10);
    }
  });

  it('lining is shown band by band, rising with frequency from 125 to 500 Hz (fibrous liner, Sabine with the liner\'s absorption by band)', () => {
    const lining = candidateTreatments(toneInput, flag).find((result) => result.treatment.kind === 'line-segment');
    const bands = lining?.effect.bandLossDb ?? [];
    expect(bands).toHaveLength(8);
    expect(bands[0]).toBeLessThanOrEqual(bands[1]); // the liner tests stop at 125 Hz: 63 Hz takes the 125 Hz absorption
    expect(bands[1]).toBeLessThan(bands[2]);
    expect(bands[2]).toBeLessThan(bands[3]);
    bands.forEach((lossDb) => expect(lossDb).toBeLessThanOrEqual(40));
  });

  it('an end change is offered only where it lowers the flagged quantity', () => {
    for (const result of candidateTreatments(toneInput, flag).filter((candidate) => candidate.treatment.kind === 'change-termination')) {
      expect(result.clears || (result.after.gainDb ?? Infinity) < (result.before.gainDb ?? -Infinity) - 0.5).toBe(true);
    }
  });

  it('describes segments as people count them, from 1 at the fan end, and says longer or shorter', () => {
    const shorter = evaluateTreatment(toneInput, flag, { kind: 'retune-length', segmentIndex: 0, deltaLengthM: -0.12 });
    expect(shorter.description).toBe('Shorten segment 1 by 120 mm');
    const longer = evaluateTreatment(toneInput, flag, { kind: 'retune-length', segmentIndex: 1, deltaLengthM: 0.05 });
    expect(longer.description).toBe('Lengthen segment 2 by 50 mm');
  });

  it('does not offer to change an end to the termination it already has', () => {
    const flangedEnd = { ...toneInput, run: { ...toneInput.run, end: { kind: 'open' as const, flange: 'flanged' as const } } };
    const ends = candidateTreatments(flangedEnd, flag).filter((result) => result.treatment.kind === 'change-termination');
    expect(ends.every((result) => result.treatment.kind === 'change-termination' && result.treatment.end === 'start')).toBe(true);
  });

  it('bad treatment input throws a RangeError naming the field', () => {
    expect(() => evaluateTreatment(toneInput, flag, { kind: 'line-segment', segmentIndex: 7, thicknessM: 0.05, absorption: 0.5 })).toThrow(RangeError);
    expect(() => evaluateTreatment(toneInput, flag, { kind: 'line-segment', segmentIndex: 0, thicknessM: 0.05, absorption: 1.5 })).toThrow(/treatment.absorption must be between 0 and 1/);
  });
});
