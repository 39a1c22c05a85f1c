// Limits on what one analysis request may ask of the server, so a single request cannot
// hold it for long. The engine itself validates the physics input.
import { AppError } from '@/lib/errors';

export const MAX_SEGMENTS_PER_RUN = 2000;
export const MAX_ANALYZE_BODY_BYTES = 512 * 1024;

function countSegments(value: unknown, depth: number): number {
  if (depth > 20) throw new AppError('bad_input', 'Branches are nested more than 20 deep.');
  if (!Array.isArray(value)) return 0;
  let count = 0;
  for (const segment of value) {
    count += 1;
    const branches = (segment as { branches?: unknown })?.branches;
    if (Array.isArray(branches)) {
      for (const branch of branches) count += countSegments((branch as { segments?: unknown })?.segments, depth + 1);
    }
  }
  return count;
}

export function assertRunSize(input: unknown): void {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new AppError('bad_input', 'The body must be a JSON object describing one duct run.');
  }
  const segments = countSegments((input as { segments?: unknown }).segments, 0);
  if (segments > MAX_SEGMENTS_PER_RUN) {
    throw new AppError('bad_input', `A run may have at most ${MAX_SEGMENTS_PER_RUN} segments, branches included (this one has ${segments}).`, { field: 'segments' });
  }
}
