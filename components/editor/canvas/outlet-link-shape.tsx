'use client';

import { memo } from 'react';
import { Group, Label, Line, Rect, Tag, Text } from 'react-konva';
import { outletLinkTo, roomPointPx, withOutletAt, type OutletLink, type PlanRoom, type Point } from '@/lib/plan';

interface OutletLinkShapeProps {
  room: PlanRoom;
  link: OutletLink;
  metresPerPixel: number;
  scale: number;
}

const LABELS: Record<OutletLink['kind'], string> = {
  'at-end': 'outlet',
  'end-outside': 'outlet · duct end outside the room',
  apart: 'outlet · away from its duct end',
  unlinked: 'outlet · no duct end',
};

/** Below this many screen pixels the outlet sits on its end and needs no leader. */
const LEADER_MIN_SCREEN_PX = 1;

// A room's outlet (a square) with the word "outlet", joined by a dashed leader to the duct end that
// feeds it whenever the two are not on the same spot (the end outside the room, or apart).
export const OutletLinkShape = memo(function OutletLinkShape({ room, link, metresPerPixel, scale }: OutletLinkShapeProps) {
  const outlet = roomPointPx(room, room.outlet, metresPerPixel);
  const marker = 5 / scale;
  const end = link.kind === 'unlinked' ? null : link.end;
  const leader = end !== null && Math.hypot(end.x - outlet.x, end.y - outlet.y) * scale >= LEADER_MIN_SCREEN_PX;
  return (
    <Group listening={false} name="outlet-link">
      {leader && end && <Line points={[outlet.x, outlet.y, end.x, end.y]} stroke="#3a3e45" strokeWidth={1.5 / scale} dash={[4 / scale, 3 / scale]} />}
      <Rect x={outlet.x - marker} y={outlet.y - marker} width={2 * marker} height={2 * marker} stroke="#25282d" strokeWidth={1.5 / scale}
        dash={link.kind === 'unlinked' ? [2 / scale, 2 / scale] : undefined} />
      {/* On a paper-white tag, so the words stay legible where a duct crosses them. */}
      <Label x={outlet.x + marker * 1.4} y={outlet.y - marker * 3}>
        <Tag fill="#f7f6f2" opacity={0.85} cornerRadius={2 / scale} />
        <Text text={LABELS[link.kind]} fontSize={9 / scale} padding={1.5 / scale} fill="#3a3e45" />
      </Label>
    </Group>
  );
});

// While a duct end is dragged: the outlets it feeds, placed where the end is now (drawn on the active layer).
export function DraggedEndOutlets({ rooms, end, metresPerPixel, scale }: { rooms: readonly PlanRoom[]; end: Point; metresPerPixel: number; scale: number }) {
  return (
    <>
      {rooms.map((room) => {
        const placed = withOutletAt(room, end, metresPerPixel);
        return <OutletLinkShape key={room.id} room={placed} link={outletLinkTo(placed, end, metresPerPixel)} metresPerPixel={metresPerPixel} scale={scale} />;
      })}
    </>
  );
}
