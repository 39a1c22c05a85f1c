import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeRun, type RunInput } from '@/lib/acoustic';
import { runArbitrary } from './oracle/random-run';

const valid = (): RunInput => ({
  segments: [
    { lengthM: 1, section: { shape: 'round', diameterM: 0.2 } },
    {
      lengthM: 1,
      section: { shape: 'rect', widthM: 0.3, heightM: 0.2 },
      branches: [{ segments: [{ lengthM: 0.5, section: { shape: 'round', diameterM: 0.1 } }, { lengthM: 0.5, section: { shape: 'round', diameterM: 0.1 } }], end: { kind: 'closed' } }],
    },
    { lengthM: 1, section: { shape: 'round', diameterM: 0.2 } },
  ],
  start: { kind: 'closed' },
  end: { kind: 'open', flange: 'unflanged' },
});

function throwsNaming(mutate: (input: RunInput & Record<string, unknown>) => void, message: string) {
  const input = valid() as RunInput & Record<string, unknown>;
  mutate(input);
  expect(() => analyzeRun(input)).toThrow(RangeError);
  expect(() => analyzeRun(input)).toThrow(message);
}

describe('input validation (RangeError naming the field by its path)', () => {
  it('lengths must be > 0', () => {
    throwsNaming((input) => (input.segments[2].lengthM = -1), 'segments[2].lengthM must be > 0');
    throwsNaming((input) => (input.segments[0].lengthM = 0), 'segments[0].lengthM must be > 0');
  });

  it('sections under 10 mm, including inside branches', () => {
    throwsNaming((input) => {
      const branch = input.segments[1].branches?.[0];
      if (branch) branch.segments[1].section = { shape: 'round', diameterM: 0.005 };
    }, 'segments[1].branches[0].segments[1].section.diameterM must be >= 0.01');
    throwsNaming((input) => (input.segments[1].section = { shape: 'rect', widthM: 0.3, heightM: 0.009 }), 'segments[1].section.heightM must be >= 0.01');
  });

  it('NaN and Infinity anywhere', () => {
    throwsNaming((input) => (input.segments[1].lengthM = NaN), 'segments[1].lengthM must be a finite number');
    throwsNaming((input) => (input.segments[0].section = { shape: 'round', diameterM: Infinity }), 'segments[0].section.diameterM must be a finite number');
    throwsNaming((input) => (input.temperatureC = NaN), 'temperatureC must be a finite number');
    throwsNaming((input) => (input.maxHz = Infinity), 'maxHz must be a finite number');
  });

  it('absorption outside 0..1', () => {
    throwsNaming((input) => (input.end = { kind: 'lined', absorption: 1.2 }), 'end.absorption must be between 0 and 1');
    throwsNaming((input) => (input.segments[2].lining = { thicknessM: 0.025, absorption: -0.1 }), 'segments[2].lining.absorption must be between 0 and 1');
  });

  it('empty run, empty branch, unknown termination kind or shape', () => {
    throwsNaming((input) => (input.segments = []), 'segments must not be empty');
    throwsNaming((input) => {
      const branch = input.segments[1].branches?.[0];
      if (branch) branch.segments = [];
    }, 'segments[1].branches[0].segments must not be empty');
    throwsNaming((input) => ((input as Record<string, unknown>).start = { kind: 'open-ish' }), "start.kind must be 'closed', 'open', 'lined' or 'anechoic'");
    throwsNaming((input) => {
      const branch = input.segments[1].branches?.[0];
      if (branch) (branch as unknown as Record<string, unknown>).end = { kind: 'open', flange: 'sideways' };
    }, "segments[1].branches[0].end.flange must be 'flanged' or 'unflanged'");
    throwsNaming((input) => ((input.segments[0] as unknown as Record<string, unknown>).section = { shape: 'oval', diameterM: 0.2 }), "segments[0].section.shape must be 'round' or 'rect'");
  });

  it('property: any valid random run analyses without throwing and returns finite numbers', () => {
    fc.assert(
      fc.property(runArbitrary, (run) => {
        const analysis = analyzeRun(run);
        const numbers: number[] = [analysis.speedOfSoundMps, analysis.lengthM, analysis.cutoffHz, analysis.endCorrectionM.start, analysis.endCorrectionM.end];
        for (const resonance of analysis.resonances) {
          numbers.push(resonance.frequencyHz, resonance.dampingHz, ...resonance.nodesM, ...resonance.antinodesM);
          if (resonance.q !== null) numbers.push(resonance.q);
          if (resonance.bandwidthHz !== null) numbers.push(resonance.bandwidthHz);
          expect(resonance.frequencyHz).toBeGreaterThanOrEqual(analysis.minHz);
          expect(resonance.frequencyHz).toBeLessThanOrEqual(analysis.maxHz);
        }
        for (const reflection of analysis.reflections) for (const band of reflection.bands) numbers.push(band.magnitude, band.phaseRad);
        for (const echo of analysis.echoes) numbers.push(echo.delayS, echo.amplitude);
        expect(numbers.every(Number.isFinite)).toBe(true);
        // numbered from the run's lowest mode, so consecutive from wherever minHz starts the list
        analysis.resonances.forEach((resonance, index) => expect(resonance.order).toBe((analysis.resonances[0]?.order ?? 1) + index));
      }),
      { numRuns: 80, seed: 42 },
    );
  });

  it('property: a bad length or diameter anywhere in a random run throws a RangeError naming that field', () => {
    fc.assert(
      fc.property(runArbitrary, fc.nat(), fc.constantFrom(-1, 0, NaN, Infinity), (run, pick, bad) => {
        const index = pick % run.segments.length;
        const broken = structuredClone(run);
        broken.segments[index].lengthM = bad;
        const expected = Number.isFinite(bad) ? `segments[${index}].lengthM must be > 0` : `segments[${index}].lengthM must be a finite number`;
        expect(() => analyzeRun(broken)).toThrow(new RangeError(expected));
      }),
      { numRuns: 50, seed: 3 },
    );
  });
});
