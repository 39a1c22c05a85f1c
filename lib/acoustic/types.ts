// Public types of the acoustic engine (engine contract). SI units; unit names in field names.
import type { Wall } from './walls/wall-types';

export type { Wall };

export type Section =
  | { shape: 'round'; diameterM: number }
  | { shape: 'rect'; widthM: number; heightM: number };

export type Termination =
  | { kind: 'closed' }
  | { kind: 'open'; flange: 'flanged' | 'unflanged' }
  | { kind: 'lined'; absorption: number }
  | { kind: 'anechoic' };

export interface Lining {
  thicknessM: number;
  /**
   * One absorption coefficient for every band (the user's figure); without it, the per-band absorption
   * of fibrous duct liner of that thickness applies (lining/fibrous-liner-absorption.ts).
   */
  absorption?: number;
}

export interface Segment {
  lengthM: number;
  section: Section;
  /** Lined inside; the section given is the free airway inside the lining. */
  lining?: Lining;
  /** The duct's wall, overriding the run's walls for this segment. */
  wall?: Wall;
  /** Tees at this segment's far end. */
  branches?: Branch[];
}

export interface Branch {
  segments: Segment[];
  end: Termination;
}

export interface RunInput {
  temperatureC?: number;
  segments: Segment[];
  start: Termination;
  end: Termination;
  minHz?: number;
  maxHz?: number;
  /** The walls of every segment that does not name its own (default: sheet metal). */
  walls?: Wall;
  /** false: ideal walls that lose nothing at all (no air boundary layer, no wall attenuation); default true. */
  wallLosses?: boolean;
  /** Echo train: stop after this many arrivals (default 40). */
  maxEchoes?: number;
  /** Echo train: drop wavefronts weaker than this amplitude (default 1e-3, i.e. -60 dB). */
  echoThreshold?: number;
}

export interface Resonance {
  order: number;
  frequencyHz: number;
  q: number | null;
  bandwidthHz: number | null;
  antinodesM: number[];
  nodesM: number[];
  /** Imaginary part of the complex natural frequency (decay rate / 2π), Hz. */
  dampingHz: number;
  /**
   * Q below 5, or a bandwidth that reaches the next resonance: the run responds broadly here; this is
   * not a resonance to dodge (flags skip it).
   */
  broadband: boolean;
  /**
   * |p(x)| / max |p| along the main path (positionM from the start end), from the closed-form standing
   * wave in each segment: every segment boundary plus 8 samples per half wavelength. Computed when first read.
   */
  pressureEnvelope?: PressureEnvelopePoint[];
}

export interface PressureEnvelopePoint {
  positionM: number;
  relative: number;
}

export interface ReflectionBand {
  hz: number;
  magnitude: number;
  phaseRad: number;
}

export interface Reflection {
  atM: number;
  kind: string;
  bands: ReflectionBand[];
  /** For a tee: the same reflection with the side branch's own computed input impedance instead of an anechoic branch. */
  bandsWithBranch?: ReflectionBand[];
}

export interface Echo {
  delayS: number;
  amplitude: number;
  path: string;
}

export interface RunAnalysis {
  speedOfSoundMps: number;
  lengthM: number;
  cutoffHz: number;
  endCorrectionM: { start: number; end: number };
  reflections: Reflection[];
  resonances: Resonance[];
  echoes: Echo[];
  warnings: string[];
  /** What the results assume, in words: walls, lining, air, ends. */
  assumptions: string[];
  /** Ranges where the resonances are broadband (merged), Hz. */
  broadbandRangesHz: [number, number][];
  /** Frequency range analysed, after defaults. */
  minHz: number;
  maxHz: number;
}

export interface RoomBox {
  lengthM: number;
  widthM: number;
  heightM: number;
  temperatureC?: number;
  /** Overrides the speed of sound derived from temperatureC. */
  speedOfSoundMps?: number;
  /** Relative humidity of the room's air, %, for the air's absorption (default 50). */
  relativeHumidityPercent?: number;
}

export type RoomModeType = 'axial' | 'tangential' | 'oblique';

export interface RoomMode {
  frequencyHz: number;
  indices: [number, number, number];
  type: RoomModeType;
}

export type Mounting = 'flush' | 'free';
