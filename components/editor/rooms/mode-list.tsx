'use client';

import { memo } from 'react';
import type { RiskFlag, RoomMode } from '@/lib/acoustic';
import { SeverityBadge } from '../risk/severity-badge';
import { modeRows } from './mode-rows';

// Every room mode the analysis computed, in a scrolling table, each mode a flag cites marked with the
// flag's severity (word and shape) and the duct resonance near it. Memoised: a few hundred rows
// need not be redrawn on every edit while the saved results stay the same.
export const ModeList = memo(function ModeList({ modes, flags }: { modes: RoomMode[]; flags: readonly RiskFlag[] }) {
  const { rows, unlisted } = modeRows(modes, flags);
  const flaggedCount = rows.filter((row) => row.flags.length > 0).length;
  const topHz = rows.at(-1)?.mode.frequencyHz;
  return (
    <details open={flaggedCount > 0 || unlisted.length > 0} data-testid="mode-list">
      <summary className="cursor-pointer text-xs font-semibold">
        Mode list: all {rows.length} modes{topHz === undefined ? '' : ` to ${topHz.toFixed(1)} Hz`}{flaggedCount > 0 ? `, ${flaggedCount} flagged` : ', none flagged'}
      </summary>
      <div className="mt-1 max-h-64 overflow-y-auto" tabIndex={0} role="region" aria-label="Room modes, scrolling">
        <table className="num w-full text-left text-xs" aria-label="Room modes">
          <thead className="sticky top-0 bg-paper-raised text-graphite-500">
            <tr><th className="pr-2 font-medium">Frequency</th><th className="pr-2 font-medium">(nx, ny, nz)</th><th className="pr-2 font-medium">Type</th><th className="font-medium">Flag</th></tr>
          </thead>
          <tbody>
            {rows.map(({ mode, flags: cited }) => (
              <tr key={mode.indices.join(',')} className={`border-t border-graphite-100 align-top ${cited.length > 0 ? 'bg-risk-soft font-medium' : ''}`}
                data-testid="mode-row" data-flagged={cited.length > 0 ? 'yes' : 'no'}>
                <td className="pr-2">{mode.frequencyHz.toFixed(1)} Hz</td>
                <td className="pr-2">({mode.indices.join(', ')})</td>
                <td className="pr-2">{mode.type}</td>
                <td>
                  {cited.map((flag) => (
                    <span key={flag.id} className="block">
                      <SeverityBadge severity={flag.severity} /> flagged{flag.resonanceOrder === undefined ? '' : `: duct resonance ${flag.resonanceOrder}`}
                    </span>
                  ))}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {unlisted.length > 0 && (
        <p role="alert" className="mt-1 text-xs text-risk-ink">
          Flags also cite modes this list does not hold: {unlisted.map((flag) => `${flag.subject.replace('room-mode:', '(')}) at ${flag.targetHz.toFixed(1)} Hz`).join('; ')}.
        </p>
      )}
    </details>
  );
});
