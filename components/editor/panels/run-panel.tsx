'use client';

import { useEffect, useState } from 'react';
import type { Fan, PlanRun, Wall } from '@/lib/plan';
import type { UnitSystem } from '@/models/user';
import { NumberInput } from './number-input';
import { TemperatureInput } from './temperature-input';
import { SoundPowerField } from '../rooms/sound-power-field';
import { FanNoiseFields } from './fan-noise-fields';
import { WallsField } from './walls-field';

interface RunPanelProps {
  run: PlanRun;
  editable: boolean;
  unitSystem: UnitSystem;
  onChange: (changes: { name?: string; temperatureC?: number; walls?: Wall | null; fan?: Fan | null; fanOfRunId?: string | null; fanSoundPowerDb?: number[] | null }) => void;
  /** Runs whose fan this one may share (other runs with a fan of their own). */
  fanOwners: PlanRun[];
  /** Numbers the run's segments 1, 2, … from the start again (labels elsewhere keep theirs until then). */
  onRenumber?: () => void;
}

// The run as a whole: name, air temperature, and the fan whose blade-pass tone matters.
export function RunPanel({ run, editable, unitSystem, onChange, onRenumber, fanOwners }: RunPanelProps) {
  const sharedOwner = run.fanOfRunId ? fanOwners.find((owner) => owner.id === run.fanOfRunId) ?? null : null;
  const [name, setName] = useState(run.name);
  useEffect(() => setName(run.name), [run.name]);
  return (
    <fieldset disabled={!editable} className="space-y-3">
      <legend className="mb-2 text-sm font-semibold">Run <span className="num">{run.letter ?? ''}</span></legend>
      <div>
        <label htmlFor="run-name" className="block text-xs font-medium text-graphite-700">Name</label>
        <input id="run-name" className="field-input mt-0.5 py-1" value={name} onChange={(event) => setName(event.target.value)}
          onBlur={() => { if (name.trim() && name !== run.name) onChange({ name: name.trim() }); }} />
      </div>
      <TemperatureInput label="Air temperature" valueC={run.temperatureC} unitSystem={unitSystem} onCommit={(temperatureC) => onChange({ temperatureC })} />
      <p className="text-xs text-graphite-500">Flags allow for the supply air swinging {unitSystem === 'si' ? '±5 °C' : '±9 °F'} about this, and the fan&apos;s speed range (±2 % belt slip when none is entered).</p>
      <WallsField label="Walls of its segments" wall={run.walls ?? null} inheritedWords="Sheet metal (the default)" onChange={(walls) => onChange({ walls })} />
      {fanOwners.length > 0 && (
        <div>
          <label htmlFor="run-fan-source" className="block text-xs font-medium text-graphite-700">Fan</label>
          <select id="run-fan-source" className="field-input mt-0.5 py-1" value={run.fanOfRunId ?? ''} onChange={(event) => onChange({ fanOfRunId: event.target.value === '' ? null : event.target.value })}>
            <option value="">Its own fan</option>
            {fanOwners.map((owner) => <option key={owner.id} value={owner.id}>Shares the fan of {owner.name}</option>)}
          </select>
          {sharedOwner && <p className="mt-0.5 text-xs text-graphite-500">Blades, speed range and sound power are those of {sharedOwner.name}; the sound power divides between the runs by the area of each run&apos;s first duct.</p>}
        </div>
      )}
      {!sharedOwner && <div className="grid grid-cols-2 gap-2">
        <NumberInput label="Fan blades" value={run.fan?.blades ?? null} min={1} max={100} integer allowEmpty
          onCommit={(blades) => onChange({ fan: blades === null ? null : { ...run.fan, blades, rpm: run.fan?.rpm ?? 1200 } })} />
        <NumberInput label="Fan speed" unit="rpm" value={run.fan?.rpm ?? null} min={1} max={100000} allowEmpty
          onCommit={(rpm) => onChange({ fan: rpm === null ? null : { ...run.fan, blades: run.fan?.blades ?? 12, rpm } })} />
      </div>}
      {onRenumber && (
        <div className="flex items-center gap-2">
          <button type="button" className="btn-quiet" onClick={onRenumber}>Renumber segments</button>
          <span className="text-xs text-graphite-500">Labels stay as they are until you do this.</span>
        </div>
      )}
      {!sharedOwner && <SoundPowerField label="Fan sound power into this run" value={run.fanSoundPowerDb ?? null} onCommit={(bandsDb) => onChange({ fanSoundPowerDb: bandsDb })} />}
      {!sharedOwner && <FanNoiseFields fan={run.fan} editable={editable} onFan={(fan) => onChange({ fan })} onSpectrum={(bandsDb) => onChange({ fanSoundPowerDb: bandsDb })} />}
      {!sharedOwner && run.fan && <p className="num text-xs text-graphite-500">Blade-pass tone {((run.fan.blades * run.fan.rpm) / 60).toFixed(1)} Hz (blades × rpm / 60) and its harmonics.</p>}
    </fieldset>
  );
}
