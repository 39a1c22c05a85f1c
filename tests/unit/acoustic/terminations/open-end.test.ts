import fc from 'fast-check';
import { describe, it } from 'vitest';
import { complex, type Complex } from 'mathjs';
import { terminationReflection } from '@/lib/acoustic';
import { oracleReflection } from '../oracle/mathjs-network';
import { expectClose } from '../tolerance';

// The resonance search evaluates the open-end models at complex frequency (damped modes, fi > 0).
// Checked against the mathjs oracle's independent transcription of the same published formulas:
// Dalmont & Nederveen (2001), J. Sound Vib. 244, eqs. (2), (9), (10); Norris & Sheng (1989), J. Sound Vib. 135, 85, eqs. (23), (24).
describe('open ends at complex frequency', () => {
  it.each(['unflanged', 'flanged'] as const)('%s: R(f) agrees with the mathjs oracle for fr + j fi, 0 <= fi <= fr / 2', (flange) => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 2000, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0.02, max: 0.4, noNaN: true }),
        (frequencyHz, dampingRatio, radiusM) => {
          const at = { re: frequencyHz, im: dampingRatio * frequencyHz };
          const fast = terminationReflection({ kind: 'open', flange }, at, radiusM, 343.2);
          const slow = oracleReflection({ kind: 'open', flange }, complex(at.re, at.im), radiusM, 343.2) as Complex;
          const scale = Math.max(1, Math.hypot(slow.re, slow.im));
          expectClose(fast.re, slow.re, 1e-12 * scale, `Re R at ${frequencyHz} Hz`);
          expectClose(fast.im, slow.im, 1e-12 * scale, `Im R at ${frequencyHz} Hz`);
        },
      ),
      { numRuns: 200, seed: 20261202 },
    );
  });
});
