'use client';

// Dragging a room with the select tool: where its corner would go while the button is held,
// and one move reported on release (the editor snaps it and runs move-room, one undo step).
import { useCallback, useEffect, useState } from 'react';
import type { Point } from '@/lib/plan/geometry';

/** Pointer travel below this many screen pixels is a click on the room, not a drag (product choice). */
const DRAG_THRESHOLD_SCREEN_PX = 3;

export interface RoomDrag {
  readonly roomId: string;
  /** The room's top-left corner when it was grabbed, and where the drag has taken it; plan pixels. */
  readonly origin: Point;
  readonly corner: Point;
  /** The pointer when the room was grabbed, plan pixels. */
  readonly grabbedAt: Point;
  readonly moved: boolean;
}

export function useRoomDrag(onRoomDrag: (roomId: string, corner: Point) => void) {
  const [drag, setDrag] = useState<RoomDrag | null>(null);

  const grab = useCallback((roomId: string, origin: Point, pointer: Point) => {
    setDrag({ roomId, origin, corner: origin, grabbedAt: pointer, moved: false });
  }, []);

  const moveTo = useCallback((pointer: Point, scale: number) => {
    setDrag((current) => {
      if (!current) return current;
      const dx = pointer.x - current.grabbedAt.x;
      const dy = pointer.y - current.grabbedAt.y;
      const moved = current.moved || Math.hypot(dx, dy) * scale >= DRAG_THRESHOLD_SCREEN_PX;
      return { ...current, corner: { x: current.origin.x + dx, y: current.origin.y + dy }, moved };
    });
  }, []);

  useEffect(() => {
    if (!drag) return;
    const release = () => {
      setDrag(null);
      if (drag.moved) onRoomDrag(drag.roomId, drag.corner);
    };
    window.addEventListener('mouseup', release);
    return () => window.removeEventListener('mouseup', release);
  }, [drag, onRoomDrag]);

  return { drag, grab, moveTo };
}
