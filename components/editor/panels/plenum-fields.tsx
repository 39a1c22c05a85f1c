'use client';

import type { PlenumBox } from '@/lib/plan';
import type { UnitSystem } from '@/models/user';
import { LengthInput } from './length-input';
import { NumberInput } from './number-input';

/** A plenum box as it is being typed: any side may still be missing. */
export type PlenumDraft = { [K in keyof PlenumBox]: number | null };

export const EMPTY_PLENUM: PlenumDraft = { lengthM: null, widthM: null, heightM: null, outletAreaM2: null, offsetM: 0, absorption: null };

// The plenum box's inside dimensions, its outlet's size (width and height of the opening), how far the
// outlet sits off the inlet's axis, and the mean absorption of its lining: what Wells' equation needs.
export function PlenumFields({ draft, unitSystem, onChange }: { draft: PlenumDraft; unitSystem: UnitSystem; onChange: (draft: PlenumDraft) => void }) {
  const set = (key: keyof PlenumDraft) => (value: number | null) => onChange({ ...draft, [key]: value });
  const outletSide = draft.outletAreaM2 === null ? null : Math.sqrt(draft.outletAreaM2);
  return (
    <div className="space-y-1" data-testid="plenum-fields">
      <div className="grid grid-cols-3 gap-2">
        <LengthInput label="Box length" valueM={draft.lengthM} kind="run" unitSystem={unitSystem} allowEmpty onCommit={set('lengthM')} />
        <LengthInput label="Box width" valueM={draft.widthM} kind="run" unitSystem={unitSystem} allowEmpty onCommit={set('widthM')} />
        <LengthInput label="Box height" valueM={draft.heightM} kind="run" unitSystem={unitSystem} allowEmpty onCommit={set('heightM')} />
      </div>
      <div className="grid grid-cols-3 gap-2">
        <LengthInput label="Outlet side (square)" valueM={outletSide} kind="section" unitSystem={unitSystem} allowEmpty onCommit={(sideM) => onChange({ ...draft, outletAreaM2: sideM === null ? null : sideM * sideM })} />
        <LengthInput label="Outlet off the inlet's axis" valueM={draft.offsetM} kind="run" unitSystem={unitSystem} onCommit={set('offsetM')} />
        <NumberInput label="Lining absorption" value={draft.absorption} min={0.01} max={1} allowEmpty onCommit={set('absorption')} />
      </div>
      <p className="text-[11px] text-graphite-500">Inlet in one end wall, outlet in the opposite one (the equal-area square of a rectangular or round opening).</p>
    </div>
  );
}
