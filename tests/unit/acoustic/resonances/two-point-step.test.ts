// The two-point step of the resonance search: for g = (f - a) exp(b f), whose logarithmic derivative is
// 1/(f - a) + b exactly, two samples give a exactly, where Newton's step misses it by about b |f - a|^2;
// with a second zero in place of the constant background it still lands far closer than Newton's.
import { describe, expect, it } from 'vitest';
import { RatioSample } from '@/lib/acoustic/resonances/ratio-sample';
import { twoPointZero } from '@/lib/acoustic/resonances/two-point-step';

type Z = { re: number; im: number };
const divide = (a: Z, b: Z): Z => {
  const norm = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / norm, im: (a.im * b.re - a.re * b.im) / norm };
};
const inverse = (z: Z): Z => divide({ re: 1, im: 0 }, z);

function sample(at: Z, ratio: (f: Z) => Z): RatioSample {
  const sampled = new RatioSample();
  const r = ratio(at);
  sampled.set(at.re, at.im, r.re, r.im, 0, -1);
  return sampled;
}

function newtonFrom(at: Z, ratio: (f: Z) => Z): Z {
  const step = inverse(ratio(at));
  return { re: at.re - step.re, im: at.im - step.im };
}

/** From a first sample and a second at its Newton prediction: the distances to the zero of the model's root and of Newton's next prediction. */
function errorsFrom(first: Z, ratio: (f: Z) => Z, zero: Z): { model: number; newton: number } {
  const second = newtonFrom(first, ratio);
  const out = new Float64Array(2);
  expect(twoPointZero(sample(first, ratio), sample(second, ratio), out)).toBe(true);
  const newton = newtonFrom(second, ratio);
  return { model: Math.hypot(out[0] - zero.re, out[1] - zero.im), newton: Math.hypot(newton.re - zero.re, newton.im - zero.im) };
}

describe('two-point step on the deflated logarithmic derivative', () => {
  const zero = { re: 100.3, im: 0.8 };

  it('recovers the zero of (f - a) exp(b f) exactly from two samples', () => {
    const background = { re: -0.4, im: 0.25 };
    const ratio = (f: Z): Z => {
      const pole = inverse({ re: f.re - zero.re, im: f.im - zero.im });
      return { re: pole.re + background.re, im: pole.im + background.im };
    };
    const errors = errorsFrom({ re: 99.2, im: 0.3 }, ratio, zero);
    expect(errors.model).toBeLessThan(1e-9);
    expect(errors.newton).toBeGreaterThan(1e-3);
  });

  it('with a neighbouring zero as the background, lands closer than Newton from the same sample', () => {
    const neighbour = { re: 102.1, im: 1.1 };
    const ratio = (f: Z): Z => {
      const a = inverse({ re: f.re - zero.re, im: f.im - zero.im });
      const b = inverse({ re: f.re - neighbour.re, im: f.im - neighbour.im });
      return { re: a.re + b.re, im: a.im + b.im };
    };
    const errors = errorsFrom({ re: 99.6, im: 0.5 }, ratio, zero);
    expect(errors.model).toBeLessThan(errors.newton / 2);
  });
});
