// How large one plan pixel is for a DXF drawing: the drawing's longest side spread over at most
// DXF_TARGET_SIDE_PX pixels, rounded up to a round step of 1, 2 or 5 × 10ⁿ (common practice, no
// source), so a drawing in metres and the same drawing in millimetres get the same pixels.
import { DXF_TARGET_SIDE_PX } from './limits';

const ROUND_STEPS = [1, 2, 5, 10];

/** The smallest round step of 1, 2 or 5 × 10ⁿ that is at least `size` (size > 0). */
export function roundStepAtLeast(size: number): number {
  const decade = 10 ** Math.floor(Math.log10(size));
  // a little slack so 0.001 written as 0.0010000000000000002 stays 0.001
  const step = ROUND_STEPS.find((candidate) => candidate * decade >= size * (1 - 1e-9))!;
  return step * decade;
}

/** Length of one plan pixel for a drawing whose longest side is `longestSide` (in any length unit; the answer is in the same unit). */
export function pixelSizeFor(longestSide: number): number {
  return roundStepAtLeast(longestSide / DXF_TARGET_SIDE_PX);
}
