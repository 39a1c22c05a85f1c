// A plain ruled table: column widths as fractions, numbers right-aligned.
import { Text, View } from '@react-pdf/renderer';
import { styles } from './styles';

export interface Column { title: string; width: number; numeric?: boolean }

export function Table({ columns, rows, riskRows }: { columns: Column[]; rows: string[][]; riskRows?: ReadonlySet<number> }) {
  return (
    <View style={styles.table}>
      <View style={styles.headRow}>
        {columns.map((column) => (
          <Text key={column.title} style={[styles.headCell, { width: `${column.width * 100}%` }, column.numeric ? { textAlign: 'right' } : {}]}>{column.title}</Text>
        ))}
      </View>
      {rows.map((row, rowIndex) => (
        <View key={rowIndex} style={riskRows?.has(rowIndex) ? styles.riskRow : styles.row}>
          {row.map((cell, cellIndex) => (
            <Text key={cellIndex} style={[columns[cellIndex].numeric ? styles.numCell : styles.cell, { width: `${columns[cellIndex].width * 100}%` }]}>{cell}</Text>
          ))}
        </View>
      ))}
    </View>
  );
}
