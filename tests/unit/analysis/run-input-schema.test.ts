// The zod description of POST /api/v1/analyze's body agrees with the engine's own check of a run
// (validateRun), field by field: what one accepts the other accepts, what one refuses the other
// refuses. The whole-run limits only the engine can check are listed apart. Behaviour of this
// project (lib/acoustic/input-limits.ts), no outside source.
import { describe, expect, it } from 'vitest';
import { validateRun } from '@/lib/acoustic';
import { runInputSchema } from '@/lib/analysis/run-input-schema';
import { QUARTER_WAVE_RUN } from '@/lib/api-description/examples';

const round = (diameterM: number) => ({ shape: 'round', diameterM });
const base = { segments: [{ lengthM: 2, section: round(0.2) }], start: { kind: 'closed' }, end: { kind: 'open', flange: 'flanged' }, maxHz: 300 };

const ACCEPTED: Record<string, unknown> = {
  'the reference page\'s example': QUARTER_WAVE_RUN,
  'a plain run': base,
  'a branched, lined run with its own walls': {
    temperatureC: -5,
    segments: [
      { lengthM: 4, section: { shape: 'rect', widthM: 0.6, heightM: 0.4 }, lining: { thicknessM: 0.025 }, wall: { kind: 'rigid' },
        branches: [{ segments: [{ lengthM: 1.5, section: round(0.25), lining: { thicknessM: 0.05, absorption: 0.7 } }], end: { kind: 'lined', absorption: 0.4 } }] },
      { lengthM: 2, section: round(0.315), wall: { kind: 'measured', attenuationDbPerM: [0.3, 0.2, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1] } },
    ],
    start: { kind: 'anechoic' }, end: { kind: 'open', flange: 'unflanged' }, minHz: 20, maxHz: 400, walls: { kind: 'sheet-metal' }, wallLosses: true, maxEchoes: 10, echoThreshold: 0.01,
  },
};

const REFUSED: Record<string, unknown> = {
  'no segments': { ...base, segments: [] },
  'a negative length': { ...base, segments: [{ lengthM: -1, section: round(0.2) }] },
  'a segment over 500 m': { ...base, segments: [{ lengthM: 501, section: round(0.2) }] },
  'a diameter under 10 mm': { ...base, segments: [{ lengthM: 2, section: round(0.005) }] },
  'a side over 10 m': { ...base, segments: [{ lengthM: 2, section: { shape: 'rect', widthM: 11, heightM: 0.2 } }] },
  'an unknown shape': { ...base, segments: [{ lengthM: 2, section: { shape: 'oval', diameterM: 0.2 } }] },
  'an unknown end': { ...base, end: { kind: 'horn' } },
  'an open end without its flange': { ...base, end: { kind: 'open' } },
  'a lined end absorbing more than everything': { ...base, end: { kind: 'lined', absorption: 1.5 } },
  'air at 100 °C': { ...base, temperatureC: 100 },
  'maxHz above hearing': { ...base, maxHz: 30000 },
  'a measured wall with 7 bands': { ...base, walls: { kind: 'measured', attenuationDbPerM: [1, 1, 1, 1, 1, 1, 1] } },
  '600 echoes': { ...base, maxEchoes: 600 },
  'a lining 2 m thick': { ...base, segments: [{ lengthM: 2, section: round(0.2), lining: { thicknessM: 2 } }] },
  'wallLosses as text': { ...base, wallLosses: 'no' },
};

function engineAccepts(body: unknown): boolean {
  try { validateRun(structuredClone(body)); return true; } catch (error) { if (error instanceof RangeError) return false; throw error; }
}

describe('runInputSchema and the engine agree', () => {
  for (const [name, body] of Object.entries(ACCEPTED)) {
    it(`both accept ${name}`, () => {
      expect(runInputSchema.safeParse(body).success).toBe(true);
      expect(engineAccepts(body)).toBe(true);
    });
  }
  for (const [name, body] of Object.entries(REFUSED)) {
    it(`both refuse ${name}`, () => {
      expect(runInputSchema.safeParse(body).success).toBe(false);
      expect(engineAccepts(body)).toBe(false);
    });
  }
  it('only the engine refuses what depends on the whole run: maxHz above twice the plane-wave cut-off', () => {
    // Ø 200 mm: cut-off 1.841 c / π d ≈ 1006 Hz (Kinsler et al., ch. 9, first (1,1) mode; from memory), so 2500 Hz is past twice it.
    const body = { ...base, maxHz: 2500 };
    expect(runInputSchema.safeParse(body).success).toBe(true);
    expect(engineAccepts(body)).toBe(false);
  });
});
