// What every page carries: the running header (practice, document number, revision, status, date),
// the footer (project and plan, page x of y) and, on a draft, the watermark.
import { Image, Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { RISK, styles } from './styles';

export function PageFrame({ content }: { content: ScheduleContent }) {
  return (
    <>
      {content.draft && <Text fixed style={styles.watermark}>DRAFT</Text>}
      <View fixed style={styles.header}>
        <View style={styles.headerPractice}>
          {content.practice.logo && <Image src={content.practice.logo} style={styles.headerLogo} />}
          <Text style={styles.headerPracticeName}>{content.practice.name}</Text>
        </View>
        <View style={styles.headerFacts}>
          <Text>Treatment schedule · <Text style={styles.headerStrong}>{content.documentNumber}</Text> · revision {content.revisionNumber}</Text>
          <Text>
            Status: <Text style={content.draft ? { color: RISK, fontWeight: 600 } : styles.headerStrong}>{content.draft ? 'Draft, not accepted in review' : content.status}</Text> · {content.dateText}
          </Text>
        </View>
      </View>
      <View fixed style={styles.footer}>
        <Text>{content.projectName} · {content.planName}</Text>
        <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
    </>
  );
}
