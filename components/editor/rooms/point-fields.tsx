'use client';

import type { RoomPoint } from '@/lib/plan';
import type { UnitSystem } from '@/models/user';
import { LengthInput } from '../panels/length-input';

// A point in the room: x along its length, y along its width, z up from the floor.
export function PointFields({ label, point, unitSystem, onCommit }: { label: string; point: RoomPoint; unitSystem: UnitSystem; onCommit: (point: RoomPoint) => void }) {
  return (
    <fieldset>
      <legend className="mb-1 text-xs font-semibold">{label}</legend>
      <div className="grid grid-cols-3 gap-2">
        <LengthInput label={`${label} x`} valueM={point.xM} kind="run" unitSystem={unitSystem} onCommit={(xM) => xM !== null && onCommit({ ...point, xM })} />
        <LengthInput label={`${label} y`} valueM={point.yM} kind="run" unitSystem={unitSystem} onCommit={(yM) => yM !== null && onCommit({ ...point, yM })} />
        <LengthInput label={`${label} height`} valueM={point.zM} kind="run" unitSystem={unitSystem} onCommit={(zM) => zM !== null && onCommit({ ...point, zM })} />
      </div>
    </fieldset>
  );
}
