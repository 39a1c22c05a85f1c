// What a server action call may carry. Next decodes the arguments with React's reply format
// before any of our code runs; a string starting with `$` there is a marker. Our actions take
// plain data only (objects, arrays, strings, numbers, booleans, null, undefined, dates), which
// React writes inline as one JSON text, using only the self-contained markers below. Every other
// marker points at another part of the body (maps, sets, files, streams, promises, functions,
// repeated objects): refused, so a body Next cannot decode never reaches its decoder.
import { findInputProblem } from '@/lib/clean-input';

export const MAX_ACTION_ARGUMENTS = 16;

// `$$…` an escaped `$`; `$u` undefined; `$I` Infinity; `$-0`, `$-Infinity`; `$N` NaN; `$D…` a date.
const SELF_CONTAINED = /^\$(?:\$|u|I|-|N|D)/;
// `$n…` a BigInt, which must be digits or its decoding throws.
const BIGINT = /^\$n-?\d{1,300}$/;

function markerProblem(value: unknown): string | null {
  const stack: unknown[] = [value];
  while (stack.length > 0) {
    const item = stack.pop();
    if (typeof item === 'string') {
      if (item.startsWith('$') && !SELF_CONTAINED.test(item) && !BIGINT.test(item)) return `refers to another part of the body (${item.slice(0, 12)}), which server actions here do not take`;
    } else if (typeof item === 'object' && item !== null) {
      for (const entry of Object.values(item)) stack.push(entry);
    }
  }
  return null;
}

/** Why the decoded JSON body of a server action call cannot be its arguments, or null when it can. */
export function plainReplyProblem(value: unknown): string | null {
  if (!Array.isArray(value)) return 'the arguments must be a JSON array';
  if (value.length > MAX_ACTION_ARGUMENTS) return `at most ${MAX_ACTION_ARGUMENTS} arguments`;
  const input = findInputProblem(value);
  if (input) return `argument ${input.path || 'list'} ${input.message}`;
  return markerProblem(value);
}
