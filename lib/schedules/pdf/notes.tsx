// Assumptions and limits, the usual cautions, and the published methods used.
import { Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { ASSUMPTIONS, CAUTIONS, METHODS } from '../wording';
import { styles } from './styles';

function Bullets({ lines }: { lines: readonly string[] }) {
  return (
    <View>
      {lines.map((line) => (
        <View key={line} style={styles.bullet} wrap={false}>
          <Text style={styles.bulletMark}>–</Text>
          <Text style={styles.bulletText}>{line}</Text>
        </View>
      ))}
    </View>
  );
}

export function Notes({ content }: { content: ScheduleContent }) {
  const temperatures = content.temperaturesC.map((value) => `${value.toFixed(0)} °C`).join(', ') || 'none';
  return (
    <View>
      <Text style={styles.h2}>5. Assumptions and limits</Text>
      <Text style={styles.paragraph}>Air temperatures used: {temperatures}.</Text>
      <Bullets lines={ASSUMPTIONS} />
      <Text style={styles.h2}>6. Cautions</Text>
      <Bullets lines={CAUTIONS} />
      <Text style={styles.h2}>7. Methods</Text>
      <Bullets lines={METHODS} />
    </View>
  );
}
