// The public surface of the acoustic engine. Nothing else in lib/acoustic is imported from outside.
export { speedOfSound, airDensity, characteristicImpedance, dynamicViscosity, airProperties } from './air';
export type { AirProperties } from './air';
export { analyzeRun } from './analyze-run';
export { startAdmittanceSweep, createAdmittanceSweeper } from './network/sweep';
export type { AdmittanceSweeper } from './network/sweep';
export type { CompileOptions } from './network/compile';
export { roomModes } from './room-modes';
export { endReflectionLoss } from './end-reflection-loss';
export { ncRating } from './nc-rating';
export { NC_CURVES } from './nc-curves';
export { sectionArea, sectionPerimeter, equivalentRadiusM, cutoffHz } from './section';
export { kirchhoffAttenuationNpPerM } from './wall-losses';
export { sabineLinedDuctDbPerM } from './lining-attenuation';
export {
  terminationReflection,
  terminationImpedance,
  lowFrequencyEndCorrectionM,
  unflangedMagnitude,
  unflangedEndCorrectionPerRadius,
  flangedMagnitude,
  flangedEndCorrectionPerRadius,
} from './terminations';
export { validateRun } from './validate-run';
export { inputError } from './input-error';
export { bladePassHz } from './blade-pass';
export { OCTAVE_BANDS_HZ } from './constants';
export type { Complex } from './complex';
export type {
  Section,
  Termination,
  Lining,
  Segment,
  Branch,
  RunInput,
  Resonance,
  PressureEnvelopePoint,
  Reflection,
  ReflectionBand,
  Echo,
  RunAnalysis,
  RoomBox,
  RoomMode,
  RoomModeType,
  Mounting,
} from './types';
