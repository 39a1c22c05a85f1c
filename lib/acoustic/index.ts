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
export { MIN_SECTION_DIMENSION_M, OCTAVE_BANDS_HZ, UNFLANGED_END_CORRECTION_PER_RADIUS } from './constants';
export {
  MIN_AIR_TEMPERATURE_C, MAX_AIR_TEMPERATURE_C, MAX_SEGMENT_LENGTH_M, MAX_RUN_LENGTH_M, MAX_RUN_SEGMENTS, MAX_BRANCH_DEPTH,
  MAX_SECTION_DIMENSION_M, MAX_LINING_THICKNESS_M, MAX_ANALYSIS_HZ, MAX_HZ_PER_CUTOFF, MAX_RESONANCES, MAX_ECHOES,
  MAX_ROOM_SIDE_M, MAX_ROOM_HEIGHT_M, MAX_ROOM_MODE_CANDIDATES, MAX_IMAGE_ORDER, MAX_FAN_BLADES, MAX_FAN_RPM, MAX_FAN_HARMONICS,
} from './input-limits';
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
export { bladePassHarmonicsHz } from './blade-pass';
// Rooms
export { analyzeRoom } from './room/analyze-room';
export type { RoomAnalysis, RoomAnalysisOptions } from './room/analyze-room';
export { schroederFrequencyHz, sabineReverberationTimeS, modalDensityPerHz, roomConstantM2, roomBands, surfaceAreasM2 } from './room/room-acoustics';
export type { RoomBand } from './room/room-acoustics';
export { imageSources } from './room/image-sources';
export type { ImageSource } from './room/image-sources';
export { boundaryGain, directivityAt } from './room/boundary-gain';
export type { BoundaryGain, NearPlane } from './room/boundary-gain';
export { roomEquationDb, firstCombNotchHz } from './room/room-level';
export { outletLevels, pathAttenuationDb } from './room/outlet-level';
export type { OutletLevelBand } from './room/outlet-level';
export { validateRoomInput, validateSurfaces, SURFACE_NAMES } from './room/room-input';
export type { RoomInput, RoomSurfaces, SurfaceName, Point3 } from './room/room-input';
// Ratings
export { aWeightedLevelDb } from './ratings/a-weighting';
export { ncCriterionCurveDb } from './ratings/nc-criterion';
export { A_WEIGHTING_OCTAVE_DB } from './constants';
// Risks and treatments
export { assessRisks } from './risk/assess-risks';
export type { RiskInput, RiskOptions, FanInput, RiskFlag, RiskKind, Severity, FlaggedQuantity } from './risk/risk-types';
export { evaluateTreatment, describeTreatment, type TreatmentNames } from './treatments/evaluate-treatment';
export { candidateTreatments, lowersQuantity } from './treatments/candidate-treatments';
export { operatingEnvelope, describeEnvelope, toneIntervalHz, type OperatingEnvelope } from './risk/operating-envelope';
export type { TreatmentEffect } from './treatments/treatment-types';
export { applyTreatment } from './treatments/apply-treatment';
export { quarterWaveLengthM } from './treatments/quarter-wave';
export { measureFlag } from './treatments/measure-flag';
export { branchMouthCorrectionM } from './tee-junction';
export type { Treatment, TreatmentResult } from './treatments/treatment-types';
// Duct walls, lining by band, and the noise path from fan to listener
export type { Wall } from './walls/wall-types';
export { unlinedDuctAttenuationDbPerM } from './walls/unlined-duct-attenuation';
export { wallAttenuationDbPerM, validateWall } from './walls/wall-attenuation';
export { fibrousLinerAbsorption } from './lining/fibrous-liner-absorption';
export { linedDuctAttenuationDb } from './lining/lined-duct-attenuation';
export { branchPowerSplitDb } from './noise-path/branch-power-split';
export { plenumAttenuationDb } from './noise-path/plenum-attenuation';
export type { PlenumInput } from './noise-path/plenum-attenuation';
export { elbowAttenuationDb } from './noise-path/elbow-attenuation';
export type { ElbowInput } from './noise-path/elbow-attenuation';
export { noisePath } from './noise-path/noise-path';
export type { NoisePathInput, NoisePathResult, NoisePathStep, PathElement, PathElementKind } from './noise-path/noise-path-types';
export { schultzRoomCorrectionDb } from './room/schultz-room-correction';
export { roomEquationCorrectionDb, ROOM_EQUATION_MIN_DISTANCE_M, type RoomEquationInput } from './room/room-equation-correction';
export { bandsBelowSchroederHz, schroederWarning } from './room/schroeder-bands';
export { airAttenuationDbPerM, airAttenuationBandDbPerM, exactOctaveMidbandHz, energyAttenuationPerM, DEFAULT_ROOM_RELATIVE_HUMIDITY_PERCENT, type AirConditions } from './room/air-absorption';
export { eyringReverberationTimeS } from './room/room-acoustics';
export { fanSpeedSoundPowerChangeDb } from './noise-path/fan-speed';
export { sumLevelsDb } from './ratings/level-sum';
export { nrRating } from './ratings/nr-rating';
export { NR_COEFFICIENTS } from './ratings/nr-curves';
export { DUCT_FLANKING_CAP_DB, FOOT_M, INCH_M } from './constants';
