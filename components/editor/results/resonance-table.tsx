'use client';

import type { Resonance } from '@/lib/acoustic';

interface ResonanceTableProps {
  resonances: Resonance[];
  nearFanTone: Record<number, number | null>;
  selectedOrder: number | null;
  onSelect: (order: number | null) => void;
}

// The run's standing-wave resonances; a row a blade-pass harmonic meets over the operating envelope is
// marked in words; a broad one (Q under 5, or overlapping its neighbour) says so: nothing to dodge there.
export function ResonanceTable({ resonances, nearFanTone, selectedOrder, onSelect }: ResonanceTableProps) {
  if (resonances.length === 0) return <p className="text-sm text-graphite-500">No resonance in the analysed band.</p>;
  return (
    <table className="w-full text-sm" aria-label="Resonances">
      <thead>
        <tr className="border-b border-graphite-100 text-left text-xs text-graphite-500">
          <th scope="col" className="py-1 pr-2 font-medium">Order</th>
          <th scope="col" className="py-1 pr-2 text-right font-medium">Frequency</th>
          <th scope="col" className="py-1 pr-2 text-right font-medium">Q</th>
          <th scope="col" className="py-1 pr-2 text-right font-medium">Bandwidth</th>
          <th scope="col" className="py-1 font-medium">Fan tone</th>
        </tr>
      </thead>
      <tbody>
        {resonances.map((resonance) => {
          const tone = nearFanTone[resonance.order] ?? null;
          const selected = selectedOrder === resonance.order;
          return (
            <tr
              key={resonance.order}
              aria-selected={selected}
              tabIndex={0}
              onClick={() => onSelect(selected ? null : resonance.order)}
              onKeyDown={(event) => { if (event.key === 'Enter' || event.key === ' ') { event.preventDefault(); onSelect(selected ? null : resonance.order); } }}
              className={`cursor-pointer border-b border-graphite-100 ${selected ? 'bg-select-soft' : 'hover:bg-paper-sunk'}`}
            >
              <td className="py-1 pr-2">{selected && <span aria-hidden="true">▸ </span>}{resonance.order}</td>
              <td className="num py-1 pr-2 text-right">{resonance.frequencyHz.toFixed(1)} Hz</td>
              <td className="num py-1 pr-2 text-right">{resonance.q === null ? '—' : resonance.q.toFixed(1)}</td>
              <td className="num py-1 pr-2 text-right">{resonance.bandwidthHz === null ? '—' : `${resonance.bandwidthHz.toFixed(1)} Hz`}</td>
              <td className="py-1">
                {resonance.broadband ? (
                  <span className="text-xs text-graphite-500" title="Q under 5 or overlapping its neighbour: the run responds broadly here">broad</span>
                ) : tone === null ? (
                  <span className="text-graphite-300">clear</span>
                ) : (
                  <span className="rounded bg-risk-soft px-1.5 py-0.5 text-xs font-medium text-risk-ink" title={`Its band meets the ${tone.toFixed(1)} Hz fan tone somewhere over the fan's speed range and the supply air's temperature range; the risk list grades it by the dB the run adds there`}>
                    ⚠ meets {tone.toFixed(0)} Hz
                  </span>
                )}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
