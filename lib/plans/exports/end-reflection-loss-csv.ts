// The end reflection loss at a run's outlets as CSV, as the results panel's table gives it: one row per
// outlet with its label, the rooms it feeds, the round diameter it is taken as (reader's units, named in
// the header), how it is mounted, then the loss in dB for each octave band 63 Hz to 8 kHz.
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import { csvNumber, csvText, type CsvCell } from '@/lib/csv/csv-text';
import { OUTLET_MOUNTING_WORDS, type OutletReflectionLoss } from '@/lib/plan/outlet-reflection-loss';
import type { UnitSystem } from '@/lib/plan/units';
import { bandHeader } from './band-header';
import { lengthColumn } from './length-column';

/** Two decimals of a dB: the panel shows one. */
const DB_DECIMALS = 2;

export function endReflectionLossCsvHeader(units: UnitSystem): string[] {
  return [
    'Run', 'Outlet', 'Rooms fed', lengthColumn(units, 'section').header('Diameter taken'), 'Mounting',
    ...OCTAVE_BANDS_HZ.map((hz) => bandHeader(hz, 'dB', 'End reflection loss')),
  ];
}

export function endReflectionLossCsv(outlets: readonly OutletReflectionLoss[], units: UnitSystem): string {
  const diameter = lengthColumn(units, 'section');
  const rows: CsvCell[][] = outlets.map((outlet) => [
    outlet.runName,
    outlet.label,
    outlet.rooms.join('; '),
    diameter.cell(outlet.diameterM),
    OUTLET_MOUNTING_WORDS[outlet.mounting],
    ...outlet.erlDb.map((db) => csvNumber(db, DB_DECIMALS)),
  ]);
  return csvText(endReflectionLossCsvHeader(units), rows);
}
