// Risk flags with the chosen treatments (predicted before/after) and room results, each
// saying so plainly when the revision has none.
import { Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { RoomNoiseTables } from './room-noise-tables';
import { Table } from './table';
import { sectionHeading } from './sections';
import { styles } from './styles';

const PATH_BANDS = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];

export function RisksAndRooms({ content }: { content: ScheduleContent }) {
  const nearTones = content.runs.flatMap((run) => run.resonances.filter((row) => row.fanTone.startsWith('meets')).map((row) => [run.name, `Order ${row.order} at ${row.frequencyHz.toFixed(1)} Hz`, row.fanTone]));
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('risks')}</Text>
      {content.risks.length > 0 ? (
        <Table columns={[{ title: 'Risk', width: 0.34 }, { title: 'Severity', width: 0.1 }, { title: 'Detail', width: 0.56 }]} rows={content.risks.map((risk) => [risk.label, risk.severity, risk.detail])} />
      ) : nearTones.length > 0 ? (
        <>
          <Text style={styles.paragraph}>Resonances that coincide with a fan blade-pass tone:</Text>
          <Table columns={[{ title: 'Run', width: 0.3 }, { title: 'Resonance', width: 0.4 }, { title: 'Fan tone', width: 0.3 }]} rows={nearTones} />
        </>
      ) : (
        <Text style={styles.paragraph}>No risk flag in this revision.</Text>
      )}
      {content.treatments.length > 0 ? (
        <Table
          columns={[{ title: 'Chosen treatment', width: 0.34 }, { title: 'Without it', width: 0.18 }, { title: 'With it (predicted)', width: 0.18 }, { title: 'On this revision', width: 0.3 }]}
          rows={content.treatments.map((treatment) => [treatment.label, treatment.before, treatment.after, treatment.standingText || (treatment.clears ? 'Clears its flag' : 'Does not clear its flag')])}
        />
      ) : (
        <View style={styles.note}><Text>No treatments are chosen in this revision. The schedule is issued with the analysis only; treatments added later appear in a new revision.</Text></View>
      )}
      <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('rooms')}</Text>
      {content.rooms.length === 0
        ? <Text style={styles.paragraph}>No rooms are drawn on this plan, so no room results are given.</Text>
        : <Table columns={[{ title: 'Room', width: 0.3 }, { title: 'Result', width: 0.7 }]} rows={content.rooms.map((room) => [room.name, room.problem ?? room.summary])} />}
      {content.rooms.filter((room) => room.noise).map((room) => <RoomNoiseTables key={room.id} name={room.name} tables={room.noise!} />)}
      {content.rooms.filter((room) => !room.noise && room.path).map((room) => (
        <View key={room.id} wrap={false}>
          <Text style={styles.h3}>Noise path to the listener: {room.name}</Text>
          <Table
            columns={[{ title: 'Element', width: 0.36 }, ...PATH_BANDS.map((title) => ({ title, width: 0.08, numeric: true }))]}
            rows={room.path!.rows.map((row) => [row.label, ...row.valuesDb.map((value) => value.toFixed(1))])}
          />
          <Text style={styles.paragraph}>
            At the listener: NC {room.path!.nc.toFixed(0)}, NR {room.path!.nr.toFixed(1)}, {room.path!.dba.toFixed(1)} dB(A); the {room.path!.governingHz} Hz band governs. Losses are negative, levels in dB (sound power re 1 pW, sound pressure re 20 µPa).
          </Text>
        </View>
      ))}
    </View>
  );
}
