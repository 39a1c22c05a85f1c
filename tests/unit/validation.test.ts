// Keys a schema would drop are found and named (parseExactly refuses them); prototype keys are
// refused before any schema sees them (lib/clean-input.ts). Why: a key dropped silently makes
// the stored value differ from what was sent (issue 14); "__proto__" as an own key is how
// prototype pollution starts (OWASP, Prototype Pollution Prevention Cheat Sheet).
import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { findInputProblem } from '@/lib/clean-input';
import { findDroppedKey, parseExactly } from '@/lib/validation';

const schema = z.object({ name: z.string(), runs: z.array(z.object({ id: z.string(), ends: z.record(z.string(), z.number()) })) });

describe('findDroppedKey', () => {
  it('names the first key the schema left out, at any depth', () => {
    const input = { name: 'a', runs: [{ id: 'r1', ends: { start: 1 } }, { id: 'r2', colour: 'teal', ends: {} }] };
    expect(findDroppedKey(input, schema.parse(input))).toBe('runs.1.colour');
    expect(findDroppedKey({ name: 'a', extra: 1, runs: [] }, schema.parse({ name: 'a', runs: [] }))).toBe('extra');
  });

  it('finds nothing when every key is known, records included', () => {
    const input = { name: 'a', runs: [{ id: 'r1', ends: { start: 1, anything: 2 } }] };
    expect(findDroppedKey(input, schema.parse(input))).toBeNull();
  });

  it('leaves alone a value a transform rebuilt', () => {
    const rebuilt = z.object({ at: z.string() }).transform(({ at }) => at.toUpperCase());
    expect(findDroppedKey({ at: 'x', other: 1 }, rebuilt.parse({ at: 'x', other: 1 }))).toBeNull();
  });

  it('parseExactly refuses with a 400 naming the field', () => {
    expect(() => parseExactly(schema, { name: 'a', runs: [], colour: 'teal' })).toThrow(expect.objectContaining({ code: 'bad_input', field: 'colour' }));
  });
});

describe('prototype keys', () => {
  it('__proto__, constructor and prototype are refused where they are', () => {
    expect(findInputProblem(JSON.parse('{"runs":[{"ends":{"__proto__":{"x":1}}}]}'))).toEqual({ path: 'runs.0.ends.__proto__', message: '"__proto__" is not allowed as a key' });
    expect(findInputProblem({ constructor: 1 })?.path).toBe('constructor');
    expect(findInputProblem({ a: { prototype: 1 } })?.path).toBe('a.prototype');
  });
});
