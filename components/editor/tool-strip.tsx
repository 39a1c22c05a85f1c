'use client';

import { mayUseTool, TOOLS, type ToolName } from './tools';

// The tools this person may use; the editor refuses the others whatever asks for them.
export function ToolStrip({ tool, editable, onTool }: { tool: ToolName; editable: boolean; onTool: (tool: ToolName) => void }) {
  const shown = TOOLS.filter((candidate) => mayUseTool(candidate.name, editable));
  return (
    <div role="toolbar" aria-label="Drawing tools" aria-orientation="vertical" className="flex w-20 shrink-0 flex-col gap-1 overflow-y-auto border-r border-graphite-100 bg-paper-raised p-2">
      {shown.map((candidate) => (
        <button
          key={candidate.name}
          type="button"
          title={`${candidate.hint} (${candidate.keys})`}
          aria-pressed={tool === candidate.name}
          onClick={() => onTool(candidate.name)}
          className={`shrink-0 rounded px-1 py-1.5 text-xs ${tool === candidate.name ? 'bg-select text-paper-raised' : 'text-graphite-700 hover:bg-paper-sunk'}`}
        >
          <span className="block font-medium">{candidate.label}</span>
          <kbd className="font-mono text-[10px] opacity-70">{candidate.keys}</kbd>
        </button>
      ))}
    </div>
  );
}
