// The argument principle for the characteristic function D(f) of a compiled network: the number of
// zeros inside a closed contour is the winding number of D along it (Ahlfors, Complex Analysis, 3rd ed.,
// 4.5.2; D has no poles, network/evaluator.ts). Counted independently of the resonance search.
import type { NetworkEvaluator } from '@/lib/acoustic/network/evaluator';

export interface Zero { re: number; im: number }

/**
 * Evaluations of D allowed along one run's contour: a contour through a region where D is only rounding
 * noise would halve its pieces without end, so it fails at once with a message instead of stalling.
 */
const CONTOUR_EVALUATION_BUDGET = 2_000_000;
/** Change of arg D from a to b along a straight line, each piece halved until both halves turn by under 0.4 rad. */
export function argumentChange(evaluator: NetworkEvaluator, from: Zero, to: Zero, pieces: number, budget: { left: number }): number {
  const argAt = (re: number, im: number) => {
    if (--budget.left < 0) throw new Error(`the contour took over ${CONTOUR_EVALUATION_BUDGET} evaluations of D near ${re.toFixed(4)} + ${im.toFixed(4)}j Hz`);
    evaluator.characteristic(re, im, false);
    return Math.atan2(evaluator.valueIm, evaluator.valueRe);
  };
  const wrap = (angle: number) => angle - 2 * Math.PI * Math.round(angle / (2 * Math.PI));
  const along = (t: number) => ({ re: from.re + (to.re - from.re) * t, im: from.im + (to.im - from.im) * t });
  const refine = (t0: number, a0: number, t1: number, a1: number, depth: number): number => {
    const middle = along((t0 + t1) / 2);
    const am = argAt(middle.re, middle.im);
    const first = wrap(am - a0);
    const second = wrap(a1 - am);
    // Each half turns by well under pi, so neither can hide a whole turn; a zero close to the line makes its
    // halves turn fast and is refined to its own scale (a piece 2^-30 of the edge: far below any zero's distance).
    if (Math.abs(first) < 0.4 && Math.abs(second) < 0.4) return first + second;
    if (depth >= 30) throw new Error(`arg D does not settle near ${along(t0).re.toFixed(4)} + ${along(t0).im.toFixed(4)}j Hz`);
    return refine(t0, a0, (t0 + t1) / 2, am, depth + 1) + refine((t0 + t1) / 2, am, t1, a1, depth + 1);
  };
  let total = 0;
  let previous = argAt(from.re, from.im);
  for (let piece = 1; piece <= pieces; piece++) {
    const point = along(piece / pieces);
    const next = argAt(point.re, point.im);
    total += refine((piece - 1) / pieces, previous, piece / pieces, next, 0);
    previous = next;
  }
  return total;
}

/** Zeros of D inside the polygon (counter-clockwise), by the winding number of D along it. */
export function zerosInside(evaluator: NetworkEvaluator, corners: Zero[], pieceHz: number): number {
  let total = 0;
  const budget = { left: CONTOUR_EVALUATION_BUDGET };
  corners.forEach((corner, index) => {
    const next = corners[(index + 1) % corners.length];
    total += argumentChange(evaluator, corner, next, Math.max(4, Math.ceil(Math.hypot(next.re - corner.re, next.im - corner.im) / pieceHz)), budget);
  });
  return total / (2 * Math.PI);
}

