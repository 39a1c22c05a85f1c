import { z } from 'zod';
import { AppError } from './errors';

// Turns a zod failure into a bad-input AppError naming the first offending field.
export function zodToAppError(error: z.ZodError): AppError {
  const issue = error.issues[0];
  const field = issue?.path.map(String).join('.') || undefined;
  const message = issue ? (field ? `${field}: ${issue.message}` : issue.message) : 'The request was not understood.';
  return new AppError('bad_input', message, { field });
}

export function parseWith<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw zodToAppError(result.error);
  return result.data;
}
