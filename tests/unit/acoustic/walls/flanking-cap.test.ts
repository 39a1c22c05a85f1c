// No predicted level comes from an uncapped attenuation: walls and lining together take at most 40 dB per
// segment or duct element in any band, whatever the run (flanking; common practice, no source).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { airProperties, DUCT_FLANKING_CAP_DB, noisePath, type RunInput, type Segment } from '@/lib/acoustic';
import { DB_PER_NEPER, OCTAVE_BANDS_HZ } from '@/lib/acoustic/constants';
import { pathAttenuationDb } from '@/lib/acoustic/room/outlet-level';
import { sectionArea, sectionPerimeter } from '@/lib/acoustic/section';
import { kirchhoffAttenuationNpPerM } from '@/lib/acoustic/wall-losses';
import { segmentAttenuation } from '@/lib/acoustic/walls/segment-attenuation';
import { sectionArbitrary } from '../oracle/random-run';

const wall = fc.oneof(
  fc.constant({ kind: 'sheet-metal' as const }),
  fc.constant({ kind: 'rigid' as const }),
  fc.array(fc.double({ min: 0, max: 50, noNaN: true }), { minLength: 8, maxLength: 8 }).map((attenuationDbPerM) => ({ kind: 'measured' as const, attenuationDbPerM })),
);
const lining = fc.record(
  { thicknessM: fc.double({ min: 0.005, max: 0.2, noNaN: true }), absorption: fc.double({ min: 0, max: 1, noNaN: true }) },
  { requiredKeys: ['thicknessM'] },
);
const segment: fc.Arbitrary<Segment> = fc.record(
  { lengthM: fc.double({ min: 0.1, max: 60, noNaN: true }), section: sectionArbitrary, lining, wall },
  { requiredKeys: ['lengthM', 'section'] },
);
const run: fc.Arbitrary<RunInput> = fc.record({
  segments: fc.array(segment, { minLength: 1, maxLength: 6 }),
  walls: wall,
  start: fc.constant({ kind: 'closed' as const }),
  end: fc.constant({ kind: 'open' as const, flange: 'unflanged' as const }),
});

describe('the flanking cap holds everywhere (property, random runs)', () => {
  it('each segment: walls and lining take at most 40 dB in every band, and the path no more than the sum of its caps and the air', () => {
    const air = airProperties(20);
    fc.assert(
      fc.property(run, (input) => {
        const airDb = OCTAVE_BANDS_HZ.map((hz) => input.segments.reduce((sum, piece) => sum + kirchhoffAttenuationNpPerM(hz, sectionPerimeter(piece.section), sectionArea(piece.section), air) * DB_PER_NEPER * piece.lengthM, 0));
        for (const piece of input.segments) {
          for (const npPerM of segmentAttenuation(piece, input.walls, true).npPerM) expect(npPerM * DB_PER_NEPER * piece.lengthM).toBeLessThanOrEqual(DUCT_FLANKING_CAP_DB + 1e-9);
        }
        pathAttenuationDb(input).forEach((lossDb, band) => expect(lossDb).toBeLessThanOrEqual(DUCT_FLANKING_CAP_DB * input.segments.length + airDb[band] + 1e-9));
      }),
      { numRuns: 200, seed: 11 },
    );
  });

  it('the noise path: a duct element never takes more than 40 dB in a band', () => {
    fc.assert(
      fc.property(fc.array(segment, { minLength: 1, maxLength: 6 }), (pieces) => {
        const result = noisePath({
          soundPowerDb: [90, 90, 90, 90, 90, 90, 90, 90],
          elements: pieces.map((piece) => ({ kind: 'duct' as const, section: piece.section, lengthM: piece.lengthM, ...(piece.wall ? { wall: piece.wall } : {}), ...(piece.lining ? { lining: { thicknessM: piece.lining.thicknessM } } : {}) })),
          room: { volumeM3: 200, distanceM: 3 },
        });
        for (const step of result.steps) for (const lossDb of step.lossDb) expect(lossDb).toBeLessThanOrEqual(DUCT_FLANKING_CAP_DB + 1e-9);
      }),
      { numRuns: 100, seed: 12 },
    );
  });
});
