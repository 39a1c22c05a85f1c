'use client';

import { memo } from 'react';
import { Circle, Group, Rect, Text } from 'react-konva';
import { roomListeners, roomPointPx, roomRectPx, type PlanRoom } from '@/lib/plan';

interface RoomShapeProps {
  room: PlanRoom;
  metresPerPixel: number;
  selected: boolean;
  flagged: boolean;
  scale: number;
}

// A room: its rectangle at the plan's scale, its name and size under it (outside the outline, clear of
// the duct that feeds the outlet) and each listener (a ring with its name); the outlets are drawn with their links to the duct
// end (outlet-link-shape.tsx). Selected rooms take the selection accent; a room with flags says so in its label.
export const RoomShape = memo(function RoomShape({ room, metresPerPixel, selected, flagged, scale }: RoomShapeProps) {
  const rect = roomRectPx(room, metresPerPixel);
  const listeners = roomListeners(room);
  const marker = 5 / scale;
  const label = `${room.name}\n${room.lengthM.toFixed(1)} × ${room.widthM.toFixed(1)} m · NC ${room.criterionNc}${flagged ? ' · ⚠ flagged' : ''}`;
  return (
    <Group>
      <Rect id={`room:${room.id}`} name="room" x={rect.x} y={rect.y} width={rect.width} height={rect.height}
        fill={selected ? 'rgba(45,106,150,0.08)' : 'rgba(37,40,45,0.03)'} stroke={selected ? '#2d6a96' : '#5d626b'}
        strokeWidth={(selected ? 2 : 1) / scale} dash={[8 / scale, 4 / scale]} perfectDrawEnabled={false} />
      <Text x={rect.x} y={rect.y + rect.height + 4 / scale} text={label} fontSize={12 / scale} lineHeight={1.25} fontFamily="IBM Plex Sans, sans-serif"
        fill={flagged ? '#8a3d12' : '#25282d'} listening={false} />
      {listeners.map((listener) => {
        const at = roomPointPx(room, listener, metresPerPixel);
        return (
          <Group key={listener.id}>
            <Circle x={at.x} y={at.y} radius={marker} stroke="#25282d" strokeWidth={1.5 / scale} listening={false} />
            <Text x={at.x + marker * 1.4} y={at.y - marker} text={listeners.length > 1 ? `listener ${listener.name}` : 'listener'} fontSize={11 / scale} fill="#5d626b" listening={false} />
          </Group>
        );
      })}
    </Group>
  );
});
