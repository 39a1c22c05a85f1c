// Rooms and chosen treatments in the plan document.
export * from './room-types';
export * from './finishes';
export * from './room-input';
export { roomSchema, planTreatmentSchema, treatmentSchema, planChangeSchema, roomNameSchema, roomSideMSchema, criterionNcSchema, roomPointSchema, absorptionBandsSchema, soundPowerBandsSchema, MAX_NC, MAX_ROOM_SIDE_M } from './room-schema';
export * from './outlet-link';
export * from './room-places';
export { MAX_EXTRA_OUTLETS, MAX_EXTRA_LISTENERS, extraOutletSchema, roomListenerSchema, roomCorrectionSchema } from './room-schema';
