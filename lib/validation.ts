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

// For input from outside (server action arguments, query strings): clean text and bounded
// nesting first (lib/clean-input.ts), then the schema.
export function parseWith<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  assertCleanInput(value);
  const result = schema.safeParse(value);
  if (!result.success) throw zodToAppError(result.error);
  return result.data;
}
