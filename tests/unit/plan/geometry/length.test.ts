import { describe, expect, it } from 'vitest';
import { distancePx, metresPerPixelFromCalibration, segmentLengthM } from '@/lib/plan/geometry';
import { expectClose } from '../../acoustic/tolerance';

describe('lengths and scale', () => {
  it('distance is Euclidean (3-4-5 triangle)', () => {
    expect(distancePx({ x: 1, y: 1 }, { x: 4, y: 5 })).toBe(5);
  });

  it('calibrates from two points and a real distance, and lengths follow', () => {
    const metresPerPixel = metresPerPixelFromCalibration({ x: 0, y: 0 }, { x: 300, y: 400 }, 12);
    expectClose(metresPerPixel, 12 / 500, 1e-15, '12 m over 500 px');
    expectClose(segmentLengthM({ x: 0, y: 0 }, { x: 250, y: 0 }, metresPerPixel), 6, 1e-12, 'half the calibration distance');
  });

  it('an override replaces the drawn length', () => {
    expect(segmentLengthM({ x: 0, y: 0 }, { x: 250, y: 0 }, 0.01, 7.5)).toBe(7.5);
    expect(segmentLengthM({ x: 0, y: 0 }, { x: 250, y: 0 }, 0.01, null)).toBe(2.5);
  });

  it('refuses a calibration with coincident points or a non-positive distance', () => {
    expect(() => metresPerPixelFromCalibration({ x: 5, y: 5 }, { x: 5, y: 5 }, 3)).toThrow('at least one pixel apart');
    expect(() => metresPerPixelFromCalibration({ x: 0, y: 0 }, { x: 5, y: 5 }, 0)).toThrow('greater than zero');
    expect(() => metresPerPixelFromCalibration({ x: 0, y: 0 }, { x: 5, y: 5 }, Number.NaN)).toThrow(RangeError);
  });
});
