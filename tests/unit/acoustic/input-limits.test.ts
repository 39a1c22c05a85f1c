// The engine's physical limits (lib/acoustic/input-limits.ts), at each bound and just past it. The
// limits are product rules: common practice, no source. Cut-off frequencies from Kinsler & Frey,
// Fundamentals of Acoustics, ch. 9 (round duct: 1.84118 c / (pi d)).
import { describe, expect, it } from 'vitest';
import {
  analyzeRoom, analyzeRun, bladePassHarmonicsHz, bladePassHz, cutoffHz, imageSources, MAX_BRANCH_DEPTH, MAX_ECHOES, MAX_RESONANCES,
  MAX_ROOM_MODE_CANDIDATES, MAX_RUN_SEGMENTS, roomModes, speedOfSound, validateRun, type Branch, type RunInput, type Segment,
} from '@/lib/acoustic';
import { axialRoomModes } from '@/lib/acoustic/room-modes';

const round = (diameterM: number) => ({ shape: 'round' as const, diameterM });
const duct = (lengthM: number, diameterM = 0.2): Segment => ({ lengthM, section: round(diameterM) });
const run = (segments: Segment[], extra: Partial<RunInput> = {}): RunInput => ({ segments, start: { kind: 'closed' }, end: { kind: 'open', flange: 'flanged' }, ...extra });

function messageOf(action: () => unknown): string {
  try {
    action();
  } catch (error) {
    return (error as Error).message;
  }
  return 'no error';
}

/** A side branch nested `depth` levels deep off the first segment. */
function nested(depth: number): RunInput {
  let branch: Branch = { segments: [duct(0.5, 0.1)], end: { kind: 'closed' } };
  for (let level = 1; level < depth; level++) branch = { segments: [{ ...duct(0.5, 0.1), branches: [branch] }], end: { kind: 'closed' } };
  return run([{ ...duct(1), branches: [branch] }, duct(1)]);
}

describe('run input limits (RangeError naming the field and the limit)', () => {
  it('one segment up to 500 m; the 1000 m of the measured abuse case is refused', () => {
    expect(() => validateRun(run([duct(500, 1)]))).not.toThrow();
    expect(() => analyzeRun(run([duct(1000)]))).toThrow(new RangeError('segments[0].lengthM must be <= 500'));
    expect(() => analyzeRun(run([duct(2), duct(2), duct(500.5, 1)]))).toThrow(new RangeError('segments[2].lengthM must be <= 500'));
  });

  it('at most 2000 m of duct and 2000 segments in a run, branches included', () => {
    expect(() => validateRun(run([duct(450, 1), duct(450, 1), duct(450, 1), duct(450, 1), duct(200, 1)], { maxHz: 100 }))).not.toThrow();
    expect(() => validateRun(run([duct(450, 1), duct(450, 1), duct(450, 1), duct(450, 1), { ...duct(150, 1), branches: [{ segments: [duct(60, 1)], end: { kind: 'closed' } }] }])))
      .toThrow(new RangeError('segments must hold at most 2000 m of duct, branches included'));
    expect(() => validateRun(run(Array.from({ length: MAX_RUN_SEGMENTS }, () => duct(0.1))))).not.toThrow();
    expect(() => validateRun(run(Array.from({ length: MAX_RUN_SEGMENTS + 1 }, () => duct(0.1))))).toThrow(new RangeError(`segments must hold at most ${MAX_RUN_SEGMENTS} segments, branches included`));
  });

  it(`branches nested up to ${MAX_BRANCH_DEPTH} deep`, () => {
    expect(() => validateRun(nested(MAX_BRANCH_DEPTH))).not.toThrow();
    const path = `segments[0]${'.branches[0].segments[0]'.repeat(MAX_BRANCH_DEPTH)}.branches`;
    expect(() => validateRun(nested(MAX_BRANCH_DEPTH + 1))).toThrow(new RangeError(`${path} must be nested at most ${MAX_BRANCH_DEPTH} deep`));
  });

  it('maxHz up to twice the plane-wave cut-off, with the warning above the cut-off; beyond it refused', () => {
    const input = run([duct(3)], { temperatureC: 20 });
    const cutoff = cutoffHz(round(0.2), speedOfSound(20));
    const warned = analyzeRun({ ...input, maxHz: 1.5 * cutoff });
    expect(warned.warnings.some((warning) => warning.includes('above the plane-wave cut-off'))).toBe(true);
    expect(() => validateRun({ ...input, maxHz: 2 * cutoff })).not.toThrow();
    expect(() => analyzeRun({ ...input, maxHz: 10000 })).toThrow(
      new RangeError(`maxHz must be <= ${(2 * cutoff).toFixed(1)} (2 × the run's plane-wave cut-off, ${cutoff.toFixed(1)} Hz): higher-order modes propagate there`),
    );
  });

  it('frequencies at most 20 kHz, the upper limit of hearing', () => {
    const thin = run([duct(0.5, 0.01)]);
    expect(() => validateRun({ ...thin, maxHz: 20000 })).not.toThrow();
    expect(() => validateRun({ ...thin, maxHz: 20001 })).toThrow(new RangeError('maxHz must be <= 20000'));
    expect(() => validateRun({ ...thin, minHz: 30000 })).toThrow(new RangeError('minHz must be <= 20000'));
  });

  it(`no more than about ${MAX_RESONANCES} resonances below maxHz (2 L f / c for L metres of duct)`, () => {
    // 300 m of 200 mm duct up to its cut-off: about 2 * 300 * 1006 / 343 = 1760 resonances
    expect(() => validateRun(run([duct(300)], { temperatureC: 20 }))).not.toThrow();
    const long = run([duct(400)], { temperatureC: 20 });
    const allowedHz = (MAX_RESONANCES * speedOfSound(20)) / (2 * 400);
    expect(() => validateRun(long)).toThrow(new RangeError(
      `maxHz must be <= ${allowedHz.toFixed(1)} for a run with 400 m of duct, branches included (below ${cutoffHz(round(0.2), speedOfSound(20)).toFixed(1)} Hz ` +
        `it has about ${Math.round((2 * 400 * cutoffHz(round(0.2), speedOfSound(20))) / speedOfSound(20))} resonances; an analysis lists at most ${MAX_RESONANCES}): lower maxHz or shorten the run`,
    ));
    expect(() => validateRun({ ...long, maxHz: allowedHz })).not.toThrow();
  });

  it(`at most ${MAX_ECHOES} echoes; the measured 10000 is refused`, () => {
    expect(analyzeRun(run([duct(3)], { maxEchoes: MAX_ECHOES, walls: { kind: 'rigid' }, echoThreshold: 1e-12 })).echoes).toHaveLength(MAX_ECHOES);
    expect(() => analyzeRun(run([duct(3)], { maxEchoes: 10000 }))).toThrow(new RangeError(`maxEchoes must be between 0 and ${MAX_ECHOES}`));
  });

  it('air from -40 °C to 60 °C; absolute zero is refused', () => {
    expect(() => validateRun(run([duct(3)], { temperatureC: -40 }))).not.toThrow();
    expect(() => validateRun(run([duct(3)], { temperatureC: 60 }))).not.toThrow();
    expect(() => analyzeRun(run([duct(3)], { temperatureC: -273.15 }))).toThrow(new RangeError('temperatureC must be between -40 and 60'));
  });

  it('sections up to 10 m, linings up to 1 m thick', () => {
    expect(() => validateRun(run([duct(3, 10)]))).not.toThrow();
    expect(() => validateRun(run([duct(3, 10.5)]))).toThrow(new RangeError('segments[0].section.diameterM must be <= 10'));
    expect(() => validateRun(run([{ ...duct(3, 2), lining: { thicknessM: 1.5, absorption: 0.5 } }]))).toThrow(new RangeError('segments[0].lining.thicknessM must be <= 1'));
  });
});

describe('room and fan limits', () => {
  const hall = { lengthM: 200, widthM: 200, heightM: 50, temperatureC: 20 };

  it('rooms up to 200 × 200 × 50 m and -40 °C to 60 °C', () => {
    expect(() => roomModes({ ...hall, heightM: 60 }, 20)).toThrow(new RangeError('heightM must be <= 50'));
    expect(() => roomModes({ ...hall, lengthM: 250 }, 20)).toThrow(new RangeError('lengthM must be <= 200'));
    expect(() => roomModes({ ...hall, temperatureC: -100 }, 20)).toThrow(new RangeError('temperatureC must be between -40 and 60'));
  });

  it(`a mode list tries at most ${MAX_ROOM_MODE_CANDIDATES} index combinations; the message gives the highest frequency allowed`, () => {
    const message = messageOf(() => roomModes(hall, 1000));
    expect(message).toMatch(/^maxHz must be <= \d+\.\d for a room of 200 × 200 × 50 m \(its modes up to 1000 Hz would take more than 200000 index combinations to list\)$/);
    const limitHz = Number(/<= (\d+\.\d)/.exec(message)?.[1]);
    expect(roomModes(hall, limitHz).length).toBeGreaterThan(0);
    expect(() => roomModes(hall, limitHz + 0.2)).toThrow(RangeError);
  });

  it('a room analysis lists modes only as far as a list may go, whatever its Schroeder frequency', () => {
    const surfaces = Object.fromEntries(['floor', 'ceiling', 'wallXMin', 'wallXMax', 'wallYMin', 'wallYMax'].map((name) => [name, Array(8).fill(0.001)]));
    const input = { box: hall, surfaces: surfaces as never, criterionNc: 30, outlet: { xM: 1, yM: 1, zM: 1 }, listener: { xM: 10, yM: 10, zM: 1.2 } };
    const analysis = analyzeRoom(input);
    // the default list goes to twice the Schroeder frequency, at least 100 Hz (with the air's absorption even this
    // nearly bare hall has f_s near 10 Hz); here the cap on index combinations stops it first
    expect(Math.max(100, analysis.schroederHz * 2)).toBeGreaterThan(analysis.modes.at(-1)?.frequencyHz ?? 0);
    expect(() => analyzeRoom(input, { maxModeHz: 1000 })).toThrow(/^maxModeHz must be <= /);
    expect(() => imageSources(hall, input.surfaces, input.outlet, input.listener, 11)).toThrow(new RangeError('maxOrder must be <= 10'));
  });

  it('axial modes alone are the axial modes of the full list, in the same order', () => {
    const room = { lengthM: 7.3, widthM: 5.1, heightM: 3.2, temperatureC: 18 };
    expect(axialRoomModes(room, 400)).toEqual(roomModes(room, 400).filter((mode) => mode.type === 'axial'));
  });

  it('fans up to 100 blades, 10 000 rpm and 20 harmonics', () => {
    expect(bladePassHz(100, 10000)).toBeCloseTo((100 * 10000) / 60, 9);
    expect(() => bladePassHz(8, 20000)).toThrow(new RangeError('rpm must be <= 10000'));
    expect(() => bladePassHz(101, 1000)).toThrow(new RangeError('bladeCount must be <= 100'));
    expect(() => bladePassHarmonicsHz(8, 1000, 1e9)).toThrow(new RangeError('harmonicCount must be <= 20'));
  });
});
