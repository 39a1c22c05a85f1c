import { describe, expect, it } from 'vitest';
import { branchMouthCorrectionM } from '@/lib/acoustic';
import { expectClose } from './tolerance';

// Dubos, Kergomard, Khettabi, Dalmont, Keefe & Nederveen (1999), Acta Acustica 85, 153: the inner length
// correction of a side branch, t_i / b = 0.82 - 0.193 d - 1.09 d^2 + 1.27 d^3 - 0.71 d^4, d = b / a (from memory).
describe('side-branch mouth correction', () => {
  it('a narrow branch on a wide duct tends to the flanged end correction 0.8216 b (Norris & Sheng 1989)', () => {
    expectClose(branchMouthCorrectionM(0.001, 10) / 0.001, 0.8216, 0.002, 't_i / b as d -> 0');
  });

  it('values of the fit: d = 0.5 gives 0.56538 b, equal bores 0.097 b [calc]', () => {
    expectClose(branchMouthCorrectionM(0.05, 0.1) / 0.05, 0.565375, 1e-9, 'd = 0.5');
    expectClose(branchMouthCorrectionM(0.1, 0.1) / 0.1, 0.097, 1e-9, 'd = 1');
  });

  it('falls as the branch widens towards the host bore, and a branch wider than its host is taken at d = 1', () => {
    let previous = Infinity;
    for (let d = 0; d <= 1.0001; d += 0.05) {
      const perRadius = branchMouthCorrectionM(d * 0.1 || 1e-6, 0.1) / (d * 0.1 || 1e-6);
      expect(perRadius).toBeLessThan(previous);
      previous = perRadius;
    }
    expect(branchMouthCorrectionM(0.2, 0.1) / 0.2).toBeCloseTo(0.097, 12);
  });
});
