// Q of resonances in a rectangular sheet-metal duct, against the published attenuation of unlined ducts.
import { describe, expect, it } from 'vitest';
import { airProperties, analyzeRun, speedOfSound, unlinedDuctAttenuationDbPerM } from '@/lib/acoustic';
import { DB_PER_NEPER } from '@/lib/acoustic/constants';
import { kirchhoffAttenuationNpPerM } from '@/lib/acoustic/wall-losses';

describe('Q of a closed rectangular sheet-metal duct', () => {
  // Closed–closed, f_n = n c / 2L; a plane wave losing alpha Np/m rings with Q = k / (2 alpha) = pi f / (c alpha)
  // (Kinsler & Frey, Fundamentals of Acoustics, ch. 10, damped standing waves). 12 x 12 in duct: the ASHRAE
  // Handbook's unlined rectangular table (Reynolds & Bledsoe; values from memory) gives 0.35 dB/ft at 63 Hz and
  // 0.2 dB/ft at 125 Hz, some 100 times the air's own boundary-layer loss: Q of about 4 and 15.
  const sideM = 12 * 0.0254;
  const section = { shape: 'rect' as const, widthM: sideM, heightM: sideM };
  const c = speedOfSound(20);
  const lengthM = (8 * c) / (2 * 125); // f_4 = 62.5 Hz, f_8 = 125 Hz

  it('Q follows pi f / (c alpha) with the tabulated attenuation at 62.5 and 125 Hz, in the 3–25 range of measured ducts', () => {
    const analysis = analyzeRun({ segments: [{ lengthM, section }], start: { kind: 'closed' }, end: { kind: 'closed' }, maxHz: 140 });
    const air = airProperties(20);
    for (const [order, hz, bandHz] of [[4, 62.5, 63], [8, 125, 125]] as const) {
      const resonance = analysis.resonances.find((candidate) => candidate.order === order)!;
      expect(resonance.frequencyHz).toBeCloseTo(hz, 0);
      const wallNp = unlinedDuctAttenuationDbPerM(section, [bandHz])[0] / DB_PER_NEPER;
      const airNp = kirchhoffAttenuationNpPerM(hz, 4 * sideM, sideM * sideM, air);
      const expectedQ = (Math.PI * hz) / (c * (wallNp + airNp));
      expect(resonance.q).toBeGreaterThan(expectedQ * 0.97);
      expect(resonance.q).toBeLessThan(expectedQ * 1.03);
      expect(resonance.q).toBeGreaterThan(3);
      expect(resonance.q).toBeLessThan(25);
    }
  });

  it('a 60 m duct, whose broad modes overlap (damping about 2.5 mode spacings): every one from 21 to 139 Hz is listed, each at its n c / 2L', () => {
    // Same physics, f_n = n c / 2L and fi = f / 2Q = c alpha / 2 pi: about 7 Hz of damping below 63 Hz against a
    // spacing of 2.9 Hz. The modes stand far above the real axis, as a row; the search must still reach each one.
    const longM = 60;
    const spacingHz = c / (2 * longM);
    const analysis = analyzeRun({ segments: [{ lengthM: longM / 2, section }, { lengthM: longM / 2, section }], start: { kind: 'closed' }, end: { kind: 'closed' }, minHz: 20, maxHz: 140 });
    const inside = analysis.resonances.filter((resonance) => resonance.frequencyHz > 21 && resonance.frequencyHz < 139);
    const firstOrder = Math.ceil(21 / spacingHz);
    const lastOrder = Math.floor(139 / spacingHz);
    expect(inside.length).toBe(lastOrder - firstOrder + 1);
    inside.forEach((resonance, index) => {
      expect(resonance.frequencyHz / ((firstOrder + index) * spacingHz)).toBeCloseTo(1, 2);
      expect(resonance.dampingHz).toBeGreaterThan(spacingHz);
    });
    const air = airProperties(20);
    const near125 = inside.reduce((best, resonance) => (Math.abs(resonance.frequencyHz - 125) < Math.abs(best.frequencyHz - 125) ? resonance : best));
    const wallNp = unlinedDuctAttenuationDbPerM(section, [125])[0] / DB_PER_NEPER;
    const airNp = kirchhoffAttenuationNpPerM(near125.frequencyHz, 4 * sideM, sideM * sideM, air);
    const expectedQ = (Math.PI * near125.frequencyHz) / (c * (wallNp + airNp));
    expect(near125.q).toBeGreaterThan(expectedQ * 0.95);
    expect(near125.q).toBeLessThan(expectedQ * 1.05);
  });

  it('rigid walls keep the air-only (Kirchhoff) Q, some 100 times higher', () => {
    const rigid = analyzeRun({ segments: [{ lengthM, section }], start: { kind: 'closed' }, end: { kind: 'closed' }, maxHz: 140, walls: { kind: 'rigid' } });
    const sheet = analyzeRun({ segments: [{ lengthM, section }], start: { kind: 'closed' }, end: { kind: 'closed' }, maxHz: 140 });
    const ratio = (rigid.resonances[3].q ?? 0) / (sheet.resonances[3].q ?? Infinity);
    expect(ratio).toBeGreaterThan(50);
  });
});
