'use client';

import { useState } from 'react';
import type { PlanDocument, PlanRoom, PlanTreatment } from '@/lib/plan';
import type { TreatmentCheck } from '@/lib/plans/analysis/types';
import type { PlacedFlag, RoomResult } from '@/lib/plans/risks';
import type { TreatmentOption } from '@/lib/plans/treatment-options';
import { RoomList } from '../rooms/room-list';
import { RiskList } from './risk-list';
import { TreatmentList } from './treatment-list';
import { TreatmentOptionsPanel } from './treatment-options';
import { MIN_DRAWER_HEIGHT_PX, useDrawerHeight } from './use-drawer-height';

type Tab = 'risks' | 'rooms' | 'treatments';

interface RiskDrawerProps {
  planId: string;
  version: number;
  flags: PlacedFlag[] | null;
  rules: { temperatureSwingC: number; speedSlipPercent: number; nearMaximumWavelengths: number } | null;
  roomResults: RoomResult[];
  rooms: readonly PlanRoom[];
  treatments: readonly PlanTreatment[];
  treatmentChecks: readonly TreatmentCheck[] | null;
  document: PlanDocument;
  loading: boolean;
  stale: boolean;
  error: string | null;
  editable: boolean;
  canEvaluate: boolean;
  onOpenRoom: (roomId: string) => void;
  onAddRoom: () => void;
  onChoose: (flag: PlacedFlag, option: TreatmentOption) => void;
  onRemoveTreatment: (treatmentId: string, keepDrawing: boolean) => void;
}

// The bottom drawer: every risk flag across the plan, the rooms, and the chosen treatments. Its
// height does not follow what the lists hold, so the canvas above keeps its size; the person
// drags its top edge (or uses the arrow keys on it) to make it taller or shorter, and the size is remembered.
export function RiskDrawer(props: RiskDrawerProps) {
  // Until someone opens or hides it, the drawer is open only when there is something in it.
  const [chosenOpen, setOpen] = useState<boolean | null>(null);
  const [tab, setTab] = useState<Tab>('risks');
  const [openFlag, setOpenFlag] = useState<PlacedFlag | null>(null);
  const flagCount = props.flags?.length ?? 0;
  const open = chosenOpen ?? (flagCount > 0 || props.rooms.length > 0 || props.treatments.length > 0);
  const tabs: { name: Tab; label: string }[] = [
    { name: 'risks', label: `Risks (${flagCount})` },
    { name: 'rooms', label: `Rooms (${props.rooms.length})` },
    { name: 'treatments', label: `Treatments (${props.treatments.length})` },
  ];
  const size = useDrawerHeight();
  const choose = (flag: PlacedFlag, option: TreatmentOption) => { props.onChoose(flag, option); setOpenFlag(null); setTab('treatments'); };
  return (
    <section aria-label="Rooms and risks" className="relative shrink-0 border-t border-graphite-100 bg-paper-raised">
      {open && (
        <div role="separator" aria-orientation="horizontal" aria-label="Drawer height: drag or use the arrow keys" tabIndex={0}
          aria-valuemin={MIN_DRAWER_HEIGHT_PX} aria-valuemax={size.maxPx} aria-valuenow={size.heightPx} data-testid="drawer-resize"
          className="absolute inset-x-0 -top-1.5 z-10 h-3 cursor-row-resize touch-none focus-visible:bg-select/30 hover:bg-select/20" {...size.handle} />
      )}
      <div className="flex items-center gap-1 px-3 pt-1" role="tablist">
        {tabs.map((candidate) => (
          <button key={candidate.name} type="button" role="tab" aria-selected={open && tab === candidate.name}
            className={`rounded-t px-3 py-1 text-sm ${open && tab === candidate.name ? 'border border-b-0 border-graphite-100 bg-paper font-medium' : 'text-graphite-700 hover:bg-paper-sunk'}`}
            onClick={() => { setTab(candidate.name); setOpen(true); }}>
            {candidate.label}
          </button>
        ))}
        {props.stale && <span className="ml-2 text-xs text-graphite-500" role="status">Showing the last saved plan; updating…</span>}
        <button type="button" className="btn-quiet ml-auto px-2 py-0.5 text-xs" aria-expanded={open} onClick={() => setOpen(!open)}>{open ? 'Hide' : 'Show'}</button>
      </div>
      {open && (
        <div className="space-y-3 overflow-y-auto px-4 py-3" role="tabpanel" style={{ height: size.heightPx }} data-testid="drawer-body">
          {props.error && <p role="alert" className="text-sm text-risk-ink">{props.error}</p>}
          {tab === 'risks' && (props.loading && !props.flags ? <p className="text-sm text-graphite-500">Checking the plan for risks…</p> : (
            <>
              <RiskList flags={props.flags ?? []} rules={props.rules} canEvaluate={props.canEvaluate} openFlagId={openFlag?.id ?? null} onOpen={setOpenFlag} />
              {openFlag && <TreatmentOptionsPanel planId={props.planId} version={props.version} flag={openFlag} editable={props.editable} onChoose={choose} onClose={() => setOpenFlag(null)} />}
            </>
          ))}
          {tab === 'rooms' && <RoomList rooms={props.rooms} results={props.roomResults} editable={props.editable} onOpen={props.onOpenRoom} onAdd={props.onAddRoom} />}
          {tab === 'treatments' && <TreatmentList document={props.document} treatments={props.treatments} checks={props.treatmentChecks} editable={props.editable} onRemove={props.onRemoveTreatment} />}
        </div>
      )}
    </section>
  );
}
