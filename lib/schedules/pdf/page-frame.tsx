// What every page carries: the footer with page numbers and, on a draft, the watermark.
import { Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { styles } from './styles';

export function PageFrame({ content }: { content: ScheduleContent }) {
  return (
    <>
      {content.draft && <Text fixed style={styles.watermark}>DRAFT</Text>}
      <View fixed style={styles.footer}>
        <Text>{content.projectName} · {content.planName} · revision {content.revisionNumber}{content.draft ? ' · draft, not approved' : ''}</Text>
        <Text render={({ pageNumber }) => `Page ${pageNumber}`} />
      </View>
    </>
  );
}
