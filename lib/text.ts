// Text a person may send: any Unicode except the NUL character and lone UTF-16 surrogates
// (half of a character, left by a broken encoder). PostgreSQL refuses both in text and jsonb,
// so they are refused here, naming the field, before anything is stored.
import { z } from 'zod';

const NUL = /\u0000/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const NUL_MESSAGE = 'must not contain a NUL character (\\u0000)';
export const SURROGATE_MESSAGE = 'must not contain a broken character (a lone UTF-16 surrogate)';

/** What is wrong with a piece of text, or null when it may be stored. */
export function textProblem(value: string): string | null {
  if (NUL.test(value)) return NUL_MESSAGE;
  if (LONE_SURROGATE.test(value)) return SURROGATE_MESSAGE;
  return null;
}

/** `z.string()` for anything a person types: refuses NUL and lone surrogates with a plain message. */
export function text(params?: Parameters<typeof z.string>[0]) {
  return z.string(params).superRefine((value, context) => {
    const problem = textProblem(value);
    if (problem) context.addIssue({ code: 'custom', message: problem });
  });
}
