'use client';

import type { PlanRoom } from '@/lib/plan';
import type { RoomResult } from '@/lib/plans/risks';

interface RoomListProps {
  rooms: readonly PlanRoom[];
  results: RoomResult[];
  editable: boolean;
  onOpen: (roomId: string) => void;
  onAdd: () => void;
}

// The plan's rooms with their size, criterion and whether a run feeds them.
export function RoomList({ rooms, results, editable, onOpen, onAdd }: RoomListProps) {
  return (
    <div className="space-y-2">
      {rooms.length === 0 ? (
        <p className="text-sm text-graphite-500">No rooms yet. Use the Room tool to draw one on the plan{editable ? ', or add one here and place it from its form' : ''}.</p>
      ) : (
        <ul className="divide-y divide-graphite-100 text-sm">
          {rooms.map((room) => {
            const result = results.find((candidate) => candidate.roomId === room.id);
            return (
              <li key={room.id} className="flex items-center gap-3 py-1">
                <span className="font-medium">{room.name}</span>
                <span className="num text-xs text-graphite-500">{room.lengthM.toFixed(2)} × {room.widthM.toFixed(2)} × {room.heightM.toFixed(2)} m · NC {room.criterionNc}</span>
                <span className="text-xs text-graphite-700">{result?.problem ?? (result?.runId ? 'fed by a run' : '')}</span>
                <button type="button" className="btn-quiet ml-auto px-2 py-0.5 text-xs" onClick={() => onOpen(room.id)}>Open {room.name}</button>
              </li>
            );
          })}
        </ul>
      )}
      {editable && <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={onAdd}>Add a room</button>}
    </div>
  );
}
