// A treatment applied to the run: a new RunInput, the original left untouched.
import { inputError, requireAbove, requireBetween } from '../input-error';
import { MIN_SECTION_DIMENSION_M } from '../constants';
import type { RunInput, Segment } from '../types';
import { validateTermination } from '../validate-run';
import type { Treatment } from './treatment-types';

function segmentAt(run: RunInput, index: number | undefined, path: string): number {
  if (index === undefined || !Number.isInteger(index) || index < 0 || index >= run.segments.length) {
    throw inputError(path, `must be a segment index 0..${run.segments.length - 1}`);
  }
  return index;
}

/** Index of the longest main-path segment (the first of equals). */
export function longestSegment(run: RunInput): number {
  return run.segments.reduce((best, segment, index) => (segment.lengthM > run.segments[best].lengthM ? index : best), 0);
}

export function applyTreatment(run: RunInput, treatment: Treatment): RunInput {
  const segments = [...run.segments];
  switch (treatment.kind) {
    case 'line-segment': {
      const index = segmentAt(run, treatment.segmentIndex, 'treatment.segmentIndex');
      const segment = segments[index];
      const lining = {
        thicknessM: requireAbove(treatment.thicknessM, 0, 'treatment.thicknessM'),
        ...(treatment.absorption === undefined ? {} : { absorption: requireBetween(treatment.absorption, 0, 1, 'treatment.absorption') }),
      };
      const linedM = treatment.lengthM === undefined ? segment.lengthM : requireBetween(treatment.lengthM, 0, segment.lengthM, 'treatment.lengthM');
      if (linedM >= segment.lengthM || linedM === 0) {
        segments[index] = linedM === 0 ? segment : { ...segment, lining };
      } else {
        // lined from the segment's start; the tees stay at its far end
        const { branches, ...plain } = segment;
        const rest: Segment = { ...segment, lengthM: segment.lengthM - linedM };
        void branches;
        segments.splice(index, 1, { ...plain, lengthM: linedM, lining }, rest);
      }
      return { ...run, segments };
    }
    case 'change-termination':
      validateTermination(treatment.termination, 'treatment.termination');
      return treatment.end === 'start' ? { ...run, start: treatment.termination } : { ...run, end: treatment.termination };
    case 'retune-length': {
      const index = segmentAt(run, treatment.segmentIndex ?? longestSegment(run), 'treatment.segmentIndex');
      const lengthM = segments[index].lengthM + (treatment.deltaLengthM ?? 0);
      segments[index] = { ...segments[index], lengthM: requireAbove(lengthM, 0, 'treatment.deltaLengthM (resulting length)') };
      return { ...run, segments };
    }
    case 'side-branch-resonator': {
      const index = segmentAt(run, treatment.segmentIndex, 'treatment.segmentIndex');
      const diameterM = requireAbove(treatment.diameterM, MIN_SECTION_DIMENSION_M, 'treatment.diameterM');
      const lengthM = requireAbove(treatment.lengthM, 0, 'treatment.lengthM');
      const resonator = { segments: [{ lengthM, section: { shape: 'round' as const, diameterM } }], end: { kind: 'closed' as const } };
      segments[index] = { ...segments[index], branches: [...(segments[index].branches ?? []), resonator] };
      return { ...run, segments };
    }
  }
}
