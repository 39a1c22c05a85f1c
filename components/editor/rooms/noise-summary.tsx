'use client';

import type { RoomNoise } from '@/lib/plans/noise-path/room-noise';
import { bandWords, correctionWords } from '@/lib/plans/noise-path/path-tables';
import { signedFixed } from '@/lib/signed-number';

// Each listener's ratings and least margin in one compact table for the room panel; the full path tables
// open on a sheet over the canvas.
export function NoiseSummary({ noise, onShowTables }: { noise: RoomNoise; onShowTables: () => void }) {
  return (
    <div className="space-y-2" data-testid="noise-summary">
      <p className="text-xs text-graphite-700">
        {noise.outlets.length} {noise.outlets.length === 1 ? 'outlet' : 'outlets'} ({noise.outlets.map((outlet) => outlet.label).join(', ')}); room correction: {correctionWords(noise.correction)}.
      </p>
      <table className="w-full text-xs" aria-label="Noise at each listener">
        <thead>
          <tr className="border-b border-graphite-100 text-left text-graphite-500">
            <th scope="col" className="py-1 pr-2 font-medium">Listener</th>
            <th scope="col" className="num py-1 pr-2 text-right font-medium">NC</th>
            <th scope="col" className="num py-1 pr-2 text-right font-medium">NR</th>
            <th scope="col" className="num py-1 pr-2 text-right font-medium">dB(A)</th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">Governs</th>
            <th scope="col" className="num py-1 text-right font-medium">Margin</th>
          </tr>
        </thead>
        <tbody>
          {noise.listeners.map((listener) => {
            const least = Math.min(...listener.marginDb);
            return (
              <tr key={listener.listenerId} className="border-b border-graphite-100" data-testid="listener-summary">
                <th scope="row" className="py-1 pr-2 text-left font-normal">{listener.name}{listener.listenerId === noise.worstListenerId && noise.listeners.length > 1 ? ' (the worst)' : ''}</th>
                <td className="num py-1 pr-2 text-right">{listener.nc.toFixed(0)}</td>
                <td className="num py-1 pr-2 text-right">{signedFixed(listener.nr, 1)}</td>
                <td className="num py-1 pr-2 text-right">{signedFixed(listener.dba, 1)}</td>
                <td className="py-1 pr-2 text-right">{bandWords(listener.governingHz)}</td>
                <td className={`num py-1 text-right ${least < 0 ? 'text-risk-ink' : ''}`}>{least < 0 ? `${(-least).toFixed(1)} dB above` : `${least.toFixed(1)} dB below`}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {noise.warnings.length > 0 && (
        <ul className="space-y-0.5 text-xs text-risk-ink">{noise.warnings.map((warning) => <li key={warning}><span aria-hidden="true">⚠ </span>{warning}</li>)}</ul>
      )}
      <button type="button" className="btn-quiet px-2 py-0.5 text-xs" onClick={onShowTables}>Noise path tables…</button>
    </div>
  );
}
