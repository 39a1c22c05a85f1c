// One listener's noise path table as CSV: every outlet's path from its fan (fan power, each element's
// loss as a negative number, the power into the room), then the listener's own rows (room correction
// per outlet, their energy sum, the criterion curve and the margin), as the noise path tables show
// them, and last the listener's ratings in words (their band cells empty). Each row says which table it belongs to, its words (lengths in the reader's units), what it
// is, where on the plan, whether it is a total, and its value in dB for each octave band 63 Hz to 8 kHz.
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import { csvNumber, csvText, type CsvCell } from '@/lib/csv/csv-text';
import type { UnitSystem } from '@/lib/plan/units';
import { ratingWords, rowWords, type NoiseTables, type PathRow } from '@/lib/plans/noise-path/path-tables';
import { bandHeader } from './band-header';

/** Two decimals of a dB: the tables show one. */
const DB_DECIMALS = 2;

export function listenerPathCsvHeader(units: UnitSystem): string[] {
  return [
    'Table', `Row (lengths in ${units === 'imperial' ? 'ft and in' : 'm and mm'})`, 'Element', 'Source on the plan', 'Total (yes or no)',
    ...OCTAVE_BANDS_HZ.map((hz) => bandHeader(hz, 'dB')),
  ];
}

function rowCells(table: string, row: PathRow, units: UnitSystem): CsvCell[] {
  return [table, rowWords(row, units), row.element ?? row.role, row.source ?? '', row.total ? 'yes' : 'no', ...row.valuesDb.map((db) => csvNumber(db, DB_DECIMALS))];
}

/** Refuses a listener the tables do not have, naming it. */
export function listenerPathCsv(tables: NoiseTables, listenerId: string, units: UnitSystem): string {
  const listener = tables.listeners.find((candidate) => candidate.listenerId === listenerId);
  if (!listener) throw new RangeError(`listenerId: the room's noise has no listener ${listenerId}`);
  const rows = [
    ...tables.outlets.flatMap((outlet) => outlet.rows.map((row) => rowCells(`Path to ${outlet.label}`, row, units))),
    ...listener.rows.map((row) => rowCells(`At listener ${listener.name}`, row, units)),
    [`At listener ${listener.name}`, ratingWords(listener), 'Ratings', listener.name, 'no', ...OCTAVE_BANDS_HZ.map(() => null)],
  ];
  return csvText(listenerPathCsvHeader(units), rows);
}
