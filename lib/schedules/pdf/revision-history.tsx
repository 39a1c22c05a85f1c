// Every revision of the plan up to this one: when it was submitted and by whom, the review's outcome,
// the reviewer and the reviewer's overall note.
import { Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { sectionHeading } from './sections';
import { Table } from './table';
import { styles } from './styles';

export function RevisionHistory({ content }: { content: ScheduleContent }) {
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('history')}</Text>
      <Table
        columns={[{ title: 'Revision', width: 0.09, numeric: true }, { title: 'Submitted', width: 0.19 }, { title: 'Outcome', width: 0.18 }, { title: 'Reviewed by', width: 0.18 }, { title: 'Reviewer’s note', width: 0.36 }]}
        rows={content.history.map((row) => [String(row.number), `${row.dateText}, ${row.submittedBy}`, row.outcome, row.reviewedBy, row.note])}
      />
    </View>
  );
}
