// Octave bands that lie below a room's Schroeder frequency: there the room's modes are few and far
// apart, so the level at any one seat depends on where it sits in the standing waves, and statistical
// room corrections (Schultz's relation, the room equation) give only a spatial average.
import { OCTAVE_BANDS_HZ } from '../constants';

/** The bands whose centre lies below f_s = 2000 sqrt(T60 / V) (Schroeder (1996), JASA 99, 3240, "The 'Schroeder frequency' revisited"; Schroeder & Kuttruff (1962), JASA 34, 76). */
export function bandsBelowSchroederHz(schroederHz: number, bandsHz: readonly number[] = OCTAVE_BANDS_HZ): number[] {
  return Number.isFinite(schroederHz) ? bandsHz.filter((hz) => hz < schroederHz) : [...bandsHz];
}

/** The warning in words, or null when every band lies above the Schroeder frequency. */
export function schroederWarning(schroederHz: number, bandsHz: readonly number[] = OCTAVE_BANDS_HZ): string | null {
  const below = bandsBelowSchroederHz(schroederHz, bandsHz);
  if (below.length === 0) return null;
  const named = below.map((hz) => (hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`));
  const list = named.length === 1 ? `The ${named[0]} band lies` : `The ${named.slice(0, -1).join(', ')} and ${named.at(-1)} bands lie`;
  const frequency = Number.isFinite(schroederHz) ? `${schroederHz.toFixed(0)} Hz` : 'undefined (the room absorbs nothing)';
  return `${list} below the room's Schroeder frequency (${frequency}, 2000·√(T/V), Schroeder 1962): the room's modes are sparse there, so the level at a seat can differ from this average by several dB.`;
}
