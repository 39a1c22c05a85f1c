// The harder runs of the resonance-search benchmark: sections that change at most joints, side branches
// that end open (outlets), 50 to 800 segments, and ranges up to 1.6 kHz within the plane-wave cut-off.
import type { RunInput, Section, Segment, Termination, Wall } from '../lib/acoustic';

export interface HarderRunOptions {
  segmentCount: number;
  /** The section changes at most joints (a reducer or a transition), or stays one section in stretches of 20. */
  sections: 'changing' | 'uniform';
  branchEnd: 'open' | 'closed';
  maxHz: number;
  walls?: Wall;
  /** Small ducts (about 100 mm), whose cut-off lies above 1.6 kHz. */
  small?: boolean;
}

/** Deterministic pseudo-random numbers in [0, 1) (a linear congruential generator; common practice, no source). */
function generator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

const LARGE_SECTIONS: Section[] = [
  { shape: 'rect', widthM: 0.3, heightM: 0.2 },
  { shape: 'round', diameterM: 0.25 },
  { shape: 'rect', widthM: 0.25, heightM: 0.2 },
  { shape: 'round', diameterM: 0.2 },
  { shape: 'rect', widthM: 0.3, heightM: 0.15 },
  { shape: 'round', diameterM: 0.3 },
];
const SMALL_SECTIONS: Section[] = [
  { shape: 'round', diameterM: 0.1 },
  { shape: 'round', diameterM: 0.12 },
  { shape: 'rect', widthM: 0.1, heightM: 0.08 },
  { shape: 'round', diameterM: 0.09 },
  { shape: 'rect', widthM: 0.1, heightM: 0.1 },
];

/** A supply run of segmentCount segments (about 0.3 m each) with a two-segment side branch every 20 segments. */
export function harderRun(options: HarderRunOptions): RunInput {
  const random = generator(options.segmentCount * 7919 + (options.small ? 1 : 0));
  const sections = options.small ? SMALL_SECTIONS : LARGE_SECTIONS;
  const branchSections: Section[] = options.small
    ? [{ shape: 'round', diameterM: 0.08 }, { shape: 'round', diameterM: 0.06 }]
    : [{ shape: 'round', diameterM: 0.15 }, { shape: 'round', diameterM: 0.1 }];
  const end: Termination = options.branchEnd === 'open' ? { kind: 'open', flange: 'flanged' } : { kind: 'closed' };
  const segments: Segment[] = [];
  let section = sections[0];
  for (let index = 0; index < options.segmentCount; index++) {
    const changes = options.sections === 'changing' ? random() < 0.8 : index % 20 === 0;
    if (changes) {
      const next = sections[Math.floor(random() * sections.length)];
      section = next === section ? sections[(sections.indexOf(next) + 1) % sections.length] : next;
    }
    const segment: Segment = { lengthM: 0.2 + 0.2 * random(), section };
    if (index % 20 === 10) {
      segment.branches = [
        {
          segments: [
            { lengthM: 0.5 + random(), section: branchSections[0] },
            { lengthM: 0.3 + 0.4 * random(), section: branchSections[1] },
          ],
          end,
        },
      ];
    }
    segments.push(segment);
  }
  return {
    segments,
    start: { kind: 'closed' },
    end: { kind: 'open', flange: 'unflanged' },
    minHz: 20,
    maxHz: options.maxHz,
    ...(options.walls ? { walls: options.walls } : {}),
  };
}
