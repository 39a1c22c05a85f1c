// Hit testing the document: the point or segment under the pointer.
import { nodePositions, type PlanDocument } from './document';
import { nearestPoint, nearestSegment, type IdentifiedSegment } from './geometry/hit-test';
import type { Point } from './geometry/point';

export type DocumentHit = { kind: 'node'; nodeId: string; distancePx: number } | { kind: 'segment'; segmentId: string; distancePx: number; t: number; closest: Point } | null;

/** The segments of the document as geometry, for hit tests and drawing. */
export function segmentGeometry(doc: PlanDocument): IdentifiedSegment[] {
  const positions = nodePositions(doc);
  return doc.segments.flatMap((segment) => {
    const a = positions.get(segment.from);
    const b = positions.get(segment.to);
    return a && b ? [{ id: segment.id, a, b }] : [];
  });
}

/** Nodes win over segments: a node within tolerancePx, else the nearest segment within tolerancePx, else null. */
export function hitTestDocument(doc: PlanDocument, point: Point, tolerancePx: number): DocumentHit {
  const node = nearestPoint(doc.nodes, point, tolerancePx);
  if (node) return { kind: 'node', nodeId: node.id, distancePx: node.distancePx };
  const segment = nearestSegment(segmentGeometry(doc), point, tolerancePx);
  return segment ? { kind: 'segment', segmentId: segment.id, distancePx: segment.distancePx, t: segment.t, closest: segment.closest } : null;
}
