'use client';

import type { RoomMode } from '@/lib/acoustic';

const SHOWN = 24;

// The lowest room modes with their indices and type.
export function ModeList({ modes }: { modes: RoomMode[] }) {
  return (
    <details>
      <summary className="cursor-pointer text-xs font-semibold">Mode list ({modes.length} modes; the lowest {Math.min(SHOWN, modes.length)} shown)</summary>
      <table className="num mt-1 w-full text-left text-xs">
        <thead className="text-graphite-500"><tr><th className="pr-2 font-medium">Frequency</th><th className="pr-2 font-medium">(nx, ny, nz)</th><th className="font-medium">Type</th></tr></thead>
        <tbody>
          {modes.slice(0, SHOWN).map((mode, index) => (
            <tr key={index} className="border-t border-graphite-100"><td className="pr-2">{mode.frequencyHz.toFixed(1)} Hz</td><td className="pr-2">({mode.indices.join(', ')})</td><td>{mode.type}</td></tr>
          ))}
        </tbody>
      </table>
    </details>
  );
}
