// What a run's results assume, in words, for the results panel, the risk list and the schedule.
import { DUCT_FLANKING_CAP_DB, DEFAULT_TEMPERATURE_C } from './constants';
import type { CompiledNetwork } from './network/compile';
import { PROMISED_DAMPING_SPACINGS } from './resonances/natural-frequencies';
import type { RunInput, Segment, Termination, Wall } from './types';
import { DEFAULT_WALL } from './walls/segment-attenuation';

function wallWords(wall: Wall): string {
  switch (wall.kind) {
    case 'rigid':
      return 'rigid (only the air’s own boundary-layer loss: the sharpest case)';
    case 'sheet-metal':
      return 'unlined sheet metal (published attenuation of unlined ducts by size and band)';
    case 'measured':
      return 'measured attenuation as entered';
  }
}

function endWords(termination: Termination): string {
  switch (termination.kind) {
    case 'closed':
      return 'closed (rigid)';
    case 'open':
      return `open, ${termination.flange}`;
    case 'lined':
      return `lined, absorption ${termination.absorption}`;
    case 'anechoic':
      return 'absorbing (no reflection)';
  }
}

function allSegments(segments: readonly Segment[]): Segment[] {
  return segments.flatMap((segment) => [segment, ...(segment.branches ?? []).flatMap((branch) => allSegments(branch.segments))]);
}

export function runAssumptions(input: RunInput): string[] {
  const segments = allSegments(input.segments);
  const runWall = input.walls ?? DEFAULT_WALL;
  const own = segments.filter((segment) => segment.wall !== undefined && segment.wall.kind !== runWall.kind).length;
  const lined = segments.filter((segment) => segment.lining !== undefined);
  const assumptions = [
    input.wallLosses === false
      ? 'Walls: ideal, losing nothing (a check case, not a prediction).'
      : `Walls: ${wallWords(runWall)}${own > 0 ? `; ${own} segment${own === 1 ? '' : 's'} with walls of their own` : ''}.`,
  ];
  if (lined.length > 0) {
    const byThickness = lined.every((segment) => segment.lining?.absorption === undefined);
    assumptions.push(
      `Lining: ${lined.length} segment${lined.length === 1 ? '' : 's'}, ${byThickness ? 'fibrous liner absorbing by band for its thickness' : 'absorption as entered'}; ` +
        `walls and lining together take at most ${DUCT_FLANKING_CAP_DB} dB per segment (flanking).`,
    );
  }
  assumptions.push(`Air at ${(input.temperatureC ?? DEFAULT_TEMPERATURE_C).toFixed(0)} °C; ends: fan end ${endWords(input.start)}, far end ${endWords(input.end)}.`);
  return assumptions;
}

/** Warnings for segments whose walls and lining the flanking cap limited. */
export function flankingWarnings(network: CompiledNetwork): string[] {
  const warnings: string[] = [];
  network.mainSegments.forEach((segment, position) => {
    const bands = network.segmentCappedBandsHz[segment];
    if (bands.length > 0) warnings.push(`segment ${position + 1}: walls and lining limited to ${DUCT_FLANKING_CAP_DB} dB by flanking at ${bands.map((hz) => `${hz} Hz`).join(', ')}`);
  });
  const mainSet = new Set(network.mainSegments);
  const branchCapped = network.segmentCappedBandsHz.filter((bands, segment) => bands.length > 0 && !mainSet.has(segment)).length;
  if (branchCapped > 0) warnings.push(`${branchCapped} branch segment${branchCapped === 1 ? '' : 's'}: walls and lining limited to ${DUCT_FLANKING_CAP_DB} dB by flanking`);
  return warnings;
}

/**
 * Which resonances the list is sure to hold: the search promises every one damped less than half the
 * mean mode spacing c / 2L over all the run's duct (resonances/natural-frequencies.ts).
 */
export function resonanceListAssumption(network: CompiledNetwork): string {
  const spacingHz = network.speedOfSoundMps / (2 * network.totalLengthM);
  const promisedHz = PROMISED_DAMPING_SPACINGS * spacingHz;
  return (
    `Resonances: every one damped less than ${promisedHz.toFixed(1)} Hz (half the mean mode spacing over all ${network.totalLengthM.toFixed(1)} m of duct, branches included, ` +
    'so each stands clear of its neighbours) is listed; more heavily damped, overlapping ones are listed where the search reaches them.'
  );
}
