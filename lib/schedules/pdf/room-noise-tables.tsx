// A room's noise in the schedule: each outlet's path from its fan and each listener's table (room
// correction per outlet, energy sum, criterion, margin), with the ratings and the cautions. Lengths are
// printed in SI, as the rest of the schedule.
import { Text, View } from '@react-pdf/renderer';
import { bandWords, correctionWords, type NoiseTables, type PathRow } from '@/lib/plans/noise-path/path-tables';
import { plainWarning } from '../plain-warning';
import { Table } from './table';
import { styles } from './styles';

const PATH_BANDS = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];

function BandTable({ title, rows, belowSchroederHz }: { title: string; rows: readonly PathRow[]; belowSchroederHz: readonly number[] }) {
  const below = new Set(belowSchroederHz.map((hz) => PATH_BANDS[[63, 125, 250, 500, 1000, 2000, 4000, 8000].indexOf(hz)]));
  return (
    <Table
      columns={[{ title, width: 0.36 }, ...PATH_BANDS.map((band) => ({ title: below.has(band) ? `${band}*` : band, width: 0.08, numeric: true }))]}
      rows={rows.map((row) => [row.label, ...row.valuesDb.map((value) => (Math.abs(value) < 0.05 ? 0 : value).toFixed(1))])}
    />
  );
}

export function RoomNoiseTables({ name, tables }: { name: string; tables: NoiseTables }) {
  return (
    <View>
      {tables.outlets.map((outlet, index) => (
        <View key={outlet.outletId} wrap={false}>
          {index === 0 && (
            <>
              <Text style={styles.h3}>Noise paths to the listeners: {name}</Text>
              <Text style={styles.paragraph}>
                Room correction: {correctionWords(tables.correction)}. {tables.outlets.length > 1 ? `${tables.outlets.length} outlets, each from its own fan, summed by energy at each listener. ` : ''}Losses are negative; levels in dB (sound power re 1 pW, sound pressure re 20 µPa).
              </Text>
            </>
          )}
          <BandTable title={`${outlet.label} (${outlet.runName})`} rows={outlet.rows} belowSchroederHz={tables.bandsBelowSchroederHz} />
        </View>
      ))}
      {tables.listeners.map((listener) => (
        <View key={listener.listenerId} wrap={false}>
          <BandTable title={`At listener ${listener.name}`} rows={listener.rows} belowSchroederHz={tables.bandsBelowSchroederHz} />
          <Text style={styles.paragraph}>At {listener.name}: NC {listener.nc.toFixed(0)}, NR {listener.nr.toFixed(1)}, {listener.dba.toFixed(1)} dB(A); the {bandWords(listener.governingHz)} band governs.</Text>
        </View>
      ))}
      {tables.bandsBelowSchroederHz.length > 0 && <Text style={styles.paragraph}>* Below the room&apos;s Schroeder frequency ({tables.schroederHz.toFixed(0)} Hz).</Text>}
      {tables.warnings.map((warning) => <Text key={warning} style={styles.paragraph}>Caution: {plainWarning(warning, tables)}</Text>)}
    </View>
  );
}
