// Risk flags across the plan, computed from the document: every room with the run that feeds it,
// and every run with a fan that feeds no room. Each entry carries what the room charts need.
import {
  analyzeRoom, assessRisks, bladePassHarmonicsHz, ncCriterionCurveDb, ncRating, outletLevels,
  type OutletLevelBand, type RiskFlag, type RoomAnalysis, type RunAnalysis,
} from '@/lib/acoustic';
import { PlanError } from '@/lib/plan/errors';
import { runFan } from '@/lib/plan/shared-fan';
import { pathLevelFlags } from './noise-path/room-path';
import { roomNoise, type RoomNoise } from './noise-path/room-noise';
import type { PlanDocument } from '@/lib/plan/document';
import { analysePlan, type RunResult } from './results';
import { RISK_OPTIONS, riskContext, type RiskContext } from './risk-context';

/** Fan harmonics drawn on the room's mode chart (the flags check the engine's default, 3). */
const CHART_HARMONICS = 3;

export interface PlacedFlag extends RiskFlag {
  runId: string;
  runName: string;
  roomId: string | null;
  roomName: string | null;
}

export interface RoomResult {
  roomId: string;
  name: string;
  runId: string | null;
  problem: string | null;
  analysis: RoomAnalysis | null;
  /** The feeding run's resonances and the fan's blade-pass harmonics, Hz, for the mode chart. */
  resonancesHz: number[];
  fanTonesHz: number[];
  criterionNc: number;
  /** NC criterion curve, 63 Hz to 8 kHz, dB. */
  criterionDb: number[];
  /** Predicted levels at the listener (when the outlet sound power is given) and their NC rating. */
  levels: OutletLevelBand[] | null;
  levelsNc: number | null;
  /** The noise from every outlet that feeds the room at every listener, when the feeding runs have their fans' sound power. */
  noise: RoomNoise | null;
  /** Why there is no noise result (in words), when the room is fed but a path cannot be built. */
  noiseProblem: string | null;
}

export interface PlanRisks {
  rooms: RoomResult[];
  flags: PlacedFlag[];
  /** The rules behind the flags, for the risk list to state. */
  temperatureSwingC: number;
  speedSlipPercent: number;
  nearMaximumWavelengths: number;
}

/**
 * Room-mode flags count only below the room's Schroeder frequency: above it the modes overlap and no
 * single axial mode stands out (Schroeder 1962; product rule). The engine's flag ids stay the same.
 */
function isDistinctMode(flag: RiskFlag, schroederHz: number): boolean {
  return flag.kind !== 'resonance-near-room-mode' || flag.targetHz <= schroederHz;
}

function place(flags: RiskFlag[], context: RiskContext): PlacedFlag[] {
  return flags.map((flag) => ({ ...flag, runId: context.run.id, runName: context.run.name, roomId: context.room?.id ?? null, roomName: context.room?.name ?? null }));
}

/** Error messages from the plan model and the engine's input checks become the entry's problem. */
function problemOf(error: unknown): string {
  if (error instanceof Error && !(error instanceof TypeError)) return error.message;
  throw error;
}

/** The run's one analysis (from its results), or the reason it has none. */
function analysisOf(runs: ReadonlyMap<string, RunResult>, runId: string): RunAnalysis {
  const result = runs.get(runId);
  if (!result?.analysis) throw new PlanError(result?.problem ?? 'The run feeding it cannot be analysed.', { runId });
  return result.analysis;
}

/** Level flags and band levels at the listener: the path to the outlet against the baseline the power was given for. */
function levelsAt(context: RiskContext, runAnalysis: RunAnalysis): { flags: RiskFlag[]; levels: OutletLevelBand[] | null } {
  if (!context.level) return { flags: [], levels: null };
  const { input } = context.level;
  const flags = assessRisks(input, runAnalysis).filter((flag) => flag.kind === 'level-above-criterion');
  return { flags, levels: outletLevels(input.run, input.room!, input.outletSoundPowerDb!, input.baselineRun) };
}

function roomResult(doc: PlanDocument, metresPerPixel: number, runs: ReadonlyMap<string, RunResult>, room: PlanDocument['rooms'][number]): { result: RoomResult; flags: PlacedFlag[] } {
  const empty: RoomResult = { roomId: room.id, name: room.name, runId: null, problem: null, analysis: null, resonancesHz: [], fanTonesHz: [], criterionNc: room.criterionNc, criterionDb: ncCriterionCurveDb(room.criterionNc), levels: null, levelsNc: null, noise: null, noiseProblem: null };
  try {
    const context = riskContext(doc, metresPerPixel, { roomId: room.id });
    const runAnalysis = analysisOf(runs, context.run.id);
    const roomInput = context.input.room!;
    // modes to twice the Schroeder frequency (the engine's default): above it they overlap
    const analysis = analyzeRoom(roomInput);
    const resonanceFlags = assessRisks(context.input, runAnalysis).filter((flag) => isDistinctMode(flag, analysis.schroederHz));
    const noise = noiseOf(doc, metresPerPixel, room);
    // the noise from the fans, when there is one, takes the place of an outlet sound power typed in
    const { flags: levelFlags, levels } = noise.noise ? { flags: pathLevelFlags(room, noise.noise), levels: null } : levelsAt(context, runAnalysis);
    const fan = context.input.fan;
    return {
      result: {
        ...empty,
        runId: context.run.id,
        analysis,
        resonancesHz: runAnalysis.resonances.map((resonance) => resonance.frequencyHz),
        fanTonesHz: fan ? bladePassHarmonicsHz(fan.blades, fan.rpm, CHART_HARMONICS) : [],
        levels,
        levelsNc: levels ? ncRating(levels.map((band) => band.levelDb)) : null,
        ...noise,
      },
      flags: place([...resonanceFlags, ...levelFlags], context),
    };
  } catch (error) {
    return { result: { ...empty, problem: problemOf(error) }, flags: [] };
  }
}

function noiseOf(doc: PlanDocument, metresPerPixel: number, room: PlanDocument['rooms'][number]): Pick<RoomResult, 'noise' | 'noiseProblem'> {
  try {
    return { noise: roomNoise(doc, metresPerPixel, room), noiseProblem: null };
  } catch (error) {
    return { noise: null, noiseProblem: problemOf(error) };
  }
}

/** Every room's results and every flag of the plan; runs: the plan's run results when already computed. */
export function planRisks(doc: PlanDocument, metresPerPixel: number, runResults: readonly RunResult[] = analysePlan(doc, metresPerPixel)): PlanRisks {
  const runs = new Map(runResults.map((result) => [result.runId, result]));
  const rooms = doc.rooms.map((room) => roomResult(doc, metresPerPixel, runs, room));
  const fedRunIds = new Set(rooms.map((entry) => entry.result.runId).filter((runId): runId is string => runId !== null));
  const runFlags = doc.runs
    .filter((run) => runFan(doc, run).fan !== null && !fedRunIds.has(run.id))
    .flatMap((run) => {
      try {
        const context = riskContext(doc, metresPerPixel, { runId: run.id });
        return place(assessRisks(context.input, analysisOf(runs, run.id)), context);
      } catch (error) {
        problemOf(error);
        return [];
      }
    });
  return { rooms: rooms.map((entry) => entry.result), flags: [...rooms.flatMap((entry) => entry.flags), ...runFlags], ...RISK_OPTIONS };
}
