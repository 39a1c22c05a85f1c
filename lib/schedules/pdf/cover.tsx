// Page 1: what the document is, for which plan and revision, who prepared and reviewed it.
import { Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { INK_SOFT, RISK, styles } from './styles';

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.factRow}>
      <Text style={styles.factLabel}>{label}</Text>
      <Text style={styles.factValue}>{value}</Text>
    </View>
  );
}

export function Cover({ content }: { content: ScheduleContent }) {
  // Every resonance of the revision: the printed rows plus those the tables leave out.
  const resonances = content.runs.reduce((sum, run) => sum + run.resonances.length + (run.omitted?.count ?? 0), 0);
  const nearTones = content.runs.reduce((sum, run) => sum + run.resonances.filter((row) => row.fanTone !== 'clear').length, 0);
  return (
    <View>
      <Text style={{ fontSize: 9, color: INK_SOFT, letterSpacing: 1.2, marginBottom: 50 }}>ANTINODE · DUCT ACOUSTICS</Text>
      <Text style={styles.h1}>Treatment schedule</Text>
      <Text style={{ fontSize: 14, color: INK_SOFT }}>{content.projectName}: {content.planName}</Text>
      <View style={styles.facts}>
        <Fact label="Project" value={content.projectName} />
        <Fact label="Plan" value={content.planName} />
        <Fact label="Revision" value={String(content.revisionNumber)} />
        <Fact label="Date" value={content.dateText} />
        <Fact label="Prepared by" value={content.preparedBy} />
        <Fact label="Reviewed by" value={content.reviewedBy} />
        <Fact label="State" value={content.draft ? `${content.stateLabel} (draft)` : content.stateLabel} />
        {content.issuedBy && <Fact label="Issued by" value={content.issuedBy} />}
      </View>
      {content.draft && (
        <View style={[styles.note, { marginTop: 14 }]}>
          <Text style={{ fontWeight: 600, color: RISK }}>Draft</Text>
          <Text>This revision has not been approved in review. Do not build from it; figures may change.</Text>
        </View>
      )}
      <Text style={styles.h2}>In brief</Text>
      <Text style={styles.paragraph}>
        {content.runs.length} duct run{content.runs.length === 1 ? '' : 's'} analysed, {resonances} resonance{resonances === 1 ? '' : 's'} in the analysed bands,
        {' '}{nearTones === 0 ? 'none near a fan blade-pass tone' : `${nearTones} near a fan blade-pass tone`}.
        {' '}{content.treatments.length === 0 ? 'No treatments are chosen in this revision.' : `${content.treatments.length} treatment${content.treatments.length === 1 ? '' : 's'} chosen.`}
      </Text>
      <Text style={styles.h2}>Contents</Text>
      {['Plan with the duct runs', 'Each run: sections, terminations, resonances, reflections', 'Risk flags and treatments', 'Rooms', 'Assumptions and limits', 'Cautions', 'Methods'].map((line, index) => (
        <Text key={line} style={{ marginBottom: 2 }}>{index + 1}. {line}</Text>
      ))}
    </View>
  );
}
