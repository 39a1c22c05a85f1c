'use client';

import { planLabels } from '@/lib/plan/labels';
import { useEffect, useState } from 'react';
import type { RiskFlag } from '@/lib/acoustic';
import { outletLink, runLeaves, type PlanDocument, type PlanRoom } from '@/lib/plan';
import type { RoomResult } from '@/lib/plans/risks';
import type { UnitSystem } from '@/models/user';
import { LengthInput } from '../panels/length-input';
import { NumberInput } from '../panels/number-input';
import { OutletLinkStatus } from './outlet-link-status';
import { ExtraOutletsField } from './extra-outlets-field';
import { ListenersField } from './listeners-field';
import { PointFields } from './point-fields';
import { RoomCorrectionField } from './room-correction-field';
import { RoomResults } from './room-results';
import { SoundPowerField } from './sound-power-field';
import { SurfaceFinishes } from './surface-finishes';

interface RoomPanelProps {
  document: PlanDocument;
  metresPerPixel: number;
  room: PlanRoom;
  result: RoomResult | null;
  /** The room's flags on the saved plan (the mode list marks the modes they cite). */
  flags: readonly RiskFlag[];
  unitSystem: UnitSystem;
  editable: boolean;
  onChange: (changes: Partial<Omit<PlanRoom, 'id'>>) => void;
  onDelete: () => void;
  onClose: () => void;
  /** Opens the room's noise path tables on the sheet over the canvas. */
  onShowNoiseTables: () => void;
}

/** The open ends of every run, for choosing the one that feeds the room. */
function runEnds(doc: PlanDocument): { nodeId: string; label: string }[] {
  const labels = planLabels(doc);
  return doc.runs.flatMap((run) => runLeaves(doc, run.id).filter((nodeId) => nodeId !== run.startNodeId).map((nodeId) => ({ nodeId, label: `${labels.nodes[nodeId] ?? 'an end'} (${run.name})` })));
}

// The room's form (name, size, finishes, criterion, outlets, listeners, room correction) and its results.
export function RoomPanel({ document, metresPerPixel, room, result, flags, unitSystem, editable, onChange, onDelete, onClose, onShowNoiseTables }: RoomPanelProps) {
  const [name, setName] = useState(room.name);
  useEffect(() => setName(room.name), [room.name]);
  const side = (key: 'lengthM' | 'widthM' | 'heightM') => (valueM: number | null) => { if (valueM !== null) onChange({ [key]: valueM }); };
  return (
    <div className="space-y-4" data-testid="room-panel">
      <div className="flex items-center gap-2">
        <h2 className="text-sm font-semibold">Room</h2>
        <button type="button" className="btn-quiet ml-auto px-2 py-0.5 text-xs" onClick={onClose}>Close</button>
      </div>
      <details open>
        <summary className="cursor-pointer text-xs font-semibold">Results from the saved plan</summary>
        <div className="mt-2"><RoomResults result={result} flags={flags} onShowNoiseTables={onShowNoiseTables} /></div>
      </details>
      <fieldset disabled={!editable} className="space-y-3">
        <legend className="mb-1 text-xs font-semibold">Properties</legend>
        <div>
          <label htmlFor="room-name" className="block text-xs font-medium text-graphite-700">Name</label>
          <input id="room-name" className="field-input mt-0.5 py-1" value={name} onChange={(event) => setName(event.target.value)}
            onBlur={() => { if (name.trim() && name !== room.name) onChange({ name: name.trim() }); }} />
        </div>
        <div className="grid grid-cols-3 gap-2">
          <LengthInput label="Length" valueM={room.lengthM} kind="run" unitSystem={unitSystem} onCommit={side('lengthM')} />
          <LengthInput label="Width" valueM={room.widthM} kind="run" unitSystem={unitSystem} onCommit={side('widthM')} />
          <LengthInput label="Height" valueM={room.heightM} kind="run" unitSystem={unitSystem} onCommit={side('heightM')} />
        </div>
        <div className="grid grid-cols-2 gap-2">
          <LengthInput label="Corner from the plan's left" valueM={room.x * metresPerPixel} kind="run" unitSystem={unitSystem} onCommit={(valueM) => valueM !== null && onChange({ x: valueM / metresPerPixel })} />
          <LengthInput label="Corner from the plan's top" valueM={room.y * metresPerPixel} kind="run" unitSystem={unitSystem} onCommit={(valueM) => valueM !== null && onChange({ y: valueM / metresPerPixel })} />
        </div>
        <NumberInput label="Criterion" unit="NC" value={room.criterionNc} min={0} max={70} onCommit={(criterionNc) => criterionNc !== null && onChange({ criterionNc })} />
        <div>
          <label htmlFor="room-outlet-node" className="block text-xs font-medium text-graphite-700">Fed from</label>
          <select id="room-outlet-node" className="field-input mt-0.5 py-1" value={room.outlet.nodeId ?? ''}
            onChange={(event) => onChange({ outlet: { ...room.outlet, nodeId: event.target.value === '' ? null : event.target.value } })}>
            <option value="">No run yet</option>
            {runEnds(document).map((end) => <option key={end.nodeId} value={end.nodeId}>{end.label}</option>)}
          </select>
        </div>
        {/* An outlet placed here takes its duct end along; any other room change puts the outlet back at its end. */}
        <OutletLinkStatus link={outletLink(document, room, metresPerPixel)} unitSystem={unitSystem} editable={editable} onJoin={() => onChange({})} />
        <PointFields label="Outlet" point={room.outlet} unitSystem={unitSystem} onCommit={(point) => onChange({ outlet: { ...room.outlet, ...point } })} />
        <ExtraOutletsField room={room} ends={runEnds(document)} unitSystem={unitSystem} onChange={(extraOutlets) => onChange({ extraOutlets })} />
        <ListenersField room={room} unitSystem={unitSystem} onListener={(listener) => onChange({ listener })} onChange={(extraListeners) => onChange({ extraListeners })} />
        <RoomCorrectionField value={room.roomCorrection} onChange={(roomCorrection) => onChange({ roomCorrection })} />
        <SoundPowerField value={room.outletSoundPowerDb} onCommit={(outletSoundPowerDb) => onChange({ outletSoundPowerDb })} />
        <SurfaceFinishes room={room} onChange={(surfaces) => onChange({ surfaces })} />
        {editable && <button type="button" className="btn-quiet text-xs" onClick={onDelete}>Delete {room.name}</button>}
      </fieldset>
    </div>
  );
}
