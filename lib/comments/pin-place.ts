// Where a comment pin sits, in the words of the plan: by the nearest labelled end, tee, joint or
// segment ("1.20 m along A3 from A2/A3"), else the room it falls in, and always its place in plan
// units from the plan's top-left corner. Pure: the editor and the revision page both use it.
import type { PlanDocument } from '@/lib/plan/document';
import { nearestPoint, nearestSegment, segmentLengthM, type Point } from '@/lib/plan/geometry';
import { planLabels, type PlanLabels } from '@/lib/plan/labels';
import { formatLength, type UnitSystem } from '@/lib/plan/units';

export interface PinPlaceContext {
  document: PlanDocument;
  metresPerPixel: number;
  unitSystem: UnitSystem;
  /** The frozen labels of a revision; derived from the document when absent. */
  labels?: PlanLabels | null;
}

export interface PinPlace {
  /** By the nearest labelled element or room; null when nothing labelled is near. */
  near: string | null;
  /** From the plan's top-left corner, in plan units. */
  position: string;
}

/** A pin this close to an end, tee or joint is described by it (common practice, no source: about an arm's reach on site). */
export const NEAR_POINT_M = 0.5;
/** A pin this close to a segment's centre line is described along it. */
export const NEAR_SEGMENT_M = 1;
/** Closer than this the pin is "at" the point rather than a distance from it. */
const AT_POINT_M = 0.05;

export function describePinPlace(point: Point, context: PinPlaceContext): PinPlace {
  const { metresPerPixel, unitSystem } = context;
  const length = (metres: number) => formatLength(metres, unitSystem, 'run');
  const position = `${length(point.x * metresPerPixel)} from the plan's left, ${length(point.y * metresPerPixel)} from its top`;
  return { near: nearWords(point, context, length), position };
}

function nearWords(point: Point, context: PinPlaceContext, length: (metres: number) => string): string | null {
  const { document, metresPerPixel } = context;
  if (!(metresPerPixel > 0)) return null;
  const labels = context.labels ?? planLabels(document);
  const labelled = document.nodes.filter((node) => labels.nodes[node.id] !== undefined);
  const nearNode = nearestPoint(labelled, point, NEAR_POINT_M / metresPerPixel);
  if (nearNode) {
    const label = labels.nodes[nearNode.id];
    const metres = nearNode.distancePx * metresPerPixel;
    return metres < AT_POINT_M ? `at ${label}` : `${length(metres)} from ${label}`;
  }
  const nodes = new Map(document.nodes.map((node) => [node.id, node]));
  const segments = document.segments.flatMap((segment) => {
    const a = nodes.get(segment.from);
    const b = nodes.get(segment.to);
    return a && b && labels.segments[segment.id] ? [{ id: segment.id, a, b, segment }] : [];
  });
  const nearSegment = nearestSegment(segments, point, NEAR_SEGMENT_M / metresPerPixel);
  if (nearSegment) {
    const found = segments.find((candidate) => candidate.id === nearSegment.id)!;
    const alongM = nearSegment.t * segmentLengthM(found.a, found.b, metresPerPixel, found.segment.lengthOverrideM);
    const from = labels.nodes[found.segment.from] ?? 'its first end';
    return `${length(alongM)} along ${labels.segments[found.id]} from ${from}`;
  }
  const room = document.rooms.find((candidate) => point.x >= candidate.x && point.y >= candidate.y
    && point.x <= candidate.x + candidate.lengthM / metresPerPixel && point.y <= candidate.y + candidate.widthM / metresPerPixel);
  return room ? `in ${room.name}` : null;
}
