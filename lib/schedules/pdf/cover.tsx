// Page 1: the title block (who issues it, for which project, plan and revision, in what status),
// the plain summary of what passes and what does not, and the contents.
import { Image, Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { treatmentsInBrief } from '../in-brief';
import { SECTIONS } from './sections';
import { INK_SOFT, OK, RISK, styles } from './styles';

function Cell({ label, value, width }: { label: string; value: string; width: string }) {
  return (
    <View style={[styles.titleCell, { width }]}>
      <Text style={styles.titleLabel}>{label}</Text>
      <Text style={styles.titleValue}>{value}</Text>
    </View>
  );
}

function TitleBlock({ content }: { content: ScheduleContent }) {
  return (
    <View style={styles.titleBlock}>
      <View style={styles.titleTop}>
        <View style={{ flexDirection: 'row', alignItems: 'center', flex: 1 }}>
          {content.practice.logo && <Image src={content.practice.logo} style={styles.titleLogo} />}
          <Text style={{ fontSize: 12, fontWeight: 600 }}>{content.practice.name}</Text>
        </View>
        <Text style={{ fontSize: 8, color: INK_SOFT }}>Duct acoustics</Text>
      </View>
      <View style={styles.titleRow}>
        <Cell label="Project" value={content.projectName} width="50%" />
        <Cell label="Plan" value={content.planName} width="50%" />
      </View>
      <View style={styles.titleRow}>
        <Cell label="Document number" value={content.documentNumber} width="34%" />
        <Cell label="Revision" value={String(content.revisionNumber)} width="16%" />
        <Cell label="Status" value={content.draft ? 'Draft' : content.status} width="25%" />
        <Cell label="Date" value={content.dateText} width="25%" />
      </View>
      <View style={[styles.titleRow, { borderBottomWidth: 0 }]}>
        <Cell label="Prepared by" value={content.preparedBy} width="34%" />
        <Cell label="Reviewed by" value={content.reviewedBy} width="33%" />
        <Cell label="Issued by" value={content.issuedBy ?? 'Not issued (preview)'} width="33%" />
      </View>
    </View>
  );
}

export function Cover({ content }: { content: ScheduleContent }) {
  // Every resonance of the revision: the printed rows plus those the tables leave out.
  const resonances = content.runs.reduce((sum, run) => sum + run.resonances.length + (run.omitted?.count ?? 0), 0);
  const nearTones = content.runs.reduce((sum, run) => sum + run.resonances.filter((row) => row.fanTone.startsWith('meets')).length, 0);
  const highRisks = content.risks.filter((risk) => risk.severity === 'high').length;
  return (
    <View>
      <Text style={styles.h1}>Treatment schedule</Text>
      <Text style={{ fontSize: 12, color: INK_SOFT, marginBottom: 12 }}>{content.projectName}: {content.planName}</Text>
      <TitleBlock content={content} />
      <Text style={[styles.small, styles.muted, { marginTop: 4 }]}>Review outcome of this revision: {content.stateLabel}.</Text>
      {content.draft && (
        <View style={[styles.note, { marginTop: 10 }]}>
          <Text style={{ fontWeight: 600, color: RISK }}>Draft</Text>
          <Text>This revision has not been accepted in review. Do not build from it; figures may change.</Text>
        </View>
      )}
      <Text style={styles.h2}>In brief</Text>
      {content.roomVerdicts.length === 0 ? <Text style={styles.paragraph}>No rooms are drawn on this plan, so no room is judged against a criterion.</Text> : (
        <View style={{ marginBottom: 6 }}>
          {content.roomVerdicts.map((verdict) => (
            <View key={verdict.room} style={styles.verdict} wrap={false}>
              <Text style={[styles.verdictMark, { color: verdict.meets === false ? RISK : verdict.meets ? OK : INK_SOFT }]}>
                {verdict.meets === null ? 'Not judged' : verdict.meets ? 'Meets' : 'Does not meet'}
              </Text>
              <Text style={styles.bulletText}>{verdict.text}</Text>
            </View>
          ))}
        </View>
      )}
      <Text style={styles.paragraph}>
        {content.runs.length} duct run{content.runs.length === 1 ? '' : 's'} analysed, {resonances} resonance{resonances === 1 ? '' : 's'} in the analysed bands,
        {' '}{nearTones === 0 ? 'none meets a fan blade-pass tone over the operating envelope' : `${nearTones} meet a fan blade-pass tone over the operating envelope`}.
        {' '}{content.risks.length === 0 ? 'No risk flag is raised.' : `${content.risks.length} risk flag${content.risks.length === 1 ? '' : 's'} raised${highRisks > 0 ? `, ${highRisks} of them high` : ''} (section ${SECTIONS.risks.number}).`}
        {' '}{treatmentsInBrief(content.treatments)}
      </Text>
      <Text style={styles.h2}>Contents</Text>
      {Object.values(SECTIONS).map((section) => (
        <Text key={section.number} style={{ marginBottom: 2 }}>{section.number}. {section.title}</Text>
      ))}
    </View>
  );
}
