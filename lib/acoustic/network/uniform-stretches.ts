// Uniform stretches: consecutive segments of one section, wall and lining with no tee between them carry a
// plane wave exactly as one segment of their summed length (the transfer matrices of a uniform duct
// compose by adding lengths, Munjal, Acoustics of Ducts and Mufflers, ch. 2), so the chain runs once per stretch.
import type { CompiledBranch } from './compile';

/** Per-segment constants as the compiler holds them. */
export interface SegmentConstants {
  lengths: number[];
  impedances: number[];
  kirchhoff: number[];
  /** Band attenuation of each segment (walls and lining). */
  bandNp: number[][];
}

/** Consecutive main-path segments of one section and lining with no tee between them. */
export interface MainStretch {
  /** A segment of the stretch, for its section constants. */
  segment: number;
  lengthM: number;
  /** Tees at the stretch's far end. */
  branches: CompiledBranch[];
}

export function sameUniformDuct(constants: SegmentConstants, first: number, second: number): boolean {
  return (
    constants.impedances[first] === constants.impedances[second] &&
    constants.kirchhoff[first] === constants.kirchhoff[second] &&
    constants.bandNp[first].every((value, band) => value === constants.bandNp[second][band])
  );
}

/** The main path as uniform stretches, start to end. */
export function mergeMainStretches(constants: SegmentConstants, segments: number[], branches: CompiledBranch[][]): MainStretch[] {
  const stretches: MainStretch[] = [];
  segments.forEach((segment, position) => {
    const last = stretches[stretches.length - 1];
    if (last !== undefined && last.branches.length === 0 && sameUniformDuct(constants, last.segment, segment)) {
      last.lengthM += constants.lengths[segment];
      last.branches = branches[position];
    } else {
      stretches.push({ segment, lengthM: constants.lengths[segment], branches: branches[position] });
    }
  });
  return stretches;
}
