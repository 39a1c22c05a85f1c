// Small complex arithmetic for the code outside the hot loops (terminations, reflections).
// The transfer-matrix chain does its own arithmetic on plain numbers.

export interface Complex {
  re: number;
  im: number;
}

export const complex = (re: number, im = 0): Complex => ({ re, im });
export const cAdd = (a: Complex, b: Complex): Complex => ({ re: a.re + b.re, im: a.im + b.im });
export const cSub = (a: Complex, b: Complex): Complex => ({ re: a.re - b.re, im: a.im - b.im });
export const cScale = (a: Complex, factor: number): Complex => ({ re: a.re * factor, im: a.im * factor });
export const cMul = (a: Complex, b: Complex): Complex => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });
export const cAbs = (a: Complex): number => Math.hypot(a.re, a.im);
export const cArg = (a: Complex): number => Math.atan2(a.im, a.re);

export function cDiv(a: Complex, b: Complex): Complex {
  const denominator = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / denominator, im: (a.im * b.re - a.re * b.im) / denominator };
}

export function cExp(a: Complex): Complex {
  const magnitude = Math.exp(a.re);
  return { re: magnitude * Math.cos(a.im), im: magnitude * Math.sin(a.im) };
}

export function cSin(a: Complex): Complex {
  return { re: Math.sin(a.re) * Math.cosh(a.im), im: Math.cos(a.re) * Math.sinh(a.im) };
}

/** Principal square root. */
export function cSqrt(a: Complex): Complex {
  const magnitude = cAbs(a);
  const re = Math.sqrt((magnitude + a.re) / 2);
  const im = Math.sqrt(Math.max(0, (magnitude - a.re) / 2));
  return { re, im: a.im < 0 ? -im : im };
}
