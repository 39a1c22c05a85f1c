// The check over a whole decoded input (lib/clean-input.ts): clean text (lib/text.ts, whose
// rules come from the Unicode Standard §3.9) in every key and string, and bounded nesting.
import { describe, expect, it } from 'vitest';
import { assertCleanInput, findInputProblem, MAX_INPUT_DEPTH } from '@/lib/clean-input';
import { AppError } from '@/lib/errors';
import { NUL_MESSAGE, SURROGATE_MESSAGE } from '@/lib/text';

describe('findInputProblem', () => {
  it('names the field by its path as zod does', () => {
    expect(findInputProblem({ runs: [{ name: 'a' }, { name: 'b' }, { name: 'c\u0000' }] })).toEqual({ path: 'runs.2.name', message: NUL_MESSAGE });
  });

  it('reports the first problem in reading order', () => {
    expect(findInputProblem({ a: 'x\u0000', b: '\uD800' })?.path).toBe('a');
  });

  it('checks keys too, naming the object that holds the key', () => {
    expect(findInputProblem({ listeners: [{ ['seat\uDD1E']: 1 }] })).toEqual({ path: 'listeners.0', message: `has a key that ${SURROGATE_MESSAGE}` });
  });

  it(`allows ${MAX_INPUT_DEPTH} levels of nesting and refuses one more`, () => {
    const nested = (depth: number) => { let value: unknown = 'leaf'; for (let level = 0; level < depth; level += 1) value = [value]; return value; };
    expect(findInputProblem(nested(MAX_INPUT_DEPTH))).toBeNull();
    expect(findInputProblem(nested(MAX_INPUT_DEPTH + 1))?.message).toBe(`is nested more than ${MAX_INPUT_DEPTH} levels deep`);
  });

  it('walks a million-level nesting without overflowing the call stack', () => {
    const deep = JSON.parse(`${'['.repeat(1_000_000)}${']'.repeat(1_000_000)}`);
    expect(findInputProblem(deep)?.message).toMatch(/nested more than/);
  });
});

describe('assertCleanInput', () => {
  it('throws a 400 naming the field', () => {
    let thrown: unknown;
    try { assertCleanInput({ name: 'a\u0000' }); } catch (error) { thrown = error; }
    expect(thrown).toBeInstanceOf(AppError);
    expect(thrown).toMatchObject({ code: 'bad_input', field: 'name', message: `name: ${NUL_MESSAGE}` });
  });

  it('names the whole input when it is itself the bad text', () => {
    expect(() => assertCleanInput('\u0000')).toThrow(`The input ${NUL_MESSAGE}.`);
  });
});
