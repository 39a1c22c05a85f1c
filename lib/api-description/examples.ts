// Example values shared by the operations' examples: invented ids, and the run the reference page
// analyses. Every example the description carries is parsed with its route's schema by
// tests/integration/api/openapi.test.ts.
import { speedOfSound, UNFLANGED_END_CORRECTION_PER_RADIUS } from '@/lib/acoustic';
import { emptyDocument, type PlanDocument } from '@/lib/plan/document';

/** Invented record ids (version-4 UUIDs), one per kind, so the example calls read as one story. */
export const EXAMPLE_IDS = {
  teamId: '3b8f0c2e-5d41-4a7e-9f36-0c1d2e3f4a5b',
  projectId: '7a2e4c91-1f3b-4d5e-8a6c-2b9d0e1f3a4c',
  planId: '6f1c2a3e-0b4d-4f5a-9c7e-2d8b1a0e3f47',
  uploadId: '9d4b2e7a-3c1f-4e8d-a5b6-7c8d9e0f1a2b',
  revisionId: 'c5e1a9d3-7b2f-4c6e-8d0a-1b2c3d4e5f60',
  scheduleId: 'e2f4a6c8-0b1d-4e3f-9a5b-6c7d8e9f0a1b',
  commentId: '4c6e8a0b-2d4f-4a1c-b3e5-7f9a1b3c5d7e',
  memberId: '8e0a2c4d-6f8b-4d1e-a3c5-7e9f1a2b4c6d',
  invitationId: '1a3c5e7f-9b2d-4f6a-8c0e-2d4f6a8c0e1b',
  tokenId: '5f7a9c1e-3b5d-4e7f-9a1c-3e5f7a9c1e3b',
} as const;

/**
 * The run the reference page analyses: 3 m of round duct, Ø 200 mm, closed at the fan end and open
 * (unflanged) at the far end, ideal walls, air at 20 °C. Its first resonance is the quarter-wave one,
 * f1 = c / 4(L + 0.6133 a) with the unflanged end correction of Levine & Schwinger (1948), a = 0.1 m.
 */
export const QUARTER_WAVE_RUN = {
  temperatureC: 20,
  segments: [{ lengthM: 3, section: { shape: 'round', diameterM: 0.2 } }],
  start: { kind: 'closed' },
  end: { kind: 'open', flange: 'unflanged' },
  maxHz: 200,
  wallLosses: false,
} as const;

/** The first resonance of QUARTER_WAVE_RUN by the closed–open pipe formula, Hz (about 28.0), for the page to state. */
export function quarterWaveEstimateHz(): number {
  const radiusM = QUARTER_WAVE_RUN.segments[0].section.diameterM / 2;
  // Closed–open pipe: f1 = c / 4(L + δ), δ = 0.6133 a for an unflanged end (Levine & Schwinger 1948)
  return speedOfSound(QUARTER_WAVE_RUN.temperatureC) / (4 * (QUARTER_WAVE_RUN.segments[0].lengthM + UNFLANGED_END_CORRECTION_PER_RADIUS * radiusM));
}

/** A drawn plan with one run of one segment (2 px = 1 cm at the example scale), as the editor saves it. */
export const ONE_RUN_DOCUMENT: PlanDocument = {
  ...emptyDocument(),
  nodes: [{ id: 'node-1', x: 100, y: 200 }, { id: 'node-2', x: 400, y: 200 }],
  segments: [{ id: 'segment-1', from: 'node-1', to: 'node-2', section: { shape: 'round', diameterM: 0.25 }, number: 1 }],
  runs: [{
    id: 'run-1', name: 'Supply to recital room', letter: 'A', startNodeId: 'node-1', endNodeId: null, temperatureC: 18, fan: { blades: 12, rpm: 1450 },
    terminations: { 'node-1': { kind: 'closed' }, 'node-2': { kind: 'open', flange: 'unflanged' } },
  }],
};
