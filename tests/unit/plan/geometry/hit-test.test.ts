import { describe, expect, it } from 'vitest';
import { nearestPoint, nearestSegment, pointToSegmentDistancePx, projectOntoSegment } from '@/lib/plan/geometry';
import { hitTestDocument } from '@/lib/plan';
import { drawChain } from '../fixtures';

describe('hit tests', () => {
  it('measures the distance to a segment: perpendicular inside, to the nearer end outside', () => {
    expect(pointToSegmentDistancePx({ x: 5, y: 3 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBe(3);
    expect(pointToSegmentDistancePx({ x: 13, y: 4 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBe(5);
    expect(projectOntoSegment({ x: 2.5, y: 9 }, { x: 0, y: 0 }, { x: 10, y: 0 }).t).toBe(0.25);
    expect(pointToSegmentDistancePx({ x: 3, y: 4 }, { x: 0, y: 0 }, { x: 0, y: 0 })).toBe(5);
  });

  it('finds the nearest node and segment within tolerance, or none', () => {
    const points = [{ id: 'a', x: 0, y: 0 }, { id: 'b', x: 10, y: 0 }];
    expect(nearestPoint(points, { x: 8, y: 1 }, 5)?.id).toBe('b');
    expect(nearestPoint(points, { x: 5, y: 9 }, 5)).toBeNull();
    const segments = [{ id: 's1', a: { x: 0, y: 0 }, b: { x: 100, y: 0 } }, { id: 's2', a: { x: 0, y: 10 }, b: { x: 100, y: 10 } }];
    expect(nearestSegment(segments, { x: 50, y: 7 }, 4)?.id).toBe('s2');
    expect(nearestSegment(segments, { x: 50, y: 30 }, 4)).toBeNull();
  });

  it('on a document, a node wins over the segment it ends', () => {
    const { doc, nodeIds } = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }]);
    expect(hitTestDocument(doc, { x: 98, y: 2 }, 6)).toMatchObject({ kind: 'node', nodeId: nodeIds[1] });
    expect(hitTestDocument(doc, { x: 50, y: 2 }, 6)).toMatchObject({ kind: 'segment', segmentId: doc.segments[0].id, t: 0.5 });
    expect(hitTestDocument(doc, { x: 50, y: 20 }, 6)).toBeNull();
  });
});
