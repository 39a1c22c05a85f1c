// Input and output shapes of the risk assessment (plain JSON data: stored in the plan document).
import type { RoomInput } from '../room/room-input';
import type { RunInput } from '../types';

export interface FanInput {
  blades: number;
  /** The speed the tone is given at, rpm. */
  rpm: number;
  /** The speed range it runs over (a variable-speed drive's limits); without either, rpm ± belt slip. */
  minRpm?: number | null;
  maxRpm?: number | null;
  /** Blade-pass harmonics to check (default 3). */
  harmonics?: number;
}

export interface RiskOptions {
  /** The supply air's temperature swings this much either side of the run's, °C (default 5). */
  temperatureSwingC?: number;
  /** Without a speed range, the fan's speed varies this much either side (belt slip), percent (default 2). */
  speedSlipPercent?: number;
  /** "Near a pressure maximum": within this fraction of the mode's wavelength of x = mL/n. Default 1/8 (within 3 dB of the maximum). */
  nearMaximumWavelengths?: number;
}

export interface RiskInput {
  run: RunInput;
  fan?: FanInput;
  room?: RoomInput;
  /** Sound power arriving at the outlet through the run as given, octave bands 63 Hz to 8 kHz, dB re 1 pW. */
  outletSoundPowerDb?: number[];
  /** The run the outlet sound power was given for (default: run); a run changed since adds the change of its path attenuation. */
  baselineRun?: RunInput;
  options?: RiskOptions;
}

export type RiskKind = 'resonance-near-tone' | 'resonance-near-room-mode' | 'level-above-criterion' | 'tone-above-cutoff';
export type Severity = 'high' | 'medium' | 'low';

/** The flagged quantity, before or after a treatment. */
export interface FlaggedQuantity {
  /** resonance kinds: the resonance nearest the target; level: the band level. */
  valueHz?: number;
  /**
   * resonance kinds: how far the resonance lies outside the interval the target sweeps over the
   * operating envelope (0 inside it), and its half bandwidth: the bands overlap while distanceHz <= windowHz.
   */
  distanceHz?: number;
  windowHz?: number;
  /** resonance kinds: the largest gain the run's standing waves add over the interval, dB, and where. */
  gainDb?: number;
  gainAtHz?: number;
  /** resonance kinds: the interval, Hz, the target sweeps over the operating envelope. */
  envelopeHz?: [number, number];
  levelDb?: number;
  criterionDb?: number;
}

export interface RiskFlag {
  /** Stable: derived from the kind, its subject and the rounded numbers. */
  id: string;
  kind: RiskKind;
  /** What the flag is about, stable across treatments: 'tone:h1', 'room-mode:1,0,0', 'band:125'. */
  subject: string;
  severity: Severity;
  reason: string;
  /** The tone or room mode frequency, or the band centre, Hz. */
  targetHz: number;
  /** The duct resonance involved (resonance kinds). */
  resonanceOrder?: number;
  quantity: FlaggedQuantity;
}
