// Lengths in metres from plan pixels, and the scale from a two-point calibration.
import { distancePx, type Point } from './point';

/** The segment's length in metres: its override when set, otherwise drawn length × scale. */
export function segmentLengthM(from: Point, to: Point, metresPerPixel: number, lengthOverrideM?: number | null): number {
  if (lengthOverrideM !== undefined && lengthOverrideM !== null) return lengthOverrideM;
  return distancePx(from, to) * metresPerPixel;
}

/** Scale from two clicked points and the real distance between them. Throws RangeError on a degenerate input. */
export function metresPerPixelFromCalibration(p1: Point, p2: Point, distanceM: number): number {
  if (!Number.isFinite(distanceM) || distanceM <= 0) throw new RangeError('The real distance must be a length greater than zero.');
  const pixels = distancePx(p1, p2);
  if (!Number.isFinite(pixels) || pixels < 1) throw new RangeError('Pick two points at least one pixel apart.');
  return distanceM / pixels;
}
