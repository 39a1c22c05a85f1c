// One check over a whole decoded body (JSON or a server action's arguments) before any schema
// sees it: nesting no deeper than MAX_INPUT_DEPTH, and every key and string clean text
// (lib/text.ts). It covers the parts a schema leaves open (records of unknown values), and it
// walks with its own stack, so no input can overflow the call stack here or later. Keys that
// name an object's prototype machinery (__proto__, constructor, prototype) are refused: a
// schema would drop them, or worse, an object spread would take them as its prototype.
import { AppError } from '@/lib/errors';
import { textProblem } from '@/lib/text';

export const MAX_INPUT_DEPTH = 64;
const PROTOTYPE_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

export interface InputProblem { path: string; message: string }

function join(path: string, key: string | number): string {
  return path === '' ? String(key) : `${path}.${key}`;
}

/** The first problem found (path as zod names fields: `runs.2.name`), or null. */
export function findInputProblem(value: unknown): InputProblem | null {
  const stack: { value: unknown; path: string; depth: number }[] = [{ value, path: '', depth: 0 }];
  while (stack.length > 0) {
    const item = stack.pop()!;
    if (typeof item.value === 'string') {
      const message = textProblem(item.value);
      if (message) return { path: item.path, message };
      continue;
    }
    if (typeof item.value !== 'object' || item.value === null) continue;
    if (item.depth >= MAX_INPUT_DEPTH) return { path: item.path, message: `is nested more than ${MAX_INPUT_DEPTH} levels deep` };
    const entries: [string | number, unknown][] = Array.isArray(item.value) ? item.value.map((entry, index) => [index, entry]) : Object.entries(item.value);
    // Pushed last to first, so the first problem in reading order is the one reported.
    for (let index = entries.length - 1; index >= 0; index -= 1) {
      const [key, entry] = entries[index];
      if (typeof key === 'string') {
        const message = textProblem(key);
        if (message) return { path: item.path, message: `has a key that ${message}` };
        if (PROTOTYPE_KEYS.has(key)) return { path: join(item.path, key), message: `"${key}" is not allowed as a key` };
      }
      stack.push({ value: entry, path: join(item.path, key), depth: item.depth + 1 });
    }
  }
  return null;
}

/** Throws a 400 naming the field when the input holds text that cannot be stored or is nested too deep. */
export function assertCleanInput(value: unknown): void {
  const problem = findInputProblem(value);
  if (!problem) return;
  const field = problem.path || undefined;
  throw new AppError('bad_input', field ? `${field}: ${problem.message}` : `The input ${problem.message}.`, { field });
}
