'use client';

import { randomId, type ExtraOutlet, type PlanRoom } from '@/lib/plan';
import type { UnitSystem } from '@/models/user';
import { LengthInput } from '../panels/length-input';

interface RunEnd { nodeId: string; label: string }

/** A new outlet 0.3 m below the ceiling at the room's middle until its end is chosen (product default, as for the first). */
const BELOW_CEILING_M = 0.3;

// The room's further outlets, each fed from its own run end: the end, the height (its place on the plan
// follows the end), and Remove; "Add an outlet" starts one without an end.
export function ExtraOutletsField({ room, ends, unitSystem, onChange }: { room: PlanRoom; ends: readonly RunEnd[]; unitSystem: UnitSystem; onChange: (extraOutlets: ExtraOutlet[]) => void }) {
  const outlets = room.extraOutlets ?? [];
  const replace = (index: number, outlet: ExtraOutlet) => onChange(outlets.map((candidate, at) => (at === index ? outlet : candidate)));
  const taken = (nodeId: string, index: number) => room.outlet.nodeId === nodeId || outlets.some((outlet, at) => at !== index && outlet.nodeId === nodeId);
  const add = () => onChange([...outlets, { id: randomId(), nodeId: null, xM: room.lengthM / 2, yM: room.widthM / 2, zM: Math.max(0, room.heightM - BELOW_CEILING_M) }]);
  return (
    <fieldset className="space-y-2" data-testid="extra-outlets">
      <legend className="mb-1 text-xs font-semibold">Further outlets</legend>
      {outlets.length === 0 && <p className="text-xs text-graphite-500">None: the room is fed by its first outlet only.</p>}
      {outlets.map((outlet, index) => (
        <div key={outlet.id} className="grid grid-cols-[1fr_8rem_auto] items-end gap-2" data-testid="extra-outlet">
          <div>
            <label htmlFor={`outlet-${outlet.id}`} className="block text-xs font-medium text-graphite-700">Outlet {index + 2}: run end</label>
            <select id={`outlet-${outlet.id}`} className="field-input mt-0.5 py-1" value={outlet.nodeId ?? ''} onChange={(event) => replace(index, { ...outlet, nodeId: event.target.value === '' ? null : event.target.value })}>
              <option value="">No run yet</option>
              {ends.map((end) => <option key={end.nodeId} value={end.nodeId} disabled={taken(end.nodeId, index)}>{end.label}{taken(end.nodeId, index) ? ' — already an outlet here' : ''}</option>)}
            </select>
          </div>
          <LengthInput label={`Outlet ${index + 2} height`} valueM={outlet.zM} kind="run" unitSystem={unitSystem} onCommit={(zM) => zM !== null && replace(index, { ...outlet, zM })} />
          <button type="button" className="btn-quiet px-2 py-1 text-xs" onClick={() => onChange(outlets.filter((_, at) => at !== index))}>Remove</button>
        </div>
      ))}
      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={add}>Add an outlet</button>
    </fieldset>
  );
}
