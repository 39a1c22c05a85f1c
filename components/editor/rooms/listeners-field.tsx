'use client';

import { useEffect, useId, useState } from 'react';
import { nextListenerName, randomId, type PlanRoom, type RoomListener } from '@/lib/plan';
import type { UnitSystem } from '@/models/user';
import { PointFields } from './point-fields';

/** A new listener seated (1.2 m) a quarter of the way in, so it does not sit on the first (product default). */
const SEATED_EAR_HEIGHT_M = 1.2;

function ListenerName({ listener, onCommit }: { listener: RoomListener; onCommit: (name: string) => void }) {
  const id = useId();
  const [name, setName] = useState(listener.name);
  useEffect(() => setName(listener.name), [listener.name]);
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="text-xs font-medium text-graphite-700">Listener name</label>
      <input id={id} className="field-input w-32 py-0.5 text-xs" value={name} onChange={(event) => setName(event.target.value)}
        onBlur={() => { if (name.trim() && name.trim() !== listener.name) onCommit(name.trim()); else setName(listener.name); }} />
    </div>
  );
}

// The room's listeners: the first (L1) and any further seats, each a point in the room with a short name.
export function ListenersField({ room, unitSystem, onListener, onChange }: { room: PlanRoom; unitSystem: UnitSystem; onListener: (listener: PlanRoom['listener']) => void; onChange: (extraListeners: RoomListener[]) => void }) {
  const listeners = room.extraListeners ?? [];
  const replace = (index: number, listener: RoomListener) => onChange(listeners.map((candidate, at) => (at === index ? listener : candidate)));
  const add = () => onChange([...listeners, { id: randomId(), name: nextListenerName(room), xM: room.lengthM / 4, yM: room.widthM / 4, zM: Math.min(SEATED_EAR_HEIGHT_M, room.heightM) }]);
  return (
    <div className="space-y-3" data-testid="listeners">
      <PointFields label="Listener L1" point={room.listener} unitSystem={unitSystem} onCommit={onListener} />
      {listeners.map((listener, index) => (
        <div key={listener.id} className="space-y-1" data-testid="extra-listener">
          <div className="flex items-center gap-2">
            <ListenerName listener={listener} onCommit={(name) => replace(index, { ...listener, name })} />
            <button type="button" className="btn-quiet ml-auto px-2 py-0 text-xs" onClick={() => onChange(listeners.filter((_, at) => at !== index))}>Remove {listener.name}</button>
          </div>
          <PointFields label={`Listener ${listener.name}`} point={listener} unitSystem={unitSystem} onCommit={(point) => replace(index, { ...listener, ...point })} />
        </div>
      ))}
      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={add}>Add a listener</button>
    </div>
  );
}
