import { z } from 'zod';
import { analyzeEnvelopeRequest } from '@/lib/analysis/envelope-request';
import { MAX_ANALYZE_BODY_BYTES, assertRunSize } from '@/lib/analysis/run-limits';
import { compute } from '@/lib/compute/pool';
import { jsonText, route } from '@/lib/http/route';

// POST /api/v1/analyze[?include=envelopes | ?envelopes=<orders>]
//
// One duct run in (the engine's RunInput as the JSON body), its RunAnalysis out, computed in the
// compute pool under its time and memory limits. The engine names any bad field in a RangeError,
// which the route wrapper turns into a 400 with the same words.
//
// The answer carries the speed of sound, length, cut-off, end corrections, reflections, echoes,
// warnings and every resonance's order, frequencyHz, q, bandwidthHz, dampingHz, nodesM and antinodesM.
// Pressure envelopes (resonance.pressureEnvelope, 8 samples per half wavelength plus one per segment)
// only on request, in the query (analyzeQuerySchema, lib/analysis/envelope-request.ts):
//   include=envelopes   every resonance's envelope
//   envelopes=3,4,10    those orders' envelopes (orders not listed in the answer are skipped)
// An unknown parameter, or both at once, is a 400 naming it; envelopes beyond 500,000 samples in one
// answer are a 422 saying to ask for fewer.
//
// Numbers are rounded on the way out (lib/analysis/answer-precision.ts): frequencies to 0.001 Hz;
// lengths and positions, envelope positions included, to 0.1 mm; q, bandwidthHz, dampingHz, reflection
// magnitudes, echo amplitudes and envelope samples to 4 significant figures; phases to 0.0001 rad;
// echo delays to 1 µs; the speed of sound to 1 mm/s.
export const POST = route({ access: 'analysis.run', maxBodyBytes: MAX_ANALYZE_BODY_BYTES, rateLimit: 'analysis' }, async ({ request, readJson }) => {
  const envelopes = analyzeEnvelopeRequest(request.url);
  const input = await readJson(z.unknown());
  assertRunSize(input);
  // The compute worker keeps the envelopes asked for, rounds (lib/analysis/round-answer.ts) and serialises.
  return jsonText(await compute<string>({ kind: 'analyze-run', input, envelopes }, { reduce: "the run's length, its number of segments, or its frequency range (maxHz)" }));
});
