import { z } from 'zod';
import type { RunAnalysis } from '@/lib/acoustic';
import { MAX_ANALYZE_BODY_BYTES, assertRunSize } from '@/lib/analysis/run-limits';
import { compute } from '@/lib/compute/pool';
import { json, route } from '@/lib/http/route';

// One duct run in (the engine's RunInput), its RunAnalysis out, computed in the compute pool
// under its time and memory limits. The engine names any bad field in a RangeError, which the
// route wrapper turns into a 400 with the same words.
export const POST = route({ access: 'analysis.run', maxBodyBytes: MAX_ANALYZE_BODY_BYTES, rateLimit: 'analysis' }, async ({ readJson }) => {
  const input = await readJson(z.unknown());
  assertRunSize(input);
  return json(await compute<RunAnalysis>({ kind: 'analyze-run', input }, { reduce: "the run's length, its number of segments, or its frequency range (maxHz)" }));
});
