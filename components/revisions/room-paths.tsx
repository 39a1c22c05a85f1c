import { NoiseTablesView } from '@/components/noise/noise-tables';
import type { UnitSystem } from '@/lib/plan/units';
import type { RoomRow } from '@/lib/revisions/types';
import { signedFixed } from '@/lib/signed-number';

const BANDS = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];

/** A revision frozen before rooms had several outlets and listeners: its one table, as it was frozen. */
function SinglePath({ room }: { room: RoomRow }) {
  const path = room.path!;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-xs" aria-label={`Noise path to the listener in ${room.name}`} data-testid="revision-path">
        <caption className="mb-1 text-left text-sm font-medium">{room.name}: NC {path.nc.toFixed(0)}, NR {path.nr.toFixed(1)}, {path.dba.toFixed(1)} dB(A); the {path.governingHz} Hz band governs</caption>
        <thead><tr className="border-b border-graphite-100 text-left text-graphite-500"><th scope="col" className="py-1 pr-2 font-medium">Element</th>{BANDS.map((band) => <th key={band} scope="col" className="num py-1 pr-1 text-right font-medium">{band}</th>)}</tr></thead>
        <tbody>
          {path.rows.map((row) => (
            <tr key={row.label} className={`border-b border-graphite-100 ${row.total ? 'font-medium' : ''}`}>
              <th scope="row" className="py-1 pr-2 text-left font-normal">{row.label}</th>
              {row.valuesDb.map((value, band) => <td key={band} className="num py-1 pr-1 text-right">{signedFixed(value, 1)}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

// Each room's noise as frozen in the revision, for the engineer to review beside the resonances: every
// outlet's path and every listener's table, lengths in the reader's units.
export function RoomPaths({ rooms, unitSystem }: { rooms: readonly RoomRow[]; unitSystem: UnitSystem }) {
  const withPaths = rooms.filter((room) => room.noise || room.path);
  if (withPaths.length === 0) return null;
  return (
    <section className="panel space-y-4 p-4" aria-labelledby="paths-title">
      <h2 id="paths-title" className="font-semibold">Noise paths, fan to listener</h2>
      {withPaths.map((room) => (room.noise ? (
        <div key={room.id} className="space-y-1" data-testid="revision-path">
          <h3 className="text-sm font-medium">{room.name}</h3>
          <NoiseTablesView tables={room.noise} units={unitSystem} />
        </div>
      ) : <SinglePath key={room.id} room={room} />))}
    </section>
  );
}
