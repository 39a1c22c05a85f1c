'use client';

// The DXF drawing's layers, each with a switch to show or hide it on the plan, and where the scale came from.
import type { DxfDrawing } from '@/lib/dxf/drawing';

export function DrawingLayersPanel({ drawing, hidden, onToggle }: { drawing: DxfDrawing; hidden: ReadonlySet<string>; onToggle: (name: string) => void }) {
  const shown = drawing.layers.length - drawing.layers.filter((layer) => hidden.has(layer.name)).length;
  return (
    <details open className="rounded border border-graphite-100 p-2" data-testid="drawing-layers">
      <summary className="cursor-pointer text-sm font-medium">Drawing layers ({shown} of {drawing.layers.length} shown)</summary>
      <p className="mt-1 text-xs text-graphite-500">
        {drawing.unitsName
          ? `The file is in ${drawing.unitsName}, so the drawing is at its true size; no scale to set.`
          : 'The file states no units: set the scale from two points whose distance you know (Scale tool, K).'}
        {' '}{drawing.entityCount.toLocaleString('en-GB')} lines, arcs and other entities.
      </p>
      <ul className="mt-1 max-h-48 space-y-0.5 overflow-y-auto">
        {drawing.layers.map((layer) => (
          <li key={layer.name}>
            <label className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={!hidden.has(layer.name)} onChange={() => onToggle(layer.name)} />
              <span className="truncate" title={layer.name}>{layer.name}</span>
              <span className="num ml-auto text-xs text-graphite-500">{layer.paths.length.toLocaleString('en-GB')}</span>
            </label>
          </li>
        ))}
      </ul>
    </details>
  );
}
