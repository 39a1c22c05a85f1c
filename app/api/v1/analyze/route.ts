import { z } from 'zod';
import { analyzeRun, type RunInput } from '@/lib/acoustic';
import { MAX_ANALYZE_BODY_BYTES, assertRunSize } from '@/lib/analysis/run-limits';
import { json, route } from '@/lib/http/route';

// One duct run in (the engine's RunInput), its RunAnalysis out. The engine names any bad
// field in a RangeError, which the route wrapper turns into a 400 with the same words.
export const POST = route({ access: 'analysis.run', maxBodyBytes: MAX_ANALYZE_BODY_BYTES }, async ({ readJson }) => {
  const input = await readJson(z.unknown());
  assertRunSize(input);
  return json(analyzeRun(input as RunInput));
});
