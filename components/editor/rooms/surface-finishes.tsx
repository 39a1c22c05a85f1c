'use client';

import { FINISHES, findFinish, SURFACE_NAMES, type PlanRoom, type RoomSurface, type SurfaceName } from '@/lib/plan';

export const SURFACE_LABELS: Record<SurfaceName, string> = {
  floor: 'Floor',
  ceiling: 'Ceiling',
  wallXMin: 'Left wall (x = 0)',
  wallXMax: 'Right wall (x = length)',
  wallYMin: 'Top wall on the plan (y = 0)',
  wallYMax: 'Bottom wall on the plan (y = width)',
};

// One finish per surface from the library; each choice shows its octave-band values and their source.
export function SurfaceFinishes({ room, onChange }: { room: PlanRoom; onChange: (surfaces: PlanRoom['surfaces']) => void }) {
  const choose = (name: SurfaceName, finishId: string) => {
    const finish = findFinish(finishId);
    if (!finish) return;
    const surface: RoomSurface = { finishId: finish.id, absorption: [...finish.absorption] };
    onChange({ ...room.surfaces, [name]: surface });
  };
  return (
    <fieldset className="space-y-2">
      <legend className="mb-1 text-xs font-semibold">Finishes (absorption, 63 Hz to 8 kHz)</legend>
      {SURFACE_NAMES.map((name) => {
        const surface = room.surfaces[name];
        const finish = findFinish(surface.finishId);
        return (
          <div key={name}>
            <label htmlFor={`finish-${name}`} className="block text-xs font-medium text-graphite-700">{SURFACE_LABELS[name]}</label>
            <select id={`finish-${name}`} className="field-input mt-0.5 py-1" value={surface.finishId ?? ''} onChange={(event) => choose(name, event.target.value)}>
              {surface.finishId === null && <option value="">Typed values</option>}
              {FINISHES.map((candidate) => <option key={candidate.id} value={candidate.id}>{candidate.name}</option>)}
            </select>
            <p className="num mt-0.5 text-[11px] text-graphite-500" title={finish?.source}>
              {surface.absorption.map((value) => value.toFixed(2)).join(' · ')}{finish ? ` — ${finish.source}` : ''}
            </p>
          </div>
        );
      })}
    </fieldset>
  );
}
