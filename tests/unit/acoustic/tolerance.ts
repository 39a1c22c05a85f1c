import { expect } from 'vitest';

/** Asserts |actual - expected| <= tolerance, naming the check in the failure message. */
export function expectClose(actual: number, expected: number, tolerance: number, label: string): void {
  const difference = Math.abs(actual - expected);
  expect(Number.isFinite(actual), `${label}: got ${actual}`).toBe(true);
  expect(difference <= tolerance, `${label}: got ${actual}, expected ${expected} ± ${tolerance} (off by ${difference})`).toBe(true);
}

/** Bisection for a sign change of fn in [low, high], to the given width. */
export function bisect(fn: (x: number) => number, low: number, high: number, width = 1e-10): number {
  let lowValue = fn(low);
  let a = low;
  let b = high;
  while (b - a > width) {
    const middle = (a + b) / 2;
    const middleValue = fn(middle);
    if (Math.sign(middleValue) === Math.sign(lowValue)) {
      a = middle;
      lowValue = middleValue;
    } else {
      b = middle;
    }
  }
  return (a + b) / 2;
}

/** All sign changes of fn on a grid, refined by bisection; skips brackets where |fn| grows (poles). */
export function rootsBySignChange(fn: (x: number) => number, low: number, high: number, step: number): number[] {
  const roots: number[] = [];
  let previousX = low;
  let previousValue = fn(low);
  for (let x = low + step; x <= high + 1e-12; x += step) {
    const value = fn(x);
    if (Math.sign(value) !== Math.sign(previousValue)) {
      const root = bisect(fn, previousX, x);
      if (Math.abs(fn(root)) < Math.max(Math.abs(value), Math.abs(previousValue))) roots.push(root);
    }
    previousX = x;
    previousValue = value;
  }
  return roots;
}
