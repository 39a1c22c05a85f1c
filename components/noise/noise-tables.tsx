import type { ReactNode } from 'react';
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import { correctionWords, ratingWords, rowWords, type ListenerTable, type NoiseTables, type PathRow } from '@/lib/plans/noise-path/path-tables';
import type { UnitSystem } from '@/lib/plan/units';
import { signedFixed } from '@/lib/signed-number';

const BAND_LABELS = OCTAVE_BANDS_HZ.map((hz) => (hz >= 1000 ? `${hz / 1000}k` : String(hz)));
const ROW_TEST_IDS: Partial<Record<PathRow['role'], string>> = { step: 'path-step', listener: 'path-listener', margin: 'path-margin' };

const cell = (value: number) => signedFixed(value, 1);

interface TableProps {
  caption: string;
  /** The first column's heading. */
  heading: string;
  rows: readonly PathRow[];
  units: UnitSystem;
  /** The band marked as governing (a listener's table). */
  governingHz?: number;
  belowSchroederHz: readonly number[];
  testId: string;
  /** Told the place on the plan of the element row under the pointer or focus (null when it leaves). */
  onPlace?: (place: { segmentId: string | null; nodeId: string | null } | null) => void;
}

// One table, an element or outlet per row and an octave band per column, compact enough for the room
// panel: the words column takes what is left, the numbers never wrap.
function BandTable({ caption, heading, rows, units, governingHz, belowSchroederHz, testId, onPlace }: TableProps) {
  const governing = governingHz === undefined ? -1 : OCTAVE_BANDS_HZ.indexOf(governingHz);
  return (
    <div className="overflow-x-auto">
      <table className="w-full table-fixed text-[11px] leading-tight" aria-label={caption} data-testid={testId}>
        <colgroup><col />{BAND_LABELS.map((label) => <col key={label} className="w-[2.6rem]" />)}</colgroup>
        <thead>
          <tr className="border-b border-graphite-100 text-left text-graphite-500">
            <th scope="col" className="py-1 pr-2 font-medium">{heading}</th>
            {BAND_LABELS.map((label, band) => (
              <th key={label} scope="col" className={`num whitespace-nowrap py-1 pl-1 text-right font-medium ${band === governing ? 'text-risk-ink' : ''}`}
                title={belowSchroederHz.includes(OCTAVE_BANDS_HZ[band]) ? 'Below the room’s Schroeder frequency' : undefined}>
                {label}{belowSchroederHz.includes(OCTAVE_BANDS_HZ[band]) ? '*' : ''}{band === governing ? ' ▲' : ''}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, index) => (
            <tr key={`${row.role}-${index}`} className={`border-b border-graphite-100 align-top ${row.total ? 'font-medium' : ''} ${onPlace && (row.segmentId || row.nodeId) ? 'hover:bg-paper-sunk' : ''}`} data-testid={ROW_TEST_IDS[row.role]}
              {...(onPlace && (row.segmentId || row.nodeId) ? {
                tabIndex: 0,
                onMouseEnter: () => onPlace({ segmentId: row.segmentId ?? null, nodeId: row.nodeId ?? null }),
                onMouseLeave: () => onPlace(null),
                onFocus: () => onPlace({ segmentId: row.segmentId ?? null, nodeId: row.nodeId ?? null }),
                onBlur: () => onPlace(null),
              } : {})}>
              <th scope="row" className="break-words py-1 pr-2 text-left font-normal">{rowWords(row, units)}</th>
              {row.valuesDb.map((value, band) => <td key={band} className={`num whitespace-nowrap py-1 pl-1 text-right ${band === governing ? 'bg-risk-soft' : ''}`}>{cell(value)}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function ListenerRatings({ table }: { table: ListenerTable }) {
  return <p className="num text-xs" data-testid="path-ratings">At {table.name}: {ratingWords(table)} (▲).</p>;
}

interface NoiseTablesViewProps {
  tables: NoiseTables;
  units: UnitSystem;
  /** Only this listener's table (the room panel's choice); all when absent (revision, schedule preview). */
  listenerId?: string;
  /** Told where an element row's element lies on the plan, for the editor to highlight it. */
  onPlace?: TableProps['onPlace'];
  /** Shown under each listener's table, such as a download button (the editor's sheet). */
  listenerAction?: (listener: ListenerTable) => ReactNode;
}

// A room's noise: each outlet's path from its fan (fan power, each element's loss, the power into the
// room), then each listener's table (room correction per outlet, their energy sum, the criterion and the
// margin, the governing band marked in words and a shape), the ratings and the cautions.
export function NoiseTablesView({ tables, units, listenerId, onPlace, listenerAction }: NoiseTablesViewProps) {
  const listeners = listenerId ? tables.listeners.filter((listener) => listener.listenerId === listenerId) : tables.listeners;
  const below = tables.bandsBelowSchroederHz;
  return (
    <div className="space-y-3" data-testid="noise-path">
      <p className="text-xs text-graphite-700">
        Room correction: {correctionWords(tables.correction)}. {tables.outlets.length > 1 ? `${tables.outlets.length} outlets, each from its own fan, summed by energy at each listener.` : ''}
      </p>
      {tables.outlets.map((outlet) => (
        <details key={outlet.outletId} open className="space-y-1" data-testid="outlet-path">
          <summary className="cursor-pointer text-xs font-semibold">{outlet.label} <span className="font-normal text-graphite-500">· {outlet.runName}</span></summary>
          <BandTable caption={`Path to ${outlet.label}`} heading="Element" rows={outlet.rows} units={units} belowSchroederHz={below} testId="outlet-path-table" onPlace={onPlace} />
        </details>
      ))}
      {listeners.map((listener) => (
        <section key={listener.listenerId} className="space-y-1" data-testid="listener-path">
          <BandTable caption={`At listener ${listener.name}`} heading={`At listener ${listener.name}`} rows={listener.rows} units={units} governingHz={listener.governingHz} belowSchroederHz={below} testId="listener-path-table" />
          <ListenerRatings table={listener} />
          {listenerAction?.(listener)}
        </section>
      ))}
      {below.length > 0 && <p className="text-[11px] text-graphite-500">* Below the room&apos;s Schroeder frequency ({tables.schroederHz.toFixed(0)} Hz).</p>}
      {tables.warnings.length > 0 && (
        <ul className="space-y-0.5 text-xs text-risk-ink" data-testid="noise-warnings">
          {tables.warnings.map((warning) => <li key={warning}><span aria-hidden="true">⚠ </span>{warning}</li>)}
        </ul>
      )}
    </div>
  );
}
