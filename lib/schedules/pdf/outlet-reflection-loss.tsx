// The end reflection loss at every outlet of the plan, by octave band.
import { Text, View } from '@react-pdf/renderer';
import { OUTLET_MOUNTING_WORDS } from '@/lib/plan/outlet-reflection-loss';
import type { ScheduleContent } from '../content';
import { sectionHeading } from './sections';
import { Table } from './table';
import { styles } from './styles';

const BANDS = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];

export function OutletReflectionLoss({ content }: { content: ScheduleContent }) {
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('outlets')}</Text>
      {content.outlets.length === 0 ? <Text style={styles.paragraph}>No run of this plan has an outlet (an open end or an end that feeds a room).</Text> : (
        <>
          <Text style={styles.paragraph}>
            The sound each outlet reflects back up the duct instead of passing into the room, in dB by octave band (Hz). A flanged open end is taken as flush
            with the ceiling or wall, any other as free-hanging, and a rectangular end as the round one of equal area. The noise paths in section 4 subtract it.
          </Text>
          <View wrap={false}>
            <Table
              columns={[{ title: 'Outlet', width: 0.36 }, ...BANDS.map((title) => ({ title, width: 0.08, numeric: true }))]}
              rows={content.outlets.map((outlet) => [
                `${outlet.label} (${outlet.runName}${outlet.rooms.length > 0 ? `, into ${outlet.rooms.join(', ')}` : ''}); Ø ${(outlet.diameterM * 1000).toFixed(0)} mm, ${OUTLET_MOUNTING_WORDS[outlet.mounting]}, air at ${outlet.temperatureC.toFixed(0)} °C`,
                ...outlet.erlDb.map((db) => db.toFixed(1)),
              ])}
            />
          </View>
        </>
      )}
    </View>
  );
}
