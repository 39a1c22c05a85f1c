// Analysis: one duct run analysed on request, and a saved plan's results, risks and treatments.
import { analyzeQuerySchema, planResultsQuerySchema } from '@/lib/analysis/envelope-request';
import { MAX_ANALYZE_BODY_BYTES } from '@/lib/analysis/run-limits';
import { runInputSchema } from '@/lib/analysis/run-input-schema';
import { evaluateTreatmentsSchema } from '@/lib/plans/schemas';
import { EXAMPLE_IDS, QUARTER_WAVE_RUN } from './examples';
import type { ApiOperation } from './types';

const RUN_ANALYSIS_FIELDS = {
  speedOfSoundMps: 'Speed of sound in the run\'s air, m/s (to 1 mm/s)',
  lengthM: 'Length of the main path, m',
  cutoffHz: 'Plane-wave cut-off of the run\'s largest section, Hz',
  endCorrectionM: '{ start, end }: the end corrections, m',
  reflections: 'At each discontinuity: atM, kind, and per octave band hz, magnitude, phaseRad',
  resonances: 'Each: order, frequencyHz, q, bandwidthHz, dampingHz, broadband, nodesM, antinodesM; pressureEnvelope only when asked for',
  echoes: 'The echo chart: delayS, amplitude, path',
  warnings: 'What to be careful of, in words',
  assumptions: 'What the results assume (walls, lining, air, ends, which resonances are sure to be listed), in words',
  broadbandRangesHz: 'Ranges where the run responds broadly, [lowHz, highHz]',
  minHz: 'Bottom of the range analysed, Hz',
  maxHz: 'Top of the range analysed, Hz',
};

const BUSY_ENGINE = 'The analysis needed more than its time or memory budget and was stopped; the message says what to reduce. Also: an answer with more than 500,000 envelope samples.';
const RATE = 'More than 120 analyses a minute by this person (ANTINODE_ANALYSIS_RATE_PER_MINUTE); Retry-After says when.';

export const ANALYSIS_OPERATIONS: ApiOperation[] = [
  {
    method: 'POST', path: '/api/v1/analyze', area: 'Analysis', access: 'analysis.run', rateLimited: true, maxBodyBytes: MAX_ANALYZE_BODY_BYTES,
    summary: 'Analyse one duct run',
    description: 'Sends one duct run (segments from the start end, the two ends, the frequency range) and answers with its plane-wave analysis: reflections at every discontinuity, resonances with their end corrections and Q, the echo chart. The engine checks the run as a whole too (total length, segment count, branch depth, maxHz at most twice the plane-wave cut-off) and names the field at fault. Numbers are rounded on the way out: frequencies to 0.001 Hz, places to 0.1 mm, ratios to 4 significant figures.',
    query: { schema: analyzeQuerySchema, example: { envelopes: '1' } },
    body: { kind: 'json', schema: runInputSchema, example: QUARTER_WAVE_RUN, exampleSummary: 'A quarter-wave duct: 3 m of Ø 200 mm, closed at the fan end, open and unflanged at the far end' },
    responses: { 200: { description: 'The run\'s analysis.', fields: RUN_ANALYSIS_FIELDS } },
    refusals: { 422: BUSY_ENGINE, 429: RATE },
  },
  {
    method: 'GET', path: '/api/v1/plans/{planId}/results', area: 'Analysis', access: 'plan.read',
    summary: 'Read a plan\'s results',
    description: 'The results of every run on the saved plan, from the one stored analysis of its version (computed once, shared by the editor, risks, review and schedule). Reading costs nothing against the rate limit unless the version has not been analysed yet or envelopes are asked for.',
    query: { schema: planResultsQuerySchema, example: { runId: 'run-1', envelopes: '1,2' } },
    pathExample: { planId: EXAMPLE_IDS.planId },
    body: { kind: 'none' },
    responses: {
      200: {
        description: 'Every run\'s results.',
        fields: {
          version: 'The plan version analysed',
          contentHash: 'SHA-256 of the analysed content (document with labels, and scale)',
          labels: 'The stable labels of runs, segments and ends ("A3", "A4 end")',
          runs: 'Per run: runId, name, problem (why it could not be analysed, or null), analysis (as POST /api/v1/analyze answers), path (the main path\'s pieces: segmentId, startM, endM, fromNodeId, toNodeId), fanTonesHz, nearFanTone (resonance order → fan tone, Hz, or null)',
        },
      },
    },
    refusals: { 422: BUSY_ENGINE, 429: RATE },
  },
  {
    method: 'GET', path: '/api/v1/plans/{planId}/risks', area: 'Analysis', access: 'plan.read',
    summary: 'Read a plan\'s risks, room results and noise path',
    description: 'Risk flags, each room\'s modes and the octave-band noise path from each fan through the ductwork to each listener against the room\'s criterion (rooms[].noise), and the standing of each chosen treatment, from the stored analysis of the saved version.',
    pathExample: { planId: EXAMPLE_IDS.planId },
    body: { kind: 'none' },
    responses: {
      200: {
        description: 'Risks and room results.',
        fields: {
          version: 'The plan version analysed',
          contentHash: 'SHA-256 of the analysed content',
          labels: 'The stable labels of runs, segments and ends',
          rooms: 'Per room: roomId, name, runId (the run that feeds it), analysis (modes, reverberation, Schroeder frequency), criterionNc, criterionDb, levels, levelsNc, noise (the noise path: per outlet the path elements from the fan\'s sound power to the power into the room, per listener the levels by octave band, NC, NR and dB(A), and the margin against the criterion), noiseProblem',
          flags: 'Risk flags: kind, severity, reason with the numbers, run and room',
          treatmentChecks: 'Each chosen treatment judged again on this version (holds, no longer clears, …)',
        },
      },
    },
    refusals: { 422: BUSY_ENGINE },
  },
  {
    method: 'POST', path: '/api/v1/plans/{planId}/treatments/evaluate', area: 'Analysis', access: 'analysis.run', rateLimited: true, maxBodyBytes: 4 * 1024,
    summary: 'Evaluate treatments for one risk flag',
    description: 'Candidate treatments of one flag on the saved plan, each run through the engine on the flag\'s own path, with the change each would make to the drawing. Evaluating changes nothing; choosing one is a document save.',
    pathExample: { planId: EXAMPLE_IDS.planId },
    body: { kind: 'json', schema: evaluateTreatmentsSchema, example: { runId: 'run-1', flagId: 'resonance-near-tone:run-1:1' }, exampleSummary: 'The treatments of a run\'s resonance-near-fan-tone flag' },
    responses: { 200: { description: 'The candidates.', fields: { version: 'The plan version evaluated', candidateTreatments: 'Each: kind, description with the plan\'s labels, before and after, effect, planChange, raises' } } },
    refusals: { 409: 'The flag no longer exists on the saved plan.', 422: BUSY_ENGINE, 429: RATE },
  },
];
