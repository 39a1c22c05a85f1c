// The whole treatment schedule: cover, plan, one section per run, risks and rooms, outlets and revision history, notes.
import { Document, Page } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { Cover } from './cover';
import { Notes } from './notes';
import { OutletReflectionLoss } from './outlet-reflection-loss';
import { PageFrame } from './page-frame';
import { PlanFigure } from './plan-figure';
import { RevisionHistory } from './revision-history';
import { RisksAndRooms } from './risks-and-rooms';
import { RunSection } from './run-section';
import { styles } from './styles';

export function ScheduleDocument({ content, createdAt }: { content: ScheduleContent; createdAt: Date }) {
  const title = `Treatment schedule: ${content.projectName}, ${content.planName}, revision ${content.revisionNumber}`;
  return (
    <Document title={title} author={content.preparedBy} subject="Duct acoustics treatment schedule" creator="Antinode" producer="Antinode" creationDate={createdAt} modificationDate={createdAt}>
      <Page size="A4" style={styles.page}>
        <PageFrame content={content} />
        <Cover content={content} />
      </Page>
      <Page size="A4" style={styles.page}>
        <PageFrame content={content} />
        <PlanFigure content={content} />
      </Page>
      {/* each run on pages of its own: the layout breaks each page's content into pages separately, so the
          cost grows with the schedule's length rather than with its square */}
      {content.runs.map((run, index) => (
        <Page key={`${run.name}-${index}`} size="A4" style={styles.page} wrap>
          <PageFrame content={content} />
          <RunSection run={run} index={index} />
        </Page>
      ))}
      <Page size="A4" style={styles.page} wrap>
        <PageFrame content={content} />
        <RisksAndRooms content={content} />
        <OutletReflectionLoss content={content} />
        <RevisionHistory content={content} />
        <Notes content={content} />
      </Page>
    </Document>
  );
}
