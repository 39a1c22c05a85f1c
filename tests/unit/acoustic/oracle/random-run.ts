// fast-check generators of valid runs, shared by the oracle and property tests.
import fc from 'fast-check';
import type { Branch, RunInput, Section, Segment, Termination, Wall } from '@/lib/acoustic';

export const sectionArbitrary: fc.Arbitrary<Section> = fc.oneof(
  fc.record({ shape: fc.constant('round' as const), diameterM: fc.double({ min: 0.05, max: 0.6, noNaN: true }) }),
  fc.record({
    shape: fc.constant('rect' as const),
    widthM: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
    heightM: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
  }),
);

export const terminationArbitrary: fc.Arbitrary<Termination> = fc.oneof(
  fc.constant({ kind: 'closed' as const }),
  fc.constant({ kind: 'anechoic' as const }),
  fc.record({ kind: fc.constant('open' as const), flange: fc.constantFrom('flanged' as const, 'unflanged' as const) }),
  fc.record({ kind: fc.constant('lined' as const), absorption: fc.double({ min: 0, max: 1, noNaN: true }) }),
);

const plainSegment: fc.Arbitrary<Segment> = fc.record(
  {
    lengthM: fc.double({ min: 0.1, max: 3, noNaN: true }),
    section: sectionArbitrary,
    lining: fc.record({ thicknessM: fc.constant(0.025), absorption: fc.double({ min: 0, max: 1, noNaN: true }) }),
  },
  { requiredKeys: ['lengthM', 'section'] },
);

const branchArbitrary: fc.Arbitrary<Branch> = fc.record({
  segments: fc.array(plainSegment, { minLength: 1, maxLength: 2 }),
  end: terminationArbitrary,
});

const segmentArbitrary: fc.Arbitrary<Segment> = fc
  .tuple(plainSegment, fc.option(fc.array(branchArbitrary, { minLength: 1, maxLength: 2 }), { freq: 3 }))
  .map(([segment, branches]) => (branches ? { ...segment, branches } : segment));

/** Rigid walls, or walls measured flat across the bands (the oracle models both). */
export const wallArbitrary: fc.Arbitrary<Wall> = fc.oneof(
  fc.constant({ kind: 'rigid' as const }),
  fc.double({ min: 0, max: 3, noNaN: true }).map((dbPerM) => ({ kind: 'measured' as const, attenuationDbPerM: Array.from({ length: 8 }, () => dbPerM) })),
);

export const runArbitrary: fc.Arbitrary<RunInput> = fc.record({
  walls: wallArbitrary,
  segments: fc.array(segmentArbitrary, { minLength: 1, maxLength: 5 }),
  start: terminationArbitrary,
  end: terminationArbitrary,
  temperatureC: fc.double({ min: -20, max: 40, noNaN: true }),
  minHz: fc.constant(20),
  maxHz: fc.double({ min: 60, max: 300, noNaN: true }),
});

const openEnd = fc.record({ kind: fc.constant('open' as const), flange: fc.constantFrom('flanged' as const, 'unflanged' as const) });

/** A supply run: the section changes at every joint, and side branches end at open outlets (now and then closed). */
const supplySegment: fc.Arbitrary<Segment> = fc
  .tuple(
    fc.double({ min: 0.2, max: 4, noNaN: true }),
    sectionArbitrary,
    fc.option(
      fc.array(
        fc.record({
          segments: fc.array(fc.record({ lengthM: fc.double({ min: 0.1, max: 2, noNaN: true }), section: sectionArbitrary }), { minLength: 1, maxLength: 2 }),
          end: fc.oneof({ arbitrary: openEnd, weight: 4 }, { arbitrary: terminationArbitrary, weight: 1 }),
        }) as fc.Arbitrary<Branch>,
        { minLength: 1, maxLength: 2 },
      ),
      { freq: 2 },
    ),
  )
  .map(([lengthM, section, branches]) => (branches ? { lengthM, section, branches } : { lengthM, section }));

export const supplyRunArbitrary: fc.Arbitrary<RunInput> = fc.record({
  walls: wallArbitrary,
  segments: fc.array(supplySegment, { minLength: 2, maxLength: 8 }),
  start: terminationArbitrary,
  end: fc.oneof({ arbitrary: openEnd, weight: 3 }, { arbitrary: terminationArbitrary, weight: 1 }),
  temperatureC: fc.double({ min: -20, max: 40, noNaN: true }),
  minHz: fc.constant(20),
  maxHz: fc.double({ min: 80, max: 300, noNaN: true }),
});
