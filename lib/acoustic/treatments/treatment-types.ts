// Treatments of a flagged risk and their evaluated effect (plain JSON data).
import type { FlaggedQuantity } from '../risk/risk-types';
import type { Termination } from '../types';

export type Treatment =
  /** Line a main-path segment from its start over lengthM (default: all of it); without absorption, fibrous liner of that thickness by band. */
  | { kind: 'line-segment'; segmentIndex: number; lengthM?: number; thicknessM: number; absorption?: number }
  /** Replace the start or end termination (e.g. an absorbing fan end, flange the outlet). */
  | { kind: 'change-termination'; end: 'start' | 'end'; termination: Termination }
  /** Change one main-path segment's length by deltaLengthM; without it, the change that best clears the tones is searched. */
  | { kind: 'retune-length'; segmentIndex?: number; deltaLengthM?: number }
  /** A closed quarter-wave side branch at a segment's far end tuned to tuneHz (default: the flag's tone or mode). */
  | { kind: 'side-branch-resonator'; segmentIndex?: number; tuneHz?: number; diameterM?: number; lengthM?: number };

/** What a treatment does, measured across the operating envelope. */
export interface TreatmentEffect {
  /** Retune: the gap left between the flag's interval and the nearest resonance band, Hz and in its bandwidths. */
  clearanceHz?: number;
  clearanceBandwidths?: number | null;
  /** Side branch: the least and most it takes off at the tone over the envelope, dB. */
  insertionLossDb?: [number, number];
  /** Side branch: the largest rise it causes near the tone (its side peaks), dB, and where. */
  sidePeakDb?: number;
  sidePeakHz?: number;
  /** Lining: its insertion loss in each octave band 63 Hz to 8 kHz, dB (flanking cap applied). */
  bandLossDb?: number[];
}

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
  effect: TreatmentEffect;
  notes: string[];
}
