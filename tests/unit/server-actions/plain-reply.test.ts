// What a server action call may carry. The markers are those React's reply decoder reads
// (react-server-dom-webpack 19, parseModelString in the server build bundled with Next 16): `$$`
// escapes a `$`, `$u` is undefined, `$I` Infinity, `$-0` and `$-Infinity`, `$N` NaN, `$D` a
// date, `$n` a BigInt; every other marker points at another part of the body.
import { describe, expect, it } from 'vitest';
import { MAX_ACTION_ARGUMENTS, plainReplyProblem } from '@/lib/server-actions/plain-reply';

describe('plainReplyProblem', () => {
  it('accepts plain arguments as React writes them inline', () => {
    expect(plainReplyProblem([{ email: 'a@b.test', password: 'x' }])).toBeNull();
    expect(plainReplyProblem(['0b6f1c2a-3e0b-4d4f-9c7e-2d8b1a0e3f47', { role: 'viewer' }])).toBeNull();
    expect(plainReplyProblem([{ everywhere: '$u', at: '$D2026-12-02T10:00:00.000Z', cost: '$$5', big: '$n123', gap: '$-0', top: '$Infinity', none: '$NaN' }])).toBeNull();
    expect(plainReplyProblem([])).toBeNull();
  });

  it('refuses arguments that are not a list', () => {
    for (const value of [{ a: 1 }, 'hello', 1, null]) expect(plainReplyProblem(value)).toBe('the arguments must be a JSON array');
  });

  it(`refuses more than ${MAX_ACTION_ARGUMENTS} arguments`, () => {
    expect(plainReplyProblem(Array.from({ length: MAX_ACTION_ARGUMENTS }, () => 1))).toBeNull();
    expect(plainReplyProblem(Array.from({ length: MAX_ACTION_ARGUMENTS + 1 }, () => 1))).toBe(`at most ${MAX_ACTION_ARGUMENTS} arguments`);
  });

  it('refuses markers that point at another part of the body, however deep', () => {
    for (const marker of ['$Q5', '$@7', '$W1', '$K0', '$h1', '$T', '$B2', '$R3', '$1', '$1:name', '$']) {
      expect(plainReplyProblem([{ deep: [{ value: marker }] }]), marker).toMatch(/refers to another part of the body/);
    }
  });

  it('refuses a BigInt marker that is not digits (its decoding would throw)', () => {
    expect(plainReplyProblem(['$nabc'])).toMatch(/refers to another part/);
  });

  it('refuses text that cannot be stored, naming the argument', () => {
    expect(plainReplyProblem([{ name: 'a\u0000' }])).toBe('argument 0.name must not contain a NUL character (\\u0000)');
  });
});
