// Clean text (lib/text.ts). What counts as a lone surrogate comes from the Unicode Standard,
// §3.9 (D91, UTF-16): a high surrogate (D800–DBFF) must be followed by a low one (DC00–DFFF),
// and a low one preceded by a high one. PostgreSQL refuses both NUL and lone surrogates in text
// and jsonb (its manual, §8.14 JSON Types).
import { describe, expect, it } from 'vitest';
import { NUL_MESSAGE, SURROGATE_MESSAGE, text, textProblem } from '@/lib/text';

describe('textProblem', () => {
  it('accepts any well-formed text, including characters outside the BMP written as a surrogate pair', () => {
    // U+1D11E MUSICAL SYMBOL G CLEF is the pair D834 DD1E in UTF-16.
    for (const value of ['', 'Recital room', 'Salle de récital', '\uD834\uDD1E', 'e\u0301', '\uFEFFnote']) expect(textProblem(value)).toBeNull();
  });

  it('names a NUL character', () => {
    expect(textProblem('Run\u0000 1')).toBe(NUL_MESSAGE);
  });

  it('names a high surrogate alone, at the end or before another character, and a low surrogate alone', () => {
    for (const value of ['\uD834', 'run \uD834', '\uD834x', '\uDD1E', 'x\uDD1Ey', '\uDD1E\uD834']) expect(textProblem(value), JSON.stringify(value)).toBe(SURROGATE_MESSAGE);
  });
});

describe('text()', () => {
  it('is a string schema whose checks still chain, refusing NUL with its message', () => {
    const name = text({ error: 'must be text' }).trim().min(1, 'give it a name').max(5, 'too long');
    expect(name.parse('  Hall ')).toBe('Hall');
    expect(name.safeParse('Ha\u0000ll').error?.issues[0].message).toBe(NUL_MESSAGE);
    expect(name.safeParse('   ').error?.issues[0].message).toBe('give it a name');
    expect(name.safeParse(42).error?.issues[0].message).toBe('must be text');
  });
});
