// Pure plan geometry: no document types, no framework.
export * from './point';
export * from './length';
export * from './hit-test';
export * from './snap';
