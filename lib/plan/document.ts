// The plan document: plain readonly data. Changed only by pure functions that return a new document.
import type { Lining, Section, Termination, Wall } from '@/lib/acoustic';
import type { PlanRoom, PlanTreatment } from './rooms/room-types';

export type { Lining, Section, Termination, Wall };

export interface PlanNode {
  readonly id: string;
  /** Plan coordinates, in pixels of the background image (or of the grid). */
  readonly x: number;
  readonly y: number;
}

export interface PlanSegment {
  readonly id: string;
  readonly from: string;
  readonly to: string;
  readonly section: Section;
  readonly lining?: Lining | null;
  /** Walls of its own; absent or null: the run's walls. */
  readonly wall?: Wall | null;
  /** When set, the segment's length instead of the drawn one (schematic drawings). */
  readonly lengthOverrideM?: number | null;
  /** Stable number within its run, shown as the run letter and this number ("A3"); set by normalize. */
  readonly number?: number;
  /** Silencers and other losses placed at the segment's far end, in order (the noise path). */
  readonly inserts?: readonly PathInsert[];
}

/**
 * Something put into the duct by hand for the noise path: a silencer from the maker's data, any loss, or
 * a plenum box given by its inside dimensions (Wells' equation in the path).
 */
export type PathInsert =
  | { readonly kind: 'silencer'; readonly label: string; readonly insertionLossDb: readonly number[] }
  | { readonly kind: 'loss'; readonly label: string; readonly lossDb: readonly number[] }
  | { readonly kind: 'plenum'; readonly label: string; readonly plenum: PlenumBox };

/**
 * A plenum box, inside dimensions in m: the inlet in one end wall, the outlet in the opposite one, offset
 * sideways by offsetM (0: straight across); its lining's mean absorption; the outlet's area.
 */
export interface PlenumBox {
  readonly lengthM: number;
  readonly widthM: number;
  readonly heightM: number;
  readonly outletAreaM2: number;
  readonly offsetM: number;
  readonly absorption: number;
}

export interface Fan {
  readonly blades: number;
  /** The speed its sound power data are given at (and of the blade-pass tone). */
  readonly rpm: number;
  /** The speed range it runs over (a variable-speed drive's limits); absent: rpm only. */
  readonly minRpm?: number | null;
  readonly maxRpm?: number | null;
}

export interface PlanRun {
  readonly id: string;
  readonly name: string;
  /** Stable letter of the run ("A"), the first part of every segment label; set by normalize. */
  readonly letter?: string;
  readonly startNodeId: string;
  /** The leaf chosen as the run's end for results; null: the farthest leaf from the start. */
  readonly endNodeId: string | null;
  readonly temperatureC: number;
  /** The walls of its segments (absent or null: sheet metal), unless a segment has its own. */
  readonly walls?: Wall | null;
  readonly fan: Fan | null;
  /**
   * Another run whose fan this run shares (one air handler feeding several runs): its fan, speed range
   * and sound power stand for this run's own, and the power divides between the runs by duct area.
   */
  readonly fanOfRunId?: string | null;
  /** The fan's sound power into this run, octave bands 63 Hz to 8 kHz, dB re 1 pW (the noise path starts from it). */
  readonly fanSoundPowerDb?: readonly number[] | null;
  /** Keyed by node id: every leaf node of the run, the start included. */
  readonly terminations: Readonly<Record<string, Termination>>;
}

export type PlanPlaceholder = Readonly<Record<string, unknown>>;

export interface PlanDocument {
  readonly schemaVersion: 1;
  readonly nodes: readonly PlanNode[];
  readonly segments: readonly PlanSegment[];
  readonly runs: readonly PlanRun[];
  readonly rooms: readonly PlanRoom[];
  /** Kept for documents that have them; a room holds its own outlet and listener. */
  readonly outlets: readonly PlanPlaceholder[];
  readonly listeners: readonly PlanPlaceholder[];
  /** The chosen treatments (absent in documents saved before treatments existed). */
  readonly treatments?: readonly PlanTreatment[];
  /** Where the drawing grid starts, plan pixels (absent: the drawing's top-left corner). */
  readonly gridOrigin?: { readonly x: number; readonly y: number };
}

/** Round Ø 250 mm: the section of a newly drawn run. */
export const DEFAULT_SECTION: Section = { shape: 'round', diameterM: 0.25 };
export const DEFAULT_START_TERMINATION: Termination = { kind: 'closed' };
export const DEFAULT_END_TERMINATION: Termination = { kind: 'open', flange: 'unflanged' };
export const DEFAULT_TEMPERATURE_C = 20;

export function emptyDocument(): PlanDocument {
  return { schemaVersion: 1, nodes: [], segments: [], runs: [], rooms: [], outlets: [], listeners: [], treatments: [] };
}

export function findNode(doc: PlanDocument, nodeId: string): PlanNode | undefined {
  return doc.nodes.find((node) => node.id === nodeId);
}

export function findSegment(doc: PlanDocument, segmentId: string): PlanSegment | undefined {
  return doc.segments.find((segment) => segment.id === segmentId);
}

export function findRun(doc: PlanDocument, runId: string): PlanRun | undefined {
  return doc.runs.find((run) => run.id === runId);
}

/** Node positions by id, for geometry on many segments at once. */
export function nodePositions(doc: PlanDocument): Map<string, PlanNode> {
  return new Map(doc.nodes.map((node) => [node.id, node]));
}

export function findRoom(doc: PlanDocument, roomId: string): PlanRoom | undefined {
  return doc.rooms.find((room) => room.id === roomId);
}
