import type { RoomRow } from '@/lib/revisions/types';

const BANDS = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];

// Each room's noise path as frozen in the revision, for the engineer to review beside the resonances.
export function RoomPaths({ rooms }: { rooms: readonly RoomRow[] }) {
  const withPaths = rooms.filter((room) => room.path);
  if (withPaths.length === 0) return null;
  return (
    <section className="panel space-y-4 p-4" aria-labelledby="paths-title">
      <h2 id="paths-title" className="font-semibold">Noise paths, fan to listener</h2>
      {withPaths.map((room) => (
        <div key={room.id} className="overflow-x-auto">
          <table className="w-full text-xs" aria-label={`Noise path to the listener in ${room.name}`} data-testid="revision-path">
            <caption className="mb-1 text-left text-sm font-medium">{room.name}: NC {room.path!.nc.toFixed(0)}, NR {room.path!.nr.toFixed(1)}, {room.path!.dba.toFixed(1)} dB(A); the {room.path!.governingHz} Hz band governs</caption>
            <thead><tr className="border-b border-graphite-100 text-left text-graphite-500"><th scope="col" className="py-1 pr-2 font-medium">Element</th>{BANDS.map((band) => <th key={band} scope="col" className="num py-1 pr-1 text-right font-medium">{band}</th>)}</tr></thead>
            <tbody>
              {room.path!.rows.map((row) => (
                <tr key={row.label} className={`border-b border-graphite-100 ${row.total ? 'font-medium' : ''}`}>
                  <th scope="row" className="py-1 pr-2 text-left font-normal">{row.label}</th>
                  {row.valuesDb.map((value, band) => <td key={band} className="num py-1 pr-1 text-right">{value.toFixed(1)}</td>)}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ))}
    </section>
  );
}
