// The plane-wave cut-off of a whole run: the lowest of its segments', branches included.
import { cutoffHz } from './section';
import type { Segment } from './types';

export function lowestCutoffHz(segments: readonly Segment[], speedOfSoundMps: number): number {
  let lowest = Infinity;
  for (const segment of segments) {
    lowest = Math.min(lowest, cutoffHz(segment.section, speedOfSoundMps));
    for (const branch of segment.branches ?? []) lowest = Math.min(lowest, lowestCutoffHz(branch.segments, speedOfSoundMps));
  }
  return lowest;
}
