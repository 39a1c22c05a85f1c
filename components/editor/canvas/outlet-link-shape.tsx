'use client';

import { memo } from 'react';
import { Group, Label, Line, Rect, Tag, Text } from 'react-konva';
import { fedFrom, outletPointLink, roomOutlets, roomPointPx, withOutletAtItsEnd, type OutletLink, type PlanDocument, type PlanRoom, type Point } from '@/lib/plan';
import { endWordPlace } from './end-word-place';

/** One outlet of a room as drawn: where it is, how it stands against its duct end, its word. */
export interface OutletMark {
  key: string;
  /** The duct end that feeds it, or null. */
  nodeId: string | null;
  point: Point;
  link: OutletLink;
  /** "outlet", or "outlet 2", "outlet 3" for a room's further outlets. */
  name: string;
  /** Direction the duct runs out of its end (at its end) or from the end to the outlet (away from it), radians on the plan; null: unknown. */
  awayRad: number | null;
}

const SUFFIX: Record<OutletLink['kind'], string> = {
  'at-end': '',
  'end-outside': ' · duct end outside the room',
  apart: ' · away from its duct end',
  unlinked: ' · no duct end',
};

const FONT_PX = 11;
const PADDING_PX = 1.5;

/** Below this many screen pixels the outlet sits on its end and needs no leader. */
const LEADER_MIN_SCREEN_PX = 1;

/** Direction from the neighbouring point to the end nodeId, radians, or null when the end has no segment. */
function awayFromSegment(doc: PlanDocument, nodeId: string | null, positions: ReadonlyMap<string, Point>): number | null {
  if (nodeId === null) return null;
  const segment = doc.segments.find((candidate) => candidate.from === nodeId || candidate.to === nodeId);
  const end = positions.get(nodeId);
  const other = segment && positions.get(segment.from === nodeId ? segment.to : segment.from);
  return end && other ? Math.atan2(end.y - other.y, end.x - other.x) : null;
}

/** Every outlet of the room to draw, placed as the plan holds them. */
export function roomOutletMarks(doc: PlanDocument, room: PlanRoom, metresPerPixel: number, positions: ReadonlyMap<string, Point>): OutletMark[] {
  return roomOutlets(room).map((outlet, index) => {
    const end = outlet.nodeId === null ? undefined : positions.get(outlet.nodeId);
    const link = outletPointLink(room, outlet, end, metresPerPixel);
    const point = roomPointPx(room, outlet, metresPerPixel);
    // at its end the words go by the duct's direction; away from it, by the leader's (so the word never lies on the leader)
    const awayRad = link.kind === 'at-end' ? awayFromSegment(doc, outlet.nodeId, positions)
      : link.kind === 'unlinked' || (point.x === link.end.x && point.y === link.end.y) ? null : Math.atan2(point.y - link.end.y, point.x - link.end.x);
    return { key: `${room.id}:${outlet.id}`, nodeId: outlet.nodeId, point, link, name: index === 0 ? 'outlet' : `outlet ${index + 1}`, awayRad };
  });
}

// An outlet (a square) with its word, joined by a dashed leader to the duct end that feeds it whenever
// the two are not on the same spot (the end outside the room, or apart). At its end, the word goes to the
// side of the duct away from the end's own labels (the end's name beyond it, the termination's word on
// the other side), so the three never overlap.
export const OutletLinkShape = memo(function OutletLinkShape({ mark, scale }: { mark: OutletMark; scale: number }) {
  const { point: outlet, link } = mark;
  const marker = 5 / scale;
  const end = link.kind === 'unlinked' ? null : link.end;
  const leader = end !== null && Math.hypot(end.x - outlet.x, end.y - outlet.y) * scale >= LEADER_MIN_SCREEN_PX;
  const text = `${mark.name}${SUFFIX[link.kind]}`;
  const place = endWordPlace(outlet, mark.awayRad, 'right', text.length, FONT_PX, PADDING_PX, scale);
  return (
    <Group listening={false} name="outlet-link">
      {leader && end && <Line points={[outlet.x, outlet.y, end.x, end.y]} stroke="#3a3e45" strokeWidth={1.5 / scale} dash={[4 / scale, 3 / scale]} />}
      <Rect x={outlet.x - marker} y={outlet.y - marker} width={2 * marker} height={2 * marker} stroke="#25282d" strokeWidth={1.5 / scale}
        dash={link.kind === 'unlinked' ? [2 / scale, 2 / scale] : undefined} />
      {/* On a paper-white tag, so the words stay legible where a duct crosses them. */}
      <Label x={place.x} y={place.y}>
        <Tag fill="#f7f6f2" opacity={0.85} cornerRadius={2 / scale} />
        <Text text={text} fontSize={FONT_PX / scale} padding={PADDING_PX / scale} fill="#3a3e45" />
      </Label>
    </Group>
  );
});

// While a duct end is dragged: the outlets it feeds, placed where the end is now (drawn on the active layer).
export function DraggedEndOutlets({ doc, end, nodeId, metresPerPixel, scale }: { doc: PlanDocument; end: Point; nodeId: string; metresPerPixel: number; scale: number }) {
  const moved = { ...doc, nodes: doc.nodes.map((node) => (node.id === nodeId ? { ...node, x: end.x, y: end.y } : node)) };
  const positions = new Map(moved.nodes.map((node) => [node.id, { x: node.x, y: node.y }]));
  return (
    <>
      {doc.rooms.filter((room) => fedFrom(room, nodeId)).flatMap((room) => {
        const placed = withOutletAtItsEnd(moved, room, metresPerPixel);
        return roomOutletMarks(moved, placed, metresPerPixel, positions).filter((mark) => mark.nodeId === nodeId)
          .map((mark) => <OutletLinkShape key={mark.key} mark={mark} scale={scale} />);
      })}
    </>
  );
}
