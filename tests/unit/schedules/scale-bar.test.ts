import { describe, expect, it } from 'vitest';
import { scaleBarFor } from '@/lib/schedules/scale-bar';

// Scale bars on drawings use round lengths of 1, 2 or 5 units (common practice, no source).
describe('scale bar', () => {
  it.each([
    [22.6, 2, '2 m'],
    [60, 10, '10 m'],
    [8.1, 1, '1 m'],
    [1.2, 0.2, '200 mm'],
    [260, 50, '50 m'],
  ])('a %s m wide plan gets a %s m bar', (widthM, lengthM, label) => {
    const bar = scaleBarFor(widthM);
    expect(bar.lengthM).toBeCloseTo(lengthM, 12);
    expect(bar.label).toBe(label);
    expect(bar.lengthM).toBeLessThanOrEqual(widthM / 5);
    expect(bar.lengthM).toBeGreaterThan(widthM / 25);
  });
});
