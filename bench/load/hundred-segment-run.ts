// The run the analysis answer is sized and timed on: 100 segments of 0.40–0.50 m from a closed fan end
// to an open unflanged end, the section changing at three joints in four (round and rectangular, 200–400 mm), a
// two-segment open-ended side branch after every 20th segment, analysed from 20 to 400 Hz
// (about 45 m along its path and some 110 resonances).
import type { RunInput, Segment } from '@/lib/acoustic';

export const HUNDRED_SEGMENTS = 100;
export const BRANCH_EVERY = 20;

export function hundredSegmentRun(): RunInput {
  const segments: Segment[] = Array.from({ length: HUNDRED_SEGMENTS }, (_, index) => {
    const step = Math.floor((index * 3) / 4);
    const sideM = 0.2 + ((step * 7) % 5) * 0.05;
    const section = step % 3 === 2 ? { shape: 'rect' as const, widthM: sideM + 0.1, heightM: sideM } : { shape: 'round' as const, diameterM: sideM };
    const segment: Segment = { lengthM: 0.4 + 0.05 * (index % 3), section };
    if ((index + 1) % BRANCH_EVERY === 0 && index < HUNDRED_SEGMENTS - 1) {
      segment.branches = [{
        segments: [{ lengthM: 1, section: { shape: 'round', diameterM: 0.15 } }, { lengthM: 1, section: { shape: 'round', diameterM: 0.125 } }],
        end: { kind: 'open', flange: 'unflanged' },
      }];
    }
    return segment;
  });
  return { segments, start: { kind: 'closed' }, end: { kind: 'open', flange: 'unflanged' }, minHz: 20, maxHz: 400 };
}
