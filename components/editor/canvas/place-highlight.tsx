'use client';

import { Circle, Line } from 'react-konva';
import type { PlanDocument } from '@/lib/plan';

/** A place on the plan a derived element came from: a segment (a duct, a split) or a point (an elbow, an outlet). */
export interface PlanPlace {
  segmentId?: string | null;
  nodeId?: string | null;
}

const HIGHLIGHT = '#d9a21b';

// Where the noise path element under the pointer came from, drawn over the plan: a wide band along its
// segment, or a ring round its point.
export function PlaceHighlight({ place, document, scale }: { place: PlanPlace; document: PlanDocument; scale: number }) {
  const position = (nodeId: string) => document.nodes.find((node) => node.id === nodeId);
  if (place.segmentId) {
    const segment = document.segments.find((candidate) => candidate.id === place.segmentId);
    const from = segment && position(segment.from);
    const to = segment && position(segment.to);
    if (from && to) return <Line points={[from.x, from.y, to.x, to.y]} stroke={HIGHLIGHT} strokeWidth={16 / scale} opacity={0.45} lineCap="round" listening={false} name="place-highlight" />;
  }
  const node = place.nodeId ? position(place.nodeId) : undefined;
  if (node) return <Circle x={node.x} y={node.y} radius={14 / scale} stroke={HIGHLIGHT} strokeWidth={4 / scale} opacity={0.8} listening={false} name="place-highlight" />;
  return null;
}
