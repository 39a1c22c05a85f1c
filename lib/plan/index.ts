// The plan model's public surface: document, schema, geometry, topology, engine input, commands, history, units, schedule CSV.
export * from './document';
export * from './schema';
export * from './errors';
export * from './ids';
export * from './editor-state';
export * from './geometry';
export * from './graph';
export * from './topology';
export * from './hit-test';
export { toRunInput, toRunInputWithMap } from './to-run-input';
export type { RunInputWithMap, MainPathPiece } from './to-run-input';
export { normalizeDocument, normalizeState, nextRunName } from './normalize';
export * from './commands';
export * from './history';
export * from './units';
export * from './schedule-csv';
export * from './rooms';
export { drawnArea, type PlanArea } from './drawn-area';
