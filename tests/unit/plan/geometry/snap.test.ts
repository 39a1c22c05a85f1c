import { describe, expect, it } from 'vitest';
import { snapPoint, snapToAngle, snapToGrid } from '@/lib/plan/geometry';
import { expectClose } from '../../acoustic/tolerance';

describe('snapping', () => {
  it('snaps to the nearest grid crossing', () => {
    expect(snapToGrid({ x: 23, y: 38 }, 10)).toEqual({ x: 20, y: 40 });
    expect(snapPoint({ x: 23, y: 38 }, { gridSpacingPx: 10 })).toEqual({ point: { x: 20, y: 40 }, target: { kind: 'grid' } });
  });

  it('a grid with an origin has its lines through the origin (worked by hand)', () => {
    // Lines at 3 + 10k and 7 + 10k: 23 → 23, 38 → 37.
    expect(snapToGrid({ x: 23, y: 38 }, 10, { x: 3, y: 7 })).toEqual({ x: 23, y: 37 });
    expect(snapPoint({ x: -9, y: 1 }, { gridSpacingPx: 10, gridOrigin: { x: 3, y: 7 } }).point).toEqual({ x: -7, y: -3 });
  });

  it('projects onto 0/45/90° rays from the anchor', () => {
    const horizontal = snapToAngle({ x: 100, y: 7 }, { x: 0, y: 0 }, 45);
    expect(horizontal.angleDeg).toBe(0);
    expectClose(horizontal.point.x, 100, 1e-12, 'x along 0°');
    expectClose(horizontal.point.y, 0, 1e-12, 'y along 0°');
    const diagonal = snapToAngle({ x: 52, y: 48 }, { x: 0, y: 0 }, 45);
    expect(diagonal.angleDeg).toBe(45);
    expectClose(diagonal.point.x, diagonal.point.y, 1e-12, 'on the 45° ray x = y');
    expectClose(diagonal.point.x, 50, 1e-12, 'projection (52 + 48) / 2');
    const upwards = snapToAngle({ x: 3, y: -80 }, { x: 10, y: 10 }, 45);
    expect(upwards.angleDeg).toBe(270);
    expectClose(upwards.point.x, 10, 1e-12, 'vertical keeps x of the anchor');
  });

  it('rounds the distance along the ray to whole grid spacings when a grid is on', () => {
    const result = snapPoint({ x: 47, y: 3 }, { anchor: { x: 0, y: 0 }, angleStepDeg: 45, gridSpacingPx: 20 });
    expect(result.target).toEqual({ kind: 'angle', angleDeg: 0, onGrid: true });
    expectClose(result.point.x, 40, 1e-12, 'x');
  });

  it('prefers an existing node within its radius, ignoring excluded nodes', () => {
    const nodes = [{ id: 'a', x: 100, y: 100 }, { id: 'b', x: 104, y: 100 }];
    expect(snapPoint({ x: 103, y: 101 }, { nodes, nodeRadiusPx: 8, gridSpacingPx: 50 })).toEqual({ point: { x: 104, y: 100 }, target: { kind: 'node', nodeId: 'b' } });
    expect(snapPoint({ x: 103, y: 101 }, { nodes, nodeRadiusPx: 8, excludeNodeIds: ['b'] }).target).toEqual({ kind: 'node', nodeId: 'a' });
    expect(snapPoint({ x: 130, y: 101 }, { nodes, nodeRadiusPx: 8 })).toEqual({ point: { x: 130, y: 101 }, target: { kind: 'none' } });
  });
});
