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

describe('boundary gain near rigid planes (Waterhouse (1955), JASA 27: image sum of sin(kD)/(kD); low-frequency limits 2, 4, 8 as in Long, Architectural Acoustics ch. 2)', () => {
  const c = 343;
  it('tends to 2, 4 and 8 on one, two and three planes at low frequency', () => {
    const corner = boundaryGain(box, { xM: 0.2, yM: 0.25, zM: 0.1 });
    expectClose(directivityAt(corner, 1), 8, 1e-3, 'corner');
    // an edge: two planes 0.1 m away, the third 15 m away, whose images (30 m) add under 0.03 each at 50 Hz
    const hall: RoomBox = { lengthM: 200, widthM: 200, heightM: 30, speedOfSoundMps: c };
    expectClose(directivityAt(boundaryGain(hall, { xM: 0.1, yM: 0.1, zM: 15 }), 50), 4, 0.15, 'edge');
    expectClose(directivityAt(boundaryGain(hall, { xM: 100, yM: 0.1, zM: 15 }), 50), 2, 0.1, 'one plane');
  });

  it('one plane follows 1 + sin(2kd)/(2kd): 1.6366 at d = lambda/8, 1 (0 dB) at d = lambda/4, never a step', () => {
    // a flush ceiling outlet is on the plane (d = 0): its image coincides, 2 at every frequency; the
    // other two planes are far, so evaluate the one-plane curve with a point 0.5 m below the ceiling
    // of a large room at frequencies where the far planes' images have decayed
    const hall: RoomBox = { lengthM: 200, widthM: 200, heightM: 30, speedOfSoundMps: c };
    const d = 0.5;
    const point = { xM: 100, yM: 100, zM: 30 - d };
    const gain = boundaryGain(hall, point);
    const onePlane = (hz: number) => 1 + Math.sin((4 * Math.PI * hz * d) / c) / ((4 * Math.PI * hz * d) / c);
    const eighth = c / (8 * d); // d = lambda / 8
    const quarter = c / (4 * d); // d = lambda / 4
    // the far images (>= 59 m away) add |sin(kD)/(kD)| < 1/(kD): under 0.03 in all here
    expectClose(directivityAt(gain, eighth), onePlane(eighth), 0.03, 'd = lambda/8');
    expectClose(onePlane(eighth), 1 + 2 / Math.PI, 1e-12, '1 + sin(pi/2)/(pi/2)');
    expectClose(directivityAt(gain, quarter), 1, 0.03, 'd = lambda/4: 0 dB');
    // smooth: no jump across the old quarter-wave step
    expect(Math.abs(directivityAt(gain, quarter * 0.99) - directivityAt(gain, quarter * 1.01))).toBeLessThan(0.1);
  });

  it('a point on a plane keeps Q 2 from that plane at every frequency', () => {
    const flush = boundaryGain(box, { xM: 5, yM: 4, zM: 0 });
    for (const hz of [63, 500, 4000]) expect(directivityAt(flush, hz)).toBeGreaterThan(1.9);
  });
});
