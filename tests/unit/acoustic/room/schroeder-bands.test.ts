import { describe, expect, it } from 'vitest';
import { bandsBelowSchroederHz, schroederFrequencyHz, schroederWarning } from '@/lib/acoustic';

describe('bands below the Schroeder frequency f_s = 2000 sqrt(T/V) (Schroeder & Kuttruff (1962), JASA 34, 76; Schroeder (1996), JASA 99, 3240)', () => {
  it('a small office (60 m³, T = 0.5 s, f_s = 182.6 Hz [calc]): the 63 and 125 Hz bands', () => {
    const fs = schroederFrequencyHz(0.5, 60);
    expect(bandsBelowSchroederHz(fs)).toEqual([63, 125]);
    expect(schroederWarning(fs)).toMatch(/^The 63 Hz and 125 Hz bands lie below the room's Schroeder frequency \(183 Hz/);
  });

  it('a recital room (840 m³, T = 1.2 s, f_s = 75.6 Hz [calc]): only the 63 Hz band', () => {
    expect(bandsBelowSchroederHz(schroederFrequencyHz(1.2, 840))).toEqual([63]);
    expect(schroederWarning(schroederFrequencyHz(1.2, 840))).toMatch(/^The 63 Hz band lies below/);
  });

  it('a large dead hall (20 000 m³, T = 0.8 s, f_s = 12.6 Hz): none, and no warning', () => {
    expect(bandsBelowSchroederHz(schroederFrequencyHz(0.8, 20000))).toEqual([]);
    expect(schroederWarning(schroederFrequencyHz(0.8, 20000))).toBeNull();
  });
});
