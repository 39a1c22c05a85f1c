// fast-check generators of valid noise paths for the property tests.
import fc from 'fast-check';
import type { NoisePathInput, PathElement, Section } from '@/lib/acoustic';

const size = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const eightBands = (max: number) => fc.array(size(0, max), { minLength: 8, maxLength: 8 });

export const sectionArbitrary: fc.Arbitrary<Section> = fc.oneof(
  fc.record({ shape: fc.constant('round' as const), diameterM: size(0.05, 2) }),
  fc.record({ shape: fc.constant('rect' as const), widthM: size(0.05, 2), heightM: size(0.05, 2) }),
);

const ductArbitrary: fc.Arbitrary<PathElement> = fc.record(
  {
    kind: fc.constant('duct' as const),
    section: sectionArbitrary,
    lengthM: size(0.1, 200),
    wall: fc.oneof(
      fc.constant({ kind: 'rigid' as const }),
      fc.constant({ kind: 'sheet-metal' as const }),
      fc.record({ kind: fc.constant('measured' as const), attenuationDbPerM: eightBands(3) }),
    ),
    lining: fc.record({ thicknessM: size(0.005, 0.1) }),
  },
  { requiredKeys: ['kind', 'section', 'lengthM'] },
);

const elbowArbitrary: fc.Arbitrary<PathElement> = fc
  .record({ section: sectionArbitrary, vanes: fc.boolean(), lined: fc.boolean(), radius: fc.boolean() })
  .map(({ section, vanes, lined, radius }) => ({ kind: 'elbow' as const, section, lined, radius, vanes: radius ? false : vanes }));

const splitArbitrary: fc.Arbitrary<PathElement> = fc
  .record({ totalAreaM2: size(0.01, 4), share: size(0.01, 1) })
  .map(({ totalAreaM2, share }) => ({ kind: 'split' as const, totalAreaM2, branchAreaM2: totalAreaM2 * share }));

const plenumArbitrary: fc.Arbitrary<PathElement> = fc.record({
  kind: fc.constant('plenum' as const),
  outletAreaM2: size(0.01, 4),
  surfaceAreaM2: size(1, 60),
  absorption: size(0.01, 1),
  distanceM: size(0.1, 5),
  angleDeg: size(0, 90),
});

export const elementArbitrary: fc.Arbitrary<PathElement> = fc.oneof(
  ductArbitrary,
  elbowArbitrary,
  splitArbitrary,
  plenumArbitrary,
  fc.record({ kind: fc.constant('silencer' as const), insertionLossDb: eightBands(50) }),
  fc.record({ kind: fc.constant('outlet' as const), diameterM: size(0.05, 1.5), mounting: fc.constantFrom('flush' as const, 'free' as const) }),
  fc.record({ kind: fc.constant('loss' as const), label: fc.string(), lossDb: eightBands(30) }),
);

export const noisePathArbitrary: fc.Arbitrary<NoisePathInput> = fc.record({
  soundPowerDb: fc.array(size(40, 110), { minLength: 8, maxLength: 8 }),
  elements: fc.array(elementArbitrary, { maxLength: 8 }),
  room: fc.record({ volumeM3: size(20, 5000), distanceM: size(0.5, 20) }),
});
