// Validation of a RunInput: throws a RangeError naming the offending field by its path.
import { MIN_SECTION_DIMENSION_M, ZERO_CELSIUS_K } from './constants';
import { inputError, requireAbove, requireAtLeast, requireBetween } from './input-error';
import type { RunInput } from './types';

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function validateSection(section: unknown, path: string): void {
  if (!isRecord(section)) throw inputError(path, 'must be an object');
  if (section.shape === 'round') {
    requireAtLeast(section.diameterM, MIN_SECTION_DIMENSION_M, `${path}.diameterM`);
  } else if (section.shape === 'rect') {
    requireAtLeast(section.widthM, MIN_SECTION_DIMENSION_M, `${path}.widthM`);
    requireAtLeast(section.heightM, MIN_SECTION_DIMENSION_M, `${path}.heightM`);
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

function validateSegments(segments: unknown, path: string): void {
  if (!Array.isArray(segments)) throw inputError(path, 'must be an array');
  if (segments.length === 0) throw inputError(path, 'must not be empty');
  segments.forEach((segment: unknown, index) => {
    const segmentPath = `${path}[${index}]`;
    if (!isRecord(segment)) throw inputError(segmentPath, 'must be an object');
    requireAbove(segment.lengthM, 0, `${segmentPath}.lengthM`);
    validateSection(segment.section, `${segmentPath}.section`);
    if (segment.lining !== undefined) {
      const lining = segment.lining;
      if (!isRecord(lining)) throw inputError(`${segmentPath}.lining`, 'must be an object');
      requireAbove(lining.thicknessM, 0, `${segmentPath}.lining.thicknessM`);
      requireBetween(lining.absorption, 0, 1, `${segmentPath}.lining.absorption`);
    }
    if (segment.branches !== undefined) {
      if (!Array.isArray(segment.branches)) throw inputError(`${segmentPath}.branches`, 'must be an array');
      segment.branches.forEach((branch: unknown, branchIndex) => {
        const branchPath = `${segmentPath}.branches[${branchIndex}]`;
        if (!isRecord(branch)) throw inputError(branchPath, 'must be an object');
        validateSegments(branch.segments, `${branchPath}.segments`);
        validateTermination(branch.end, `${branchPath}.end`);
      });
    }
  });
}

/** Checks a RunInput; returns it typed, or throws a RangeError whose message names the field. */
export function validateRun(input: unknown): RunInput {
  if (!isRecord(input)) throw inputError('input', 'must be an object');
  if (input.temperatureC !== undefined) requireAbove(input.temperatureC, -ZERO_CELSIUS_K, 'temperatureC');
  validateSegments(input.segments, 'segments');
  validateTermination(input.start, 'start');
  validateTermination(input.end, 'end');
  if (input.minHz !== undefined) requireAbove(input.minHz, 0, 'minHz');
  if (input.maxHz !== undefined) requireAbove(input.maxHz, 0, 'maxHz');
  if (input.minHz !== undefined && input.maxHz !== undefined && !((input.maxHz as number) > (input.minHz as number))) {
    throw inputError('maxHz', 'must be > minHz');
  }
  if (input.wallLosses !== undefined && typeof input.wallLosses !== 'boolean') throw inputError('wallLosses', 'must be a boolean');
  if (input.maxEchoes !== undefined) requireBetween(input.maxEchoes, 0, 10000, 'maxEchoes');
  if (input.echoThreshold !== undefined) requireBetween(input.echoThreshold, 1e-12, 1, 'echoThreshold');
  return input as unknown as RunInput;
}

