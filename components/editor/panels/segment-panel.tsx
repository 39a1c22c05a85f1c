'use client';

import { segmentLengthM, type Lining, type PathInsert, type PlanDocument, type PlanSegment, type Section, type Wall } from '@/lib/plan';
import { InsertsField } from './inserts-field';
import { formatLength } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';
import { LengthInput } from './length-input';
import { NumberInput } from './number-input';
import { WallsField } from './walls-field';

interface SegmentPanelProps {
  document: PlanDocument;
  segment: PlanSegment;
  /** Its stable label, e.g. "A3". */
  label: string;
  metresPerPixel: number;
  unitSystem: UnitSystem;
  editable: boolean;
  onSection: (section: Section) => void;
  onLining: (lining: Lining | null) => void;
  onWall: (wall: Wall | null) => void;
  /** The run's walls in words, for the inherited choice. */
  runWallsWords: string;
  onLengthOverride: (lengthM: number | null) => void;
  onInserts?: (inserts: PathInsert[]) => void;
}

// The selected segment: section, lining and length (drawn, or typed when drawn schematically).
export function SegmentPanel({ document: doc, segment, label, metresPerPixel, unitSystem, editable, onSection, onLining, onWall, runWallsWords, onLengthOverride, onInserts }: SegmentPanelProps) {
  const from = doc.nodes.find((node) => node.id === segment.from)!;
  const to = doc.nodes.find((node) => node.id === segment.to)!;
  const drawnM = segmentLengthM(from, to, metresPerPixel);
  const section = segment.section;
  return (
    <fieldset disabled={!editable} className="space-y-4">
      <legend className="mb-2 text-sm font-semibold">Segment <span className="num" data-testid="segment-label">{label}</span></legend>
      <div>
        <p className="mb-1 text-xs font-medium text-graphite-700">Section</p>
        <div className="flex gap-3 text-sm" role="radiogroup" aria-label="Section shape">
          <label className="flex items-center gap-1">
            <input type="radio" name="shape" checked={section.shape === 'round'} onChange={() => onSection({ shape: 'round', diameterM: section.shape === 'rect' ? Math.sqrt((4 * section.widthM * section.heightM) / Math.PI) : section.diameterM })} />
            Round Ø
          </label>
          <label className="flex items-center gap-1">
            <input type="radio" name="shape" checked={section.shape === 'rect'} onChange={() => onSection(section.shape === 'round' ? { shape: 'rect', widthM: section.diameterM, heightM: section.diameterM } : section)} />
            Rectangular w × h
          </label>
        </div>
      </div>
      {section.shape === 'round' ? (
        <LengthInput label="Diameter" kind="section" use="duct-size" unitSystem={unitSystem} valueM={section.diameterM} onCommit={(value) => value && onSection({ shape: 'round', diameterM: value })} />
      ) : (
        <div className="grid grid-cols-2 gap-2">
          <LengthInput label="Width" kind="section" use="duct-size" unitSystem={unitSystem} valueM={section.widthM} onCommit={(value) => value && onSection({ ...section, widthM: value })} />
          <LengthInput label="Height" kind="section" use="duct-size" unitSystem={unitSystem} valueM={section.heightM} onCommit={(value) => value && onSection({ ...section, heightM: value })} />
        </div>
      )}
      <div className="space-y-2">
        <p className="text-xs font-medium text-graphite-700">Length</p>
        <p className="num text-sm">Drawn: {formatLength(drawnM, unitSystem, 'run')}</p>
        <LengthInput
          label="Own length (blank: use the drawn length)"
          kind="run"
          unitSystem={unitSystem}
          valueM={segment.lengthOverrideM ?? null}
          allowEmpty
          placeholder="as drawn"
          onCommit={onLengthOverride}
        />
      </div>
      <div className="space-y-2">
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={Boolean(segment.lining)} onChange={(event) => onLining(event.target.checked ? { thicknessM: 0.025 } : null)} />
          Lined inside
        </label>
        {segment.lining && (
          <div className="grid grid-cols-2 gap-2">
            <LengthInput label="Lining thickness" kind="section" use="lining" unitSystem={unitSystem} valueM={segment.lining.thicknessM} onCommit={(value) => value && onLining({ ...segment.lining!, thicknessM: value })} />
            <NumberInput label="Absorption α (blank: by band)" value={segment.lining.absorption ?? null} min={0} max={1} allowEmpty
              onCommit={(value) => {
                const { absorption: _old, ...rest } = segment.lining!;
                void _old;
                onLining(value === null ? rest : { ...rest, absorption: value });
              }} />
          </div>
        )}
        {segment.lining && segment.lining.absorption === undefined && (
          <p className="text-xs text-graphite-500">Fibrous liner absorbing by band for its thickness; walls and lining take at most 40 dB over the segment (flanking).</p>
        )}
      </div>
      <WallsField label="Walls" wall={segment.wall ?? null} inheritedWords={`As the run (${runWallsWords})`} onChange={onWall} />
      {onInserts && <InsertsField inserts={segment.inserts ?? []} editable={editable} unitSystem={unitSystem} onChange={onInserts} />}
    </fieldset>
  );
}
