import { z } from 'zod';
import { assertCleanInput } from './clean-input';
import { AppError } from './errors';

// Turns a zod failure into a bad-input AppError naming the first offending field.
export function zodToAppError(error: z.ZodError): AppError {
  const issue = error.issues[0];
  const field = issue?.path.map(String).join('.') || undefined;
  const message = issue ? (field ? `${field}: ${issue.message}` : issue.message) : 'The request was not understood.';
  return new AppError('bad_input', message, { field });
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * The first key of the input that the parsed value no longer has (a schema drops keys it does not
 * know), as a path: `runs.0.colour`. Walks only where input and output still have the same shape,
 * so a transform that builds a new value is left to its schema.
 */
export function findDroppedKey(input: unknown, output: unknown): string | null {
  const stack: { input: unknown; output: unknown; path: string }[] = [{ input, output, path: '' }];
  while (stack.length > 0) {
    const item = stack.pop()!;
    const at = (key: string | number) => (item.path ? `${item.path}.${key}` : String(key));
    if (Array.isArray(item.input) && Array.isArray(item.output) && item.input.length === item.output.length) {
      for (let index = item.input.length - 1; index >= 0; index -= 1) stack.push({ input: item.input[index], output: item.output[index], path: at(index) });
      continue;
    }
    if (!isPlainObject(item.input) || !isPlainObject(item.output)) continue;
    const keys = Object.keys(item.input);
    const dropped = keys.find((key) => !Object.prototype.hasOwnProperty.call(item.output, key));
    if (dropped !== undefined) return at(dropped);
    for (let index = keys.length - 1; index >= 0; index -= 1) stack.push({ input: item.input[keys[index]], output: (item.output as Record<string, unknown>)[keys[index]], path: at(keys[index]) });
  }
  return null;
}

/**
 * The schema's value for a decoded input. A key the schema does not know is refused, naming it,
 * rather than dropped: what is stored is then always what was sent.
 */
export function parseExactly<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw zodToAppError(result.error);
  const dropped = findDroppedKey(value, result.data);
  if (dropped) throw new AppError('bad_input', `${dropped}: is not a field this accepts; leave it out.`, { field: dropped });
  return result.data;
}

// For input from outside (server action arguments, query strings): clean text and bounded
// nesting first (lib/clean-input.ts), then the schema, refusing keys it does not know.
export function parseWith<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  assertCleanInput(value);
  return parseExactly(schema, value);
}
