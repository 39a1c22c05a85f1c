// Limits that arrived after documents had been saved. They are checked on everything people send
// (a save, an editor command), and skipped while a saved document is read back, so a plan saved
// before a limit existed still opens: its runs that break an engine limit show the engine's message
// in their results, and the next save names every field to bring within the limits.
import type { z } from 'zod';

let readingSaved = false;

/** Runs a check only while not reading a saved document, and only on a value that is otherwise valid. */
const whenChecked = (payload: { issues: readonly unknown[] }): boolean => !readingSaved && payload.issues.length === 0;

/** The schema with one more check, skipped on a saved document read with readSavedDocument. */
export function limited<T extends z.ZodType>(schema: T, within: (value: z.output<T>) => boolean, message: string): T {
  return schema.refine(within, { message, when: whenChecked }) as T;
}

/** Parses a saved document (synchronously) with the limits of `limited` left out. */
export function readSavedDocument<T>(parse: () => T): T {
  readingSaved = true;
  try {
    return parse();
  } finally {
    readingSaved = false;
  }
}
