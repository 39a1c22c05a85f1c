import { describe, expect, it } from 'vitest';
import { boundaryGain, directivityAt, imageSources, type RoomBox } from '@/lib/acoustic';
import { expectClose } from '../tolerance';
import { uniformSurfaces } from './room-fixtures';

const box: RoomBox = { lengthM: 10, widthM: 8, heightM: 4, speedOfSoundMps: 343 };
const source = { xM: 2, yM: 3, zM: 1.5 };
const listener = { xM: 6, yM: 5, zM: 1.2 };

describe('image sources in a rectangular room (Allen & Berkley 1979, JASA 65)', () => {
  it('direct and first-order delays computed by hand', () => {
    const images = imageSources(box, uniformSurfaces(0), source, listener, 2);
    // 1 direct + 6 first order + 18 second order (lattice points with |nx| + |ny| + |nz| = 2)
    expect(images).toHaveLength(25);
    const byIndices = (indices: number[]) => images.find((image) => image.indices.join() === indices.join());
    const direct = Math.hypot(4, 2, 0.3);
    expectClose(byIndices([0, 0, 0])?.delayS ?? NaN, direct / 343, 1e-12, 'direct: (4, 2, 0.3) m');
    // mirror in x = 0: (-2, 3, 1.5); in x = 10: (18, 3, 1.5); in the floor: (2, 3, -1.5); in the ceiling: (2, 3, 6.5)
    expectClose(byIndices([-1, 0, 0])?.distanceM ?? NaN, Math.hypot(8, 2, 0.3), 1e-12, 'wall x = 0');
    expectClose(byIndices([1, 0, 0])?.distanceM ?? NaN, Math.hypot(12, 2, 0.3), 1e-12, 'wall x = 10');
    expectClose(byIndices([0, 0, -1])?.delayS ?? NaN, Math.hypot(4, 2, 2.7) / 343, 1e-12, 'floor');
    expectClose(byIndices([0, 0, 1])?.delayS ?? NaN, Math.hypot(4, 2, 5.3) / 343, 1e-12, 'ceiling');
    expect(byIndices([0, 0, -1])?.surfacesHit).toEqual(['floor']);
    // second order x = 0 then x = 10: image at 2 L + s = 22: distance (16, 2, 0.3)
    expectClose(byIndices([2, 0, 0])?.distanceM ?? NaN, Math.hypot(16, 2, 0.3), 1e-12, 'x = 0 and x = 10');
    expect([...(byIndices([2, 0, 0])?.surfacesHit ?? [])].sort()).toEqual(['wallXMax', 'wallXMin']);
  });

  it('level relative to the direct sound: 20 log(r_d / r_i) + 20 log sqrt(1 - alpha) per bounce', () => {
    const surfaces = { ...uniformSurfaces(0), floor: Array.from({ length: 8 }, () => 0.36) };
    const images = imageSources(box, surfaces, source, listener, 2);
    const floor = images.find((image) => image.indices.join() === '0,0,-1');
    const expected = 20 * Math.log10(Math.hypot(4, 2, 0.3) / Math.hypot(4, 2, 2.7)) + 20 * Math.log10(Math.sqrt(1 - 0.36));
    floor?.relativeLevelDb.forEach((levelDb, band) => expectClose(levelDb, expected, 1e-12, `band ${band}`));
  });
});

describe('boundary gain: Q = 2, 4, 8 on one, two, three planes (Long, Architectural Acoustics ch. 2), below c / 4d (quarter-wave rule, from memory)', () => {
  it('Q by position', () => {
    const corner = boundaryGain(box, { xM: 0.2, yM: 0.25, zM: 0.1 });
    expect(corner.steps.map((step) => step.q)).toEqual([8, 4, 2]);
    expectClose(corner.steps[0].belowHz, 343 / (4 * 0.25), 1e-9, 'Q = 8 below c / 4 d_max');
    expect(directivityAt(corner, 63)).toBe(8);
    // c / 4 d: 857.5 Hz (z, 0.1 m), 428.75 Hz (x, 0.2 m), 343 Hz (y, 0.25 m)
    expect(directivityAt(corner, 400)).toBe(4);
    expect(directivityAt(corner, 500)).toBe(2);
    expect(directivityAt(corner, 1000)).toBe(1);
    const edge = boundaryGain(box, { xM: 5, yM: 0.2, zM: 4 });
    expect(directivityAt(edge, 125)).toBe(4);
    const wall = boundaryGain(box, { xM: 5, yM: 4, zM: 0 });
    expect(directivityAt(wall, 125)).toBe(2);
    const middle = boundaryGain(box, { xM: 5, yM: 4, zM: 2 });
    expect(directivityAt(middle, 63)).toBe(1);
  });
});
