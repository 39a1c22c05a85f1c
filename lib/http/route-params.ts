// The dynamic segments of a route URL, checked before any handler runs: a segment named `…Id`
// must be a record id (a UUID), any other must be clean text. A bad one is a 400 naming it.
import { AppError } from '@/lib/errors';
import { isId } from '@/lib/ids';
import { textProblem } from '@/lib/text';

export function assertRouteParams(params: Record<string, string | string[]>): void {
  for (const [name, raw] of Object.entries(params)) {
    for (const value of Array.isArray(raw) ? raw : [raw]) {
      if (name.endsWith('Id')) {
        if (!isId(value)) throw new AppError('bad_input', `${name} must be an id such as 6f1c2a3e-0b4d-4f5a-9c7e-2d8b1a0e3f47.`, { field: name });
        continue;
      }
      const problem = textProblem(value);
      if (problem) throw new AppError('bad_input', `${name} ${problem}.`, { field: name });
    }
  }
}
