// What one analysis request may send: a body of at most MAX_ANALYZE_BODY_BYTES holding a run the
// engine accepts. The engine's input limits (lib/acoustic/input-limits.ts: length, segments, branch
// depth, frequency range, echoes, temperature) bound the work one run can ask for; its RangeError
// names the field, which the 400 carries as `field` too.
import { validateRun } from '@/lib/acoustic';
import { AppError } from '@/lib/errors';

export const MAX_ANALYZE_BODY_BYTES = 512 * 1024;

/** The field path an engine RangeError starts with, e.g. `segments[2].lengthM`. */
function fieldOf(error: RangeError): string {
  return error.message.split(' ', 1)[0];
}

export function assertRunSize(input: unknown): void {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new AppError('bad_input', 'The body must be a JSON object describing one duct run.');
  }
  try {
    validateRun(input);
  } catch (error) {
    if (error instanceof RangeError) throw new AppError('bad_input', error.message, { field: fieldOf(error) });
    throw error;
  }
}
