// Treatments of a flagged risk and their evaluated effect (plain JSON data).
import type { FlaggedQuantity } from '../risk/risk-types';
import type { Termination } from '../types';

export type Treatment =
  /** Line a main-path segment from its start over lengthM (default: all of it). */
  | { kind: 'line-segment'; segmentIndex: number; lengthM?: number; thicknessM: number; absorption: number }
  /** Replace the start or end termination (e.g. flange the outlet, line a closed end). */
  | { kind: 'change-termination'; end: 'start' | 'end'; termination: Termination }
  /** Change one main-path segment's length by deltaLengthM; without it, the smallest change that clears the flag is searched. */
  | { kind: 'retune-length'; segmentIndex?: number; deltaLengthM?: number }
  /** A closed quarter-wave side branch at a segment's far end tuned to tuneHz (default: the flag's tone or mode). */
  | { kind: 'side-branch-resonator'; segmentIndex?: number; tuneHz?: number; diameterM?: number; lengthM?: number };

export interface TreatmentResult {
  /** The treatment with every choice made explicit (searched length change, resonator length, segment). */
  treatment: Treatment;
  description: string;
  before: FlaggedQuantity;
  after: FlaggedQuantity;
  /** No flag of the same kind and subject remains after re-running the engine on the changed model. */
  clears: boolean;
  /** Flags the treated model raises that the untreated one did not (or raised at a lower severity), in words. */
  raises: string[];
  notes: string[];
}
