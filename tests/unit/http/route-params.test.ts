// The ids and other segments of a route URL (lib/http/route-params.ts). A record id is a UUID in
// the text form of RFC 9562 §4 (8-4-4-4-12 hexadecimal digits).
import { describe, expect, it } from 'vitest';
import { assertRouteParams } from '@/lib/http/route-params';

describe('assertRouteParams', () => {
  it('accepts record ids and clean text', () => {
    expect(() => assertRouteParams({ planId: '0b6f1c2a-3e0b-4d4f-9c7e-2d8b1a0e3f47', number: '3' })).not.toThrow();
  });

  it('refuses a malformed id with a 400 naming the segment', () => {
    for (const bad of ['abc', '0b6f1c2a-3e0b-4d4f-9c7e-2d8b1a0e3f4', '------------------------------------', "0b6f1c2a-3e0b-4d4f-9c7e-2d8b1a0e3f47'--", '']) {
      expect(() => assertRouteParams({ planId: bad }), bad).toThrow(expect.objectContaining({ code: 'bad_input', field: 'planId' }));
    }
  });

  it('refuses a NUL character in any other segment', () => {
    expect(() => assertRouteParams({ slug: ['a', 'b\u0000'] })).toThrow(expect.objectContaining({ code: 'bad_input', field: 'slug' }));
  });
});
