import { describe, expect, it } from 'vitest';
import { analyzeRoom, modalDensityPerHz, roomBands, roomConstantM2, roomEquationDb, roomModes, sabineReverberationTimeS, schroederFrequencyHz } from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { meetingRoom, uniformSurfaces } from './room-fixtures';

describe('statistical room acoustics', () => {
  it('Schroeder frequency f_s = 2000 sqrt(T60 / V): V = 60 m³, T60 = 0.5 s -> 182.6 Hz (sheet; Schroeder & Kuttruff 1962)', () => {
    expectClose(schroederFrequencyHz(0.5, 60), 2000 * Math.sqrt(0.5 / 60), 1e-12, '[calc]');
    expectClose(schroederFrequencyHz(0.5, 60), 182.6, 0.05, 'sheet');
  });

  // the air at 1 kHz, 20 °C, 50 % RH: 0.0047 dB/m (ISO 9613-1 equations; reference check value), m = α / (10 lg e)
  const airAreaAt1kM2 = 4 * (0.0047 / (10 * Math.log10(Math.E))) * 60;

  it('Sabine T60 = 0.161 V / (A + 4 m V) (Sabine; Kuttruff ch. 5): 5 x 4 x 3 m, alpha 0.2 on 94 m², the air at 1 kHz -> 0.161 * 60 / (18.8 + 0.26)', () => {
    expectClose(sabineReverberationTimeS(60, 18.8), (0.161 * 60) / 18.8, 1e-12, '[calc]');
    const bands = roomBands(meetingRoom.box, meetingRoom.surfaces, [1000]);
    expectClose(bands[0].absorptionAreaM2, 94 * 0.2, 1e-12, 'A = S alpha');
    expectClose(bands[0].airAbsorptionAreaM2, airAreaAt1kM2, 0.003, '4 m V');
    expectClose(bands[0].reverberationTimeS, (0.161 * 60) / (18.8 + airAreaAt1kM2), 1e-4, 'T60 per band (the reference value has two figures)');
  });

  it('room constant R = S a / (1 - a): 94 m², a = 0.2 -> 23.5 m² (sheet; Long, Architectural Acoustics ch. 8); with the air a = (A + 4 m V) / S', () => {
    expectClose(roomConstantM2(94, 0.2), 23.5, 1e-12, 'sheet');
    const mean = (18.8 + airAreaAt1kM2) / 94;
    expectClose(roomBands(meetingRoom.box, meetingRoom.surfaces, [1000])[0].roomConstantM2, (94 * mean) / (1 - mean), 0.005, 'from surfaces and air');
  });

  it('room equation Lp - Lw = 10 log(Q / 4 pi r^2 + 4 / R), r = 2 m, R = 23.5 m²: -7.210, -6.778, -6.024, -4.823 dB for Q = 1, 2, 4, 8 (sheet; Long)', () => {
    const sheet = [-7.21, -6.778, -6.024, -4.823];
    [1, 2, 4, 8].forEach((q, index) => {
      const calc = 10 * Math.log10(q / (4 * Math.PI * 2 * 2) + 4 / 23.5);
      expectClose(roomEquationDb(q, 2, 23.5), calc, 1e-12, `[calc] Q = ${q}`);
      expectClose(roomEquationDb(q, 2, 23.5), sheet[index], 5e-4, `sheet Q = ${q}`);
    });
  });

  it('modal density 4 pi V f^2 / c^3 + pi S f / 2c^2 + L / 8c (Morse & Bolt 1944): formula, and its integral matches the mode count of a 20 x 15 x 8 m hall to 300 Hz within 2 %', () => {
    const hall = { lengthM: 20, widthM: 15, heightM: 8, speedOfSoundMps: 343 };
    const [volume, surface, edges, c, f] = [2400, 2 * (300 + 160 + 120), 4 * 43, 343, 100];
    expectClose(modalDensityPerHz(hall, f), (4 * Math.PI * volume * f * f) / c ** 3 + (Math.PI * surface * f) / (2 * c * c) + edges / (8 * c), 1e-9, '[calc]');
    // N(f) = 4 pi V f^3 / 3c^3 + pi S f^2 / 4c^2 + L f / 8c, the integral of the density (Kuttruff ch. 3)
    const countHz = 300;
    const asymptotic = (4 * Math.PI * volume * countHz ** 3) / (3 * c ** 3) + (Math.PI * surface * countHz ** 2) / (4 * c * c) + (edges * countHz) / (8 * c);
    const counted = roomModes(hall, countHz).length;
    expect(Math.abs(counted - asymptotic) / asymptotic).toBeLessThan(0.02);
  });

  it('analyzeRoom: Schroeder frequency from the mid-band T60, first comb notch from the strongest reflection', () => {
    const analysis = analyzeRoom({ ...meetingRoom, surfaces: uniformSurfaces(0.2) });
    // T60 the mean of the 500 Hz and 1 kHz bands (Sabine with the air); f_s = 2000 sqrt(T60 / V)
    const midT60 = (analysis.bands[3].reverberationTimeS + analysis.bands[4].reverberationTimeS) / 2;
    expectClose(analysis.schroederHz, 2000 * Math.sqrt(midT60 / 60), 1e-9, '[calc]');
    expectClose(midT60, (0.161 * 60) / 18.8, 0.01, 'about the surfaces-only figure: the air adds about 1 % of A here');
    expect(analysis.images).toHaveLength(25);
    const strongest = analysis.strongestReflection;
    expect(strongest?.order).toBe(1);
    // outlet on the ceiling at z = 3, listener at z = 1 below it: the ceiling image coincides with the source
    // (distance 2 m), so the strongest distinct-path reflection is the floor image at z = -3: 4 m, delta d = 2 m
    const pathDifferenceM = (strongest?.distanceM ?? 0) - 2;
    expectClose(analysis.firstCombNotchHz ?? NaN, 343 / (2 * pathDifferenceM), 1e-9, 'f = c / 2 delta d [calc]');
  });
});
