'use client';

import { KEY_BINDINGS } from '@/lib/plan';
import { TOOLS } from '../tools';

// Every keyboard shortcut, from the same tables the editor uses.
export function HelpOverlay({ onClose }: { onClose: () => void }) {
  const toolKeys = TOOLS.filter((tool) => !KEY_BINDINGS.some((binding) => binding.keys === tool.keys));
  return (
    <div role="dialog" aria-modal="true" aria-labelledby="help-title" className="absolute inset-0 z-50 flex items-start justify-center bg-graphite/30 pt-16" onClick={onClose}>
      <div className="panel w-[30rem] p-5" onClick={(event) => event.stopPropagation()}>
        <div className="flex items-center justify-between">
          <h2 id="help-title" className="font-semibold">Keyboard shortcuts</h2>
          <button type="button" className="btn-quiet" onClick={onClose} autoFocus>Close</button>
        </div>
        <table className="mt-3 w-full text-sm">
          <tbody>
            {[...KEY_BINDINGS.map((binding) => ({ keys: binding.keys, text: binding.description })), ...toolKeys.map((tool) => ({ keys: tool.keys, text: `${tool.label}: ${tool.hint}` })), { keys: '?', text: 'Show or hide this list' }].map((row) => (
              <tr key={`${row.keys}-${row.text}`} className="border-b border-graphite-100">
                <td className="py-1 pr-4"><kbd className="rounded border border-graphite-200 bg-paper-sunk px-1.5 font-mono text-xs">{row.keys}</kbd></td>
                <td className="py-1">{row.text}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-3 text-xs text-graphite-500">Hold Shift while drawing to turn snapping off. The mouse wheel zooms.</p>
      </div>
    </div>
  );
}
