import { describe, expect, it } from 'vitest';
import { analyzeRun, type RunInput } from '@/lib/acoustic';
import { expectClose } from './tolerance';

describe('reflections at discontinuities', () => {
  const runInput: RunInput = {
    segments: [
      { lengthM: 1, section: { shape: 'round', diameterM: 0.2 } },
      { lengthM: 1, section: { shape: 'round', diameterM: 0.4 }, branches: [{ segments: [{ lengthM: 0.6, section: { shape: 'round', diameterM: 0.2 } }], end: { kind: 'closed' } }] },
      { lengthM: 1, section: { shape: 'round', diameterM: 0.2 } },
    ],
    start: { kind: 'closed' },
    end: { kind: 'open', flange: 'unflanged' },
  };
  const run = analyzeRun(runInput);

  it('lists start, area change, tee and end in order along the path', () => {
    expect(run.reflections.map((reflection) => [reflection.kind, reflection.atM])).toEqual([
      ['start', 0],
      ['area-change', 1],
      ['tee', 2],
      ['end', 3],
    ]);
  });

  it('gives octave bands from 63 Hz up to below the cut-off (here 1.84118 c / pi 0.4 = 503 Hz)', () => {
    for (const reflection of run.reflections) expect(reflection.bands.map((band) => band.hz)).toEqual([63, 125, 250, 500]);
  });

  it('area change S1 -> S2 = 4 S1: (S1 - S2)/(S1 + S2) = -0.6 (Kinsler & Frey ch. 10)', () => {
    for (const band of run.reflections[1].bands) {
      expectClose(band.magnitude, 0.6, 1e-12, `|R| ${band.hz}`);
      expectClose(Math.abs(band.phaseRad), Math.PI, 1e-12, `phase ${band.hz}`);
    }
  });

  it('tee with everything beyond anechoic: (S1 - S2 - Sb)/(S1 + S2 + Sb) = (4 - 1 - 1)/6', () => {
    for (const band of run.reflections[2].bands) expectClose(band.magnitude * Math.cos(band.phaseRad), 2 / 6, 1e-12, `R ${band.hz}`);
  });

  it('tee with its own closed branch: side-branch admittance j (Sb/rho c) tan kLb (Kinsler & Frey ch. 10, side branch) through its mouth mass', () => {
    const lossless = analyzeRun({ ...runInput, wallLosses: false });
    const c = lossless.speedOfSoundMps;
    expect(lossless.reflections[2].bandsWithBranch).toHaveLength(4);
    lossless.reflections[2].bandsWithBranch?.forEach((band) => {
      const k = (2 * Math.PI * band.hz) / c;
      const s1 = Math.PI * 0.04;
      const sb = Math.PI * 0.01;
      // Mouth mass rho t_i / Sb in series, t_i = b (0.82 - 0.193 d - 1.09 d^2 + 1.27 d^3 - 0.71 d^4), b = 0.1 m, d = 0.5
      // (Dubos et al. 1999, Acta Acustica 85, 153; from memory): the branch's tan kLb becomes tan kLb / (1 - k t_i tan kLb).
      const d = 0.5;
      const mouthM = 0.1 * (0.82 - 0.193 * d - 1.09 * d ** 2 + 1.27 * d ** 3 - 0.71 * d ** 4);
      const branchTan = Math.tan(k * 0.6) / (1 - k * mouthM * Math.tan(k * 0.6));
      // Y = (S2 + j Sb tan)/rho c seen from Zc1 = rho c / S1: R = (S1 - S2 - j Sb tan)/(S1 + S2 + j Sb tan)
      const sideRe = s1 - sb;
      const sideIm = -sb * branchTan;
      const reflection = { re: 0, im: 0 };
      const denominatorRe = s1 + sb;
      const denominatorIm = sb * branchTan;
      const norm = denominatorRe ** 2 + denominatorIm ** 2;
      reflection.re = (sideRe * denominatorRe + sideIm * denominatorIm) / norm;
      reflection.im = (sideIm * denominatorRe - sideRe * denominatorIm) / norm;
      expectClose(band.magnitude, Math.hypot(reflection.re, reflection.im), 1e-9, `|R| ${band.hz}`);
      expectClose(band.phaseRad, Math.atan2(reflection.im, reflection.re), 1e-9, `phase ${band.hz}`);
    });
  });

  it('start closed: +1; open end: |R| below 1 and falling with frequency (Levine & Schwinger 1948)', () => {
    run.reflections[0].bands.forEach((band) => expectClose(band.magnitude, 1, 0, 'closed'));
    const magnitudes = run.reflections[3].bands.map((band) => band.magnitude);
    expect(magnitudes[0]).toBeLessThan(1);
    expect(magnitudes[1]).toBeLessThan(magnitudes[0]);
    expect(magnitudes[2]).toBeLessThan(magnitudes[1]);
  });
});
