// Assumptions and limits, the usual cautions, and the published methods used.
import { Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { ASSUMPTIONS, CAUTIONS, METHODS } from '../wording';
import { sectionHeading } from './sections';
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
      <View wrap={false}>
        <Text style={styles.h2}>{sectionHeading('assumptions')}</Text>
        <Text style={styles.paragraph}>Air temperatures used: {temperatures}.</Text>
      </View>
      <Bullets lines={ASSUMPTIONS} />
      <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('cautions')}</Text>
      <Bullets lines={CAUTIONS} />
      <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('methods')}</Text>
      <Bullets lines={METHODS} />
    </View>
  );
}
