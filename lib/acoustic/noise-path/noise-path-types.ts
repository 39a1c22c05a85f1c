// Input and result of the octave-band noise path from a fan to a listener (engine contract). SI units;
// levels in dB (sound power re 1 pW, sound pressure re 20 µPa), octave bands 63 Hz to 8 kHz.
import type { Mounting, Section } from '../types';
import type { Wall } from '../walls/wall-types';

export type PathElement =
  /** Straight duct: its walls (default sheet metal) and optional fibrous liner of that thickness inside. */
  | { kind: 'duct'; section: Section; lengthM: number; wall?: Wall; lining?: { thicknessM: number } }
  /** Elbow: square unless radius (round sections default to radiused), with or without turning vanes and liner. */
  | { kind: 'elbow'; section: Section; vanes?: boolean; lined?: boolean; radius?: boolean }
  /** Branch take-off: the share of the power that goes this way. */
  | { kind: 'split'; branchAreaM2: number; totalAreaM2: number }
  /** Plenum chamber (Wells); directivity of the inlet default 2. */
  | { kind: 'plenum'; outletAreaM2: number; surfaceAreaM2: number; absorption: number; distanceM: number; angleDeg: number; directivity?: number }
  /** Silencer: insertion loss per band from the maker's data. */
  | { kind: 'silencer'; insertionLossDb: number[] }
  /** Outlet into the room: end reflection loss. */
  | { kind: 'outlet'; diameterM: number; mounting: Mounting }
  /** Anything else, per band, with a label. */
  | { kind: 'loss'; label: string; lossDb: number[] };

export type PathElementKind = PathElement['kind'];

export interface NoisePathInput {
  /** At the fan outlet, octave bands 63..8000 Hz, dB re 1 pW. */
  soundPowerDb: number[];
  /** In order from the fan to the room. */
  elements: PathElement[];
  /**
   * Schultz room correction at the listener; or, with correctionDb, the room's Lp - Lw per band worked
   * out by another model (roomEquationCorrectionDb for a bare room) in its place.
   */
  room: { volumeM3: number; distanceM: number; correctionDb?: number[] };
  /** Air temperature for the rigid-wall losses and the end reflection loss, default 20 °C. */
  temperatureC?: number;
}

export interface NoisePathStep {
  kind: string;
  /** Loss of this element per band, dB (never negative). */
  lossDb: number[];
  /** Sound power after this element per band, dB re 1 pW. */
  powerDb: number[];
  /** The label of a 'loss' element. */
  label?: string;
}

export interface NoisePathResult {
  bandsHz: number[];
  steps: NoisePathStep[];
  /** Sound pressure level at the listener per band, dB re 20 µPa. */
  listenerDb: number[];
  /** ncRating of listenerDb: below NC-15 or above NC-70 it is extrapolated, and a warning says so. */
  nc: number;
  nr: number;
  dba: number;
  /** The room's Lp - Lw per band, dB: Schultz's, or the one given in room.correctionDb. */
  roomCorrectionDb: number[];
  /** Which room correction was used: Schultz's relation, or the one given. */
  roomCorrection: 'schultz' | 'given';
  /** Where a figure was limited or extrapolated, in words. */
  warnings: string[];
}
