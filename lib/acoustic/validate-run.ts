// Validation of a RunInput: throws a RangeError naming the offending field by its path.
import { MIN_SECTION_DIMENSION_M } from './constants';
import { inputError, requireAboveAtMost, requireAtLeast, requireAtMost, requireBetween } from './input-error';
import {
  MAX_AIR_TEMPERATURE_C, MAX_ANALYSIS_HZ, MAX_BRANCH_DEPTH, MAX_ECHOES, MAX_LINING_THICKNESS_M, MAX_RUN_LENGTH_M,
  MAX_RUN_SEGMENTS, MAX_SECTION_DIMENSION_M, MAX_SEGMENT_LENGTH_M, MIN_AIR_TEMPERATURE_C,
} from './input-limits';
import type { RunInput } from './types';
import { validateAnalysisRange } from './validate-range';
import { validateWall } from './walls/wall-attenuation';

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** What the walk over the segments has counted so far. */
interface RunTally {
  segments: number;
  ductLengthM: number;
}

function requireDimension(value: unknown, fieldPath: string): void {
  requireAtLeast(value, MIN_SECTION_DIMENSION_M, fieldPath);
  requireAtMost(value, MAX_SECTION_DIMENSION_M, fieldPath);
}

export function validateSection(section: unknown, path: string): void {
  if (!isRecord(section)) throw inputError(path, 'must be an object');
  if (section.shape === 'round') {
    requireDimension(section.diameterM, `${path}.diameterM`);
  } else if (section.shape === 'rect') {
    requireDimension(section.widthM, `${path}.widthM`);
    requireDimension(section.heightM, `${path}.heightM`);
  } else {
    throw inputError(`${path}.shape`, "must be 'round' or 'rect'");
  }
}

export function validateTermination(termination: unknown, path: string): void {
  if (!isRecord(termination)) throw inputError(path, 'must be an object');
  switch (termination.kind) {
    case 'closed':
    case 'anechoic':
      return;
    case 'lined':
      requireBetween(termination.absorption, 0, 1, `${path}.absorption`);
      return;
    case 'open':
      if (termination.flange !== 'flanged' && termination.flange !== 'unflanged') {
        throw inputError(`${path}.flange`, "must be 'flanged' or 'unflanged'");
      }
      return;
    default:
      throw inputError(`${path}.kind`, "must be 'closed', 'open', 'lined' or 'anechoic'");
  }
}

/** Counts the segment and its length into the tally, refusing the first that takes the run past a limit. */
function countSegment(lengthM: number, tally: RunTally): void {
  tally.segments += 1;
  tally.ductLengthM += lengthM;
  if (tally.segments > MAX_RUN_SEGMENTS) throw inputError('segments', `must hold at most ${MAX_RUN_SEGMENTS} segments, branches included`);
  if (tally.ductLengthM > MAX_RUN_LENGTH_M) throw inputError('segments', `must hold at most ${MAX_RUN_LENGTH_M} m of duct, branches included`);
}

function validateSegments(segments: unknown, path: string, depth: number, tally: RunTally): void {
  if (!Array.isArray(segments)) throw inputError(path, 'must be an array');
  if (segments.length === 0) throw inputError(path, 'must not be empty');
  segments.forEach((segment: unknown, index) => {
    const segmentPath = `${path}[${index}]`;
    if (!isRecord(segment)) throw inputError(segmentPath, 'must be an object');
    countSegment(requireAboveAtMost(segment.lengthM, 0, MAX_SEGMENT_LENGTH_M, `${segmentPath}.lengthM`), tally);
    validateSection(segment.section, `${segmentPath}.section`);
    if (segment.lining !== undefined) {
      const lining = segment.lining;
      if (!isRecord(lining)) throw inputError(`${segmentPath}.lining`, 'must be an object');
      requireAboveAtMost(lining.thicknessM, 0, MAX_LINING_THICKNESS_M, `${segmentPath}.lining.thicknessM`);
      if (lining.absorption !== undefined) requireBetween(lining.absorption, 0, 1, `${segmentPath}.lining.absorption`);
    }
    if (segment.wall !== undefined) validateWall(segment.wall, `${segmentPath}.wall`);
    if (segment.branches !== undefined) {
      if (!Array.isArray(segment.branches)) throw inputError(`${segmentPath}.branches`, 'must be an array');
      if (segment.branches.length > 0 && depth >= MAX_BRANCH_DEPTH) {
        throw inputError(`${segmentPath}.branches`, `must be nested at most ${MAX_BRANCH_DEPTH} deep`);
      }
      segment.branches.forEach((branch: unknown, branchIndex) => {
        const branchPath = `${segmentPath}.branches[${branchIndex}]`;
        if (!isRecord(branch)) throw inputError(branchPath, 'must be an object');
        validateSegments(branch.segments, `${branchPath}.segments`, depth + 1, tally);
        validateTermination(branch.end, `${branchPath}.end`);
      });
    }
  });
}

function validateFrequency(value: unknown, fieldPath: string): void {
  if (value !== undefined) requireAboveAtMost(value, 0, MAX_ANALYSIS_HZ, fieldPath);
}

/** Checks a RunInput; returns it typed, or throws a RangeError whose message names the field. */
export function validateRun(input: unknown): RunInput {
  if (!isRecord(input)) throw inputError('input', 'must be an object');
  if (input.temperatureC !== undefined) requireBetween(input.temperatureC, MIN_AIR_TEMPERATURE_C, MAX_AIR_TEMPERATURE_C, 'temperatureC');
  const tally: RunTally = { segments: 0, ductLengthM: 0 };
  validateSegments(input.segments, 'segments', 0, tally);
  validateTermination(input.start, 'start');
  validateTermination(input.end, 'end');
  validateFrequency(input.minHz, 'minHz');
  validateFrequency(input.maxHz, 'maxHz');
  if (input.minHz !== undefined && input.maxHz !== undefined && !((input.maxHz as number) > (input.minHz as number))) {
    throw inputError('maxHz', 'must be > minHz');
  }
  if (input.walls !== undefined) validateWall(input.walls, 'walls');
  if (input.wallLosses !== undefined && typeof input.wallLosses !== 'boolean') throw inputError('wallLosses', 'must be a boolean');
  if (input.maxEchoes !== undefined) requireBetween(input.maxEchoes, 0, MAX_ECHOES, 'maxEchoes');
  if (input.echoThreshold !== undefined) requireBetween(input.echoThreshold, 1e-12, 1, 'echoThreshold');
  const run = input as unknown as RunInput;
  validateAnalysisRange(run, tally.ductLengthM);
  return run;
}
