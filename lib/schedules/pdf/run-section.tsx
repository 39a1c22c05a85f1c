// One duct run: its key figures, sections, terminations, resonances and reflections.
import { Text, View } from '@react-pdf/renderer';
import { PRINTED_LOWEST_ORDERS, type ScheduleRun } from '../content';
import { Table } from './table';
import { SECTIONS, sectionHeading } from './sections';
import { RISK, styles } from './styles';

function hz(value: number | null): string {
  return value === null ? '—' : `${value.toFixed(1)} Hz`;
}

export function RunSection({ run, index }: { run: ScheduleRun; index: number }) {
  const nearTone = new Set(run.resonances.flatMap((row, rowIndex) => (row.fanTone.startsWith('meets') ? [rowIndex] : [])));
  return (
    <View break={index > 0}>
      {index === 0 && <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('runs')}</Text>}
      <Text style={index === 0 ? styles.h2Sub : styles.h2}>{SECTIONS.runs.number}.{index + 1} {run.name}</Text>
      {run.problem ? (
        <View style={styles.note}><Text>This run could not be analysed: {run.problem}</Text></View>
      ) : (
        <Text style={styles.paragraph}>
          Main path {run.lengthM?.toFixed(2) ?? '—'} m · air at {run.temperatureC.toFixed(0)} °C, speed of sound {run.speedOfSoundMps?.toFixed(1) ?? '—'} m/s ·
          plane-wave cut-off {hz(run.cutoffHz)} · fan: {run.fan}
        </Text>
      )}
      {run.assumptions.map((assumption) => <Text key={assumption} style={[styles.small, styles.muted]}>{assumption}</Text>)}
      <Text style={styles.h3}>Sections along the main path</Text>
      <Table
        columns={[{ title: 'Segment', width: 0.12 }, { title: 'Length', width: 0.14, numeric: true }, { title: 'Section', width: 0.44 }, { title: 'Lining', width: 0.3 }]}
        rows={run.sections.map((section) => [section.label, `${section.lengthM.toFixed(2)} m`, section.section, section.lining])}
      />
      <View wrap={false}>
        <Text style={styles.h3}>Terminations</Text>
        <Table columns={[{ title: 'Where', width: 0.4 }, { title: 'Termination', width: 0.6 }]} rows={run.terminations.map((row) => [row.where, row.kind])} />
      </View>
      <Text style={styles.h3}>Resonances</Text>
      {run.resonances.length === 0 ? <Text style={styles.muted}>No resonance in the analysed band.</Text> : (
        <Table
          columns={[
            { title: 'Order', width: 0.08 }, { title: 'Frequency', width: 0.14, numeric: true }, { title: 'Q', width: 0.08, numeric: true },
            { title: 'Bandwidth', width: 0.13, numeric: true }, { title: 'Fan tone', width: 0.15 }, { title: 'Review', width: 0.42 },
          ]}
          rows={run.resonances.map((row) => [String(row.order), hz(row.frequencyHz), row.q === null ? '—' : row.q.toFixed(1), hz(row.bandwidthHz), row.fanTone, row.review])}
          riskRows={nearTone}
        />
      )}
      {run.omitted && (
        <Text style={[styles.small, styles.muted]}>
          The table lists the lowest {PRINTED_LOWEST_ORDERS} orders and every resonance a fan tone meets or flagged in review; {run.omitted.count} further
          resonances from {run.omitted.fromHz.toFixed(1)} to {run.omitted.toHz.toFixed(1)} Hz are clear of fan tones and are listed in the revision in Antinode.
        </Text>
      )}
      {nearTone.size > 0 && <Text style={[styles.small, { color: RISK }]}>Shaded rows: a fan blade-pass tone meets the resonance&apos;s band somewhere over the operating envelope (the fan&apos;s speed range, or ±2 % belt slip without one; the supply air ±5 °C). The risk flags grade each by the dB the run adds there.</Text>}
      <View wrap={false}>
        <Text style={styles.h3}>Reflections summary</Text>
        {run.reflections.length === 0 ? <Text style={styles.muted}>No reflecting discontinuity on the main path.</Text> : (
          <Table
            columns={[{ title: 'At', width: 0.14, numeric: true }, { title: 'Discontinuity', width: 0.36 }, { title: 'Reflection coefficient |R| (− inverted), lowest and highest band', width: 0.5 }]}
            rows={run.reflections.map((row) => [`${row.atM.toFixed(2)} m`, row.kind, row.magnitude])}
          />
        )}
      </View>
      {run.warnings.map((warning) => <Text key={warning} style={[styles.small, styles.muted]}>Note: {warning}</Text>)}
    </View>
  );
}
