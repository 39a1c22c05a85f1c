// Boundary gain against Waterhouse's published curves (Waterhouse (1955), "Interference patterns in
// reverberant sound fields", JASA 27, 247): the mean-square pressure of a source near rigid planes
// relative to free field, the sum over the source and its images of sin(kD)/(kD). His one-plane curve
// in dB, 10 log(1 + sin(2kd)/(2kd)), starts at +3 dB, crosses 0 dB at d = λ/4, dips to about −1 dB
// near d = 0.36 λ and settles at 0 dB; the edge and corner curves start at +6 and +9 dB (shape of the
// curves from memory; the points below are recomputed from the formula).
import { describe, expect, it } from 'vitest';
import { boundaryGain, directivityAt, type RoomBox } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const c = 343;
const hall: RoomBox = { lengthM: 200, widthM: 200, heightM: 60, speedOfSoundMps: c };
const sinc = (x: number) => (x === 0 ? 1 : Math.sin(x) / x);
const db = (q: number) => 10 * Math.log10(q);

describe('boundary gain follows Waterhouse\'s curve, not a step', () => {
  // one plane: a point 0.05 m below the ceiling of a hall whose other planes are at least 59 m away, so that
  // at the frequencies used (from 69 Hz) their images add under 0.01 to Q
  const d = 0.05;
  const gain = boundaryGain(hall, { xM: 100, yM: 100, zM: 60 - d });
  const atDistanceOverWavelength = (ratio: number) => (ratio * c) / d; // f with d = ratio · λ

  it('one plane: +3.0 dB as d/λ → 0, 0 dB at d = λ/4, its minimum −1.06 dB at d = 0.358 λ (where tan x = x, x = 4.4934 [calc])', () => {
    expectClose(db(directivityAt(gain, atDistanceOverWavelength(0.01))), 10 * Math.log10(2), 0.02, 'd/λ → 0');
    expectClose(db(directivityAt(gain, atDistanceOverWavelength(0.25))), 0, 0.05, 'λ/4');
    const xMin = 4.4934094579; // first minimum of sin x / x
    const ratioMin = xMin / (4 * Math.PI);
    expectClose(ratioMin, 0.3576, 1e-4, 'd/λ of the minimum [calc]');
    expectClose(db(1 + sinc(xMin)), -1.063, 0.001, 'depth of the dip [calc]');
    expectClose(db(directivityAt(gain, atDistanceOverWavelength(ratioMin))), -1.063, 0.05, 'engine at the dip');
  });

  it('one plane: the curve point by point from d/λ = 0.02 to 1, within 0.05 dB of 10 log(1 + sin 2kd / 2kd), and across λ/4 without a jump', () => {
    for (let ratio = 0.02; ratio <= 1.0001; ratio += 0.02) {
      const expected = db(1 + sinc(4 * Math.PI * ratio));
      expectClose(db(directivityAt(gain, atDistanceOverWavelength(ratio))), expected, 0.05, `d/λ = ${ratio.toFixed(2)}`);
    }
    const below = db(directivityAt(gain, atDistanceOverWavelength(0.249)));
    const above = db(directivityAt(gain, atDistanceOverWavelength(0.251)));
    expect(Math.abs(below - above)).toBeLessThan(0.05);
  });

  it('edge and corner: +6 and +9 dB at low frequency; a corner at equal distance d from three planes follows 1 + 3 sinc(2kd) + 3 sinc(2√2 kd) + sinc(2√3 kd) [calc]', () => {
    // an edge 0.05 m from two planes, the third 30 m away (its images add under 0.04 to Q at 100 Hz)
    const edge = boundaryGain(hall, { xM: 0.05, yM: 0.05, zM: 30 });
    expectClose(db(directivityAt(edge, 100)), 10 * Math.log10(4), 0.1, 'edge');
    const corner = boundaryGain({ lengthM: 10, widthM: 8, heightM: 3, speedOfSoundMps: c }, { xM: 0.4, yM: 0.4, zM: 2.6 });
    expectClose(db(directivityAt(corner, 2)), 10 * Math.log10(8), 0.05, 'corner');
    for (const hz of [63, 125, 250, 500]) {
      const k = (2 * Math.PI * hz) / c;
      const x = 2 * k * 0.4;
      const expected = 1 + 3 * sinc(x) + 3 * sinc(Math.SQRT2 * x) + sinc(Math.sqrt(3) * x);
      expectClose(directivityAt(corner, hz), expected, 1e-9, `${hz} Hz`);
    }
  });

  it('carries no step at a quarter wavelength: the result holds only the planes and the speed of sound', () => {
    expect(Object.keys(gain).sort()).toEqual(['planes', 'speedOfSoundMps']);
  });
});
