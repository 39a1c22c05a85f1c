// Compiles a run (main path plus nested side branches) into flat arrays and a small stack program
// that the evaluator runs at each frequency without allocating.
import { airProperties, type AirProperties } from '../air';
import { DEFAULT_TEMPERATURE_C } from '../constants';
import { lowFrequencyEndCorrectionM, terminationReflection } from '../terminations';
import { equivalentRadiusM, sectionArea, sectionPerimeter } from '../section';
import { branchMouthCorrectionM } from '../tee-junction';
import { kirchhoffAttenuationPerSqrtHz } from '../wall-losses';
import { segmentAttenuation } from '../walls/segment-attenuation';
import type { RunInput, Segment, Termination, Wall } from '../types';
import { BAND_COUNT, bandCurveSlopes } from './band-curve';
import { mergeMainStretches, sameUniformDuct, type MainStretch } from './uniform-stretches';

export type { MainStretch } from './uniform-stretches';

/** Push the state of a termination (an outward end) onto the stack. Operand: termination index. */
export const OP_TERMINATION = 0;
/** Carry the top state inward (towards the start) through one segment. Operand: segment index. */
export const OP_SEGMENT = 1;
/** Pop a side branch's state and join it, as a shunt, to the state below it. Operand unused. */
export const OP_SHUNT = 2;
/** Carry the top state (a branch's) through the mass of its mouth: p += j omega M U. Operand: index into mouthInertance. */
export const OP_MOUTH = 3;

export interface CompiledTermination {
  termination: Termination;
  radiusM: number;
  /** Acoustic characteristic impedance rho c / S of the segment it closes, Pa·s/m³. */
  characteristicImpedance: number;
  lowFrequencyEndCorrectionM: number;
  /** Reflection coefficient of a frequency-independent (closed, lined, anechoic) termination; NaN for an open end. */
  constantReflection: number;
}

/** A side branch as it hangs off a junction: where its program lies, and its description for reports. */
export interface CompiledBranch {
  programStart: number;
  programEnd: number;
  segments: number[];
  endTermination: number;
}

export interface CompiledNetwork {
  air: AirProperties;
  speedOfSoundMps: number;
  segmentLengthM: Float64Array;
  segmentAreaM2: Float64Array;
  segmentImpedance: Float64Array;
  segmentKirchhoffPerSqrtHz: Float64Array;
  /**
   * Walls and lining: each segment's attenuation in the octave bands 63 Hz to 8 kHz, Np/m (BAND_COUNT
   * values per segment), and the slopes of its curve through them in ln f (band-curve.ts).
   */
  segmentBandNpPerM: Float64Array;
  segmentBandSlopes: Float64Array;
  /** Per segment: the bands (Hz) whose wall and lining attenuation the flanking cap limited. */
  segmentCappedBandsHz: number[][];
  terminations: CompiledTermination[];
  /** Inertance rho t_i / S_b of each branch mouth, kg/m^4 (tee-junction.ts). */
  mouthInertance: Float64Array;
  /** Segment constants indexed by op position (op / 2) for the inner loop; unused entries are 0. */
  opLengthM: Float64Array;
  opImpedance: Float64Array;
  opKirchhoffPerSqrtHz: Float64Array;
  /** Band attenuation and slopes by op position (BAND_COUNT values each), as segmentBandNpPerM. */
  opBandNpPerM: Float64Array;
  opBandSlopes: Float64Array;
  /** For a segment op at position op / 2: the op index just past its run of consecutive segment ops. */
  opSegmentRunEnd: Int32Array;
  /** Pairs (opcode, operand), post-order: evaluates the main path from its end back to the start. */
  program: Int32Array;
  stackDepth: number;
  /** Index into terminations of the start and end terminations of the main path. */
  startTermination: number;
  endTermination: number;
  /** Main-path segment indices, start to end, and the branches at each one's far end. */
  mainSegments: number[];
  mainBranches: CompiledBranch[][];
  /** The main path as uniform stretches (merged like the program's segment ops), start to end. */
  mainStretches: MainStretch[];
  /** Nested branches of each branch segment (index by segment). */
  branchesAtSegment: Map<number, CompiledBranch[]>;
  mainLengthM: number;
  totalLengthM: number;
}

export interface CompileOptions {
  /**
   * Carry consecutive segments of the same section and lining (no tee between them) as one segment of
   * their summed length (default true): exact, the transfer matrices of a uniform duct compose by adding lengths.
   */
  mergeUniformStretches?: boolean;
}

interface Builder {
  network: CompiledNetwork;
  ops: number[];
  /** Length carried by each op (summed over merged segments); 0 for other ops. */
  opLengths: number[];
  mergeUniform: boolean;
  lengths: number[];
  areas: number[];
  impedances: number[];
  kirchhoff: number[];
  /** Per segment, BAND_COUNT values each. */
  bandNp: number[][];
  bandSlopes: number[][];
  cappedBandsHz: number[][];
  walls: Wall | undefined;
  wallLosses: boolean;
  mouthInertances: number[];
}

function addTermination(builder: Builder, termination: Termination, lastSegment: Segment): number {
  const radiusM = equivalentRadiusM(lastSegment.section);
  const air = builder.network.air;
  builder.network.terminations.push({
    termination,
    radiusM,
    characteristicImpedance: (air.densityKgM3 * air.speedOfSoundMps) / sectionArea(lastSegment.section),
    lowFrequencyEndCorrectionM: lowFrequencyEndCorrectionM(termination, radiusM),
    constantReflection: termination.kind === 'open' ? NaN : terminationReflection(termination, { re: 0, im: 0 }, radiusM, air.speedOfSoundMps).re,
  });
  return builder.network.terminations.length - 1;
}

function addSegment(builder: Builder, segment: Segment): number {
  const air = builder.network.air;
  const areaM2 = sectionArea(segment.section);
  const perimeterM = sectionPerimeter(segment.section);
  builder.lengths.push(segment.lengthM);
  builder.areas.push(areaM2);
  builder.impedances.push((air.densityKgM3 * air.speedOfSoundMps) / areaM2);
  builder.kirchhoff.push(builder.wallLosses ? kirchhoffAttenuationPerSqrtHz(perimeterM, areaM2, air) : 0);
  const attenuation = segmentAttenuation(segment, builder.walls, builder.wallLosses);
  builder.bandNp.push(attenuation.npPerM);
  builder.bandSlopes.push(bandCurveSlopes(attenuation.npPerM));
  builder.cappedBandsHz.push(attenuation.cappedBandsHz);
  builder.network.totalLengthM += segment.lengthM;
  return builder.lengths.length - 1;
}

/** The mouth of a branch whose first segment is branchSegment, on the wall of host. */
function addMouth(builder: Builder, branchSegment: Segment, host: Segment): number {
  const branchRadiusM = equivalentRadiusM(branchSegment.section);
  const correctionM = branchMouthCorrectionM(branchRadiusM, equivalentRadiusM(host.section));
  // The air plug of length t_i: M = rho t_i / S_b (Kinsler & Frey, Fundamentals of Acoustics, ch. 10, acoustic inertance)
  builder.mouthInertances.push((builder.network.air.densityKgM3 * correctionM) / sectionArea(branchSegment.section));
  return builder.mouthInertances.length - 1;
}

interface CompiledChain {
  depth: number;
  segments: number[];
  endTermination: number;
  branches: CompiledBranch[][];
}

function pushOp(builder: Builder, code: number, operand: number, lengthM = 0): void {
  builder.ops.push(code, operand);
  builder.opLengths.push(lengthM);
}

/** Emits a segment op, or lengthens the previous one when it is the same uniform duct. */
function pushSegmentOp(builder: Builder, segment: number): void {
  const last = builder.ops.length - 2;
  const previous = builder.ops[last + 1];
  const mergeable = builder.mergeUniform && last >= 0 && builder.ops[last] === OP_SEGMENT && sameUniformDuct(builder, previous, segment);
  if (mergeable) builder.opLengths[last / 2] += builder.lengths[segment];
  else pushOp(builder, OP_SEGMENT, segment, builder.lengths[segment]);
}

/** Emits the program of one chain (main path or branch), outermost end first. */
function compileChain(builder: Builder, segments: Segment[], end: Termination): CompiledChain {
  const indices = segments.map((segment) => addSegment(builder, segment));
  const endTermination = addTermination(builder, end, segments[segments.length - 1]);
  const branchLists: CompiledBranch[][] = segments.map(() => []);
  pushOp(builder, OP_TERMINATION, endTermination);
  let depth = 1;
  for (let position = segments.length - 1; position >= 0; position--) {
    for (const branch of segments[position].branches ?? []) {
      const programStart = builder.ops.length;
      const chain = compileChain(builder, branch.segments, branch.end);
      pushOp(builder, OP_MOUTH, addMouth(builder, branch.segments[0], segments[position]));
      chain.segments.forEach((segmentIndex, nestedPosition) =>
        builder.network.branchesAtSegment.set(segmentIndex, chain.branches[nestedPosition]),
      );
      branchLists[position].push({
        programStart,
        programEnd: builder.ops.length,
        segments: chain.segments,
        endTermination: chain.endTermination,
      });
      pushOp(builder, OP_SHUNT, 0);
      depth = Math.max(depth, 1 + chain.depth);
    }
    pushSegmentOp(builder, indices[position]);
  }
  return { depth, segments: indices, endTermination, branches: branchLists };
}

/** For each op position, where its run of consecutive segment ops ends (the inner loop then reads no opcodes). */
function segmentRunEnds(ops: number[]): Int32Array {
  const ends = new Int32Array(ops.length / 2);
  let runEnd = ops.length;
  for (let op = ops.length - 2; op >= 0; op -= 2) {
    if (ops[op] !== OP_SEGMENT) runEnd = op;
    ends[op / 2] = runEnd;
  }
  return ends;
}

/** Compiles a validated run. */
export function compileNetwork(input: RunInput, options: CompileOptions = {}): CompiledNetwork {
  const air = airProperties(input.temperatureC ?? DEFAULT_TEMPERATURE_C);
  const network: CompiledNetwork = {
    air,
    speedOfSoundMps: air.speedOfSoundMps,
    segmentLengthM: new Float64Array(0),
    segmentAreaM2: new Float64Array(0),
    segmentImpedance: new Float64Array(0),
    segmentKirchhoffPerSqrtHz: new Float64Array(0),
    segmentBandNpPerM: new Float64Array(0),
    segmentBandSlopes: new Float64Array(0),
    segmentCappedBandsHz: [],
    terminations: [],
    mouthInertance: new Float64Array(0),
    program: new Int32Array(0),
    opLengthM: new Float64Array(0),
    opImpedance: new Float64Array(0),
    opKirchhoffPerSqrtHz: new Float64Array(0),
    opBandNpPerM: new Float64Array(0),
    opBandSlopes: new Float64Array(0),
    opSegmentRunEnd: new Int32Array(0),
    stackDepth: 0,
    startTermination: 0,
    endTermination: 0,
    mainSegments: [],
    mainBranches: [],
    mainStretches: [],
    branchesAtSegment: new Map(),
    mainLengthM: 0,
    totalLengthM: 0,
  };
  const builder: Builder = { network, ops: [], opLengths: [], mergeUniform: options.mergeUniformStretches ?? true, lengths: [], areas: [], impedances: [], kirchhoff: [], bandNp: [], bandSlopes: [], cappedBandsHz: [], walls: input.walls, wallLosses: input.wallLosses ?? true, mouthInertances: [] };
  network.startTermination = addTermination(builder, input.start, input.segments[0]);
  const mainChain = compileChain(builder, input.segments, input.end);
  network.stackDepth = mainChain.depth;
  network.mainSegments = mainChain.segments;
  network.mainBranches = mainChain.branches;
  network.mainStretches = builder.mergeUniform
    ? mergeMainStretches(builder, mainChain.segments, mainChain.branches)
    : mainChain.segments.map((segment, position) => ({ segment, lengthM: builder.lengths[segment], branches: mainChain.branches[position] }));
  network.endTermination = mainChain.endTermination;
  network.program = Int32Array.from(builder.ops);
  network.mouthInertance = Float64Array.from(builder.mouthInertances);
  network.segmentLengthM = Float64Array.from(builder.lengths);
  network.segmentAreaM2 = Float64Array.from(builder.areas);
  network.segmentImpedance = Float64Array.from(builder.impedances);
  network.segmentKirchhoffPerSqrtHz = Float64Array.from(builder.kirchhoff);
  network.segmentBandNpPerM = Float64Array.from(builder.bandNp.flat());
  network.segmentBandSlopes = Float64Array.from(builder.bandSlopes.flat());
  network.segmentCappedBandsHz = builder.cappedBandsHz;
  const byOp = (values: Float64Array): Float64Array =>
    Float64Array.from({ length: builder.ops.length / 2 }, (_, position) =>
      builder.ops[2 * position] === OP_SEGMENT ? values[builder.ops[2 * position + 1]] : 0,
    );
  network.opLengthM = Float64Array.from(builder.opLengths);
  network.opImpedance = byOp(network.segmentImpedance);
  network.opKirchhoffPerSqrtHz = byOp(network.segmentKirchhoffPerSqrtHz);
  const bandsByOp = (perSegment: number[][]): Float64Array => {
    const out = new Float64Array((builder.ops.length / 2) * BAND_COUNT);
    for (let position = 0; position < builder.ops.length / 2; position++) {
      if (builder.ops[2 * position] === OP_SEGMENT) out.set(perSegment[builder.ops[2 * position + 1]], position * BAND_COUNT);
    }
    return out;
  };
  network.opBandNpPerM = bandsByOp(builder.bandNp);
  network.opBandSlopes = bandsByOp(builder.bandSlopes);
  network.opSegmentRunEnd = segmentRunEnds(builder.ops);
  network.mainLengthM = input.segments.reduce((sum, segment) => sum + segment.lengthM, 0);
  return network;
}
