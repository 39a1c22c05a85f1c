import { describe, expect, it } from 'vitest';
import { analyzeRun, createAdmittanceSweeper, type RunInput, type Segment } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const closed = { kind: 'closed' as const };
const round = (diameterM: number) => ({ shape: 'round' as const, diameterM });

describe('pressure envelope along the main path', () => {
  it('closed–closed uniform pipe: relative = |cos(n pi x / L)| (Kinsler & Frey, ch. 10, standing waves in a closed pipe)', () => {
    const lengthM = 2;
    const run = analyzeRun({ segments: [{ lengthM, section: round(0.2) }], start: closed, end: closed, maxHz: 600, wallLosses: false });
    run.resonances.forEach((resonance, index) => {
      const n = index + 1;
      const envelope = resonance.pressureEnvelope ?? [];
      // 8 samples per half wavelength: n half wavelengths along L give 8 n intervals (one more where rounding tips the count)
      expect(envelope.length).toBeGreaterThanOrEqual(8 * n + 1);
      expect(envelope.length).toBeLessThanOrEqual(8 * n + 2);
      expectClose(envelope[0].positionM, 0, 1e-12, 'first sample at the start end');
      expectClose(envelope[envelope.length - 1].positionM, lengthM, 1e-12, 'last sample at the end');
      for (const point of envelope) {
        expectClose(point.relative, Math.abs(Math.cos((n * Math.PI * point.positionM) / lengthM)), 1e-9, `mode ${n} at ${point.positionM} m`);
      }
    });
  });

  it('samples every change of section, stays within 0..1 with a maximum of 1, ascending positions', () => {
    const run = analyzeRun({
      segments: [
        { lengthM: 1, section: round(0.1) },
        { lengthM: 0.5, section: round(0.2), branches: [{ segments: [{ lengthM: 0.7, section: round(0.1) }], end: closed }] },
        { lengthM: 1.3, section: round(0.15) },
      ],
      start: closed,
      end: { kind: 'open', flange: 'unflanged' },
      maxHz: 500,
    });
    expect(run.resonances.length).toBeGreaterThan(3);
    for (const resonance of run.resonances) {
      const envelope = resonance.pressureEnvelope ?? [];
      const positions = envelope.map((point) => point.positionM);
      for (const boundaryM of [0, 1, 1.5, 2.8]) expect(positions.some((x) => Math.abs(x - boundaryM) < 1e-12), `boundary ${boundaryM}`).toBe(true);
      positions.slice(1).forEach((x, index) => expect(x).toBeGreaterThan(positions[index]));
      expect(Math.max(...envelope.map((point) => point.relative))).toBe(1);
      expect(Math.min(...envelope.map((point) => point.relative))).toBeGreaterThanOrEqual(0);
    }
  });

  it('samples per half wavelength, not per metre: mode n of a 2 m and of a 40 m pipe have the same number of samples', () => {
    // f_n = n c / 2L for a pipe closed at both ends (Kinsler & Frey, ch. 10): n half wavelengths along L, whatever L is.
    const counts = [2, 40].map((lengthM) => {
      const run = analyzeRun({ segments: [{ lengthM, section: round(0.2) }], start: closed, end: closed, minHz: 1, maxHz: (6.5 * 343) / (2 * lengthM), wallLosses: false });
      return run.resonances.slice(0, 6).map((resonance) => resonance.pressureEnvelope?.length ?? 0);
    });
    expect(counts[0]).toHaveLength(6);
    counts[0].forEach((count, index) => expect(Math.abs(count - counts[1][index]), `mode ${index + 1}`).toBeLessThanOrEqual(1));
  });

  it('a run of many short segments adds one sample per segment boundary to its half wavelengths', () => {
    const segments = Array.from({ length: 60 }, (_, index) => ({ lengthM: 0.05 + 0.01 * (index % 3), section: round(0.15 + 0.05 * (index % 2)) }));
    const lengthM = segments.reduce((sum, segment) => sum + segment.lengthM, 0);
    const run = analyzeRun({ segments, start: closed, end: closed, maxHz: 700 });
    for (const resonance of run.resonances) {
      const halfWavelengths = lengthM / (run.speedOfSoundMps / (2 * resonance.frequencyHz));
      const envelope = resonance.pressureEnvelope ?? [];
      // each segment holds ceil(its share of 8 samples per half wavelength) intervals, at least one
      expect(envelope.length).toBeGreaterThanOrEqual(Math.max(segments.length, 8 * halfWavelengths) + 1 - 1e-6);
      expect(envelope.length).toBeLessThanOrEqual(8 * halfWavelengths + segments.length + 1 + 1e-6);
    }
  });

  it('is plain data: survives JSON round trip', () => {
    const run = analyzeRun({ segments: [{ lengthM: 1, section: round(0.1) }], start: closed, end: closed, maxHz: 400 });
    const copy = JSON.parse(JSON.stringify(run)) as typeof run;
    expect(copy.resonances[0].pressureEnvelope).toEqual(run.resonances[0].pressureEnvelope);
    expect(copy.resonances[0].pressureEnvelope?.length).toBeGreaterThan(8);
  });
});

describe('uniform stretches carried as one segment', () => {
  it('merged and segment-by-segment chains give the same start admittance (transfer matrices compose by length, Munjal ch. 2)', () => {
    const segments: Segment[] = Array.from({ length: 30 }, (_, index) => ({
      lengthM: 0.2 + 0.01 * index,
      section: index < 15 ? round(0.2) : { shape: 'rect' as const, widthM: 0.3, heightM: 0.2 },
      ...(index % 10 === 5 ? { branches: [{ segments: [{ lengthM: 0.6, section: round(0.1) }], end: closed }] } : {}),
    }));
    const run: RunInput = { segments, start: closed, end: { kind: 'open', flange: 'flanged' } };
    const merged = createAdmittanceSweeper(run);
    const separate = createAdmittanceSweeper(run, { mergeUniformStretches: false });
    expect(merged.chainLength).toBeLessThan(separate.chainLength);
    const frequencies = Float64Array.from({ length: 40 }, (_, index) => 20 + 9.7 * index);
    const mergedOut = new Float64Array(80);
    const separateOut = new Float64Array(80);
    merged.sweep(frequencies, mergedOut);
    separate.sweep(frequencies, separateOut);
    for (let index = 0; index < 40; index++) {
      const scale = Math.hypot(separateOut[2 * index], separateOut[2 * index + 1]);
      expect(Math.hypot(mergedOut[2 * index] - separateOut[2 * index], mergedOut[2 * index + 1] - separateOut[2 * index + 1]) / scale).toBeLessThan(1e-9);
    }
  });
});
