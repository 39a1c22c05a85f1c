// The plan: the background drawing with every room outlined (dashed) and every duct segment drawn
// over it; each segment's label and size, the run names, outlets, listeners and the chosen treatments
// (tagged T1, T2 …) marked where they go, every word placed clear of the lines; a scale bar, a key and
// the list of treatments under it.
import { Image, Svg, Line, Circle, Path, Rect, Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { LABEL_FONT_PT, type FigureLabel } from '../figure';
import { scaleBarFor } from '../scale-bar';
import { sectionHeading } from './sections';
import { Table } from './table';
import { INK, RUN_LINE, TREATED, styles } from './styles';

const ROOM_LINE = '#5d626b';
const DRAWING_LINE = '#8a8f98';
const LABEL_COLOUR: Record<FigureLabel['kind'], string> = { run: RUN_LINE, segment: INK, room: ROOM_LINE, outlet: ROOM_LINE, listener: ROOM_LINE, treatment: '#ffffff' };

export function PlanFigure({ content }: { content: ScheduleContent }) {
  const figure = content.figure;
  const scale = figure.scale;
  const width = figure.widthPx * scale;
  const height = figure.heightPx * scale;
  const px = (pt: number) => pt / scale;
  return (
    <View>
      <Text style={styles.h2} minPresenceAhead={80}>{sectionHeading('plan')}</Text>
      <Text style={[styles.paragraph, styles.muted]}>
        Duct runs as frozen in revision {content.revisionNumber}, each segment with its label and size in mm (Ø round, width × height rectangular).
        {' '}Scale as set on the plan: {(figure.metresPerPixel * 1000).toFixed(1)} mm per drawing pixel; the area shown is
        {' '}{(figure.widthPx * figure.metresPerPixel).toFixed(1)} m × {(figure.heightPx * figure.metresPerPixel).toFixed(1)} m.
        {figure.image?.format === 'lines' ? ` The drawing is drawn from the DXF file’s layers ${figure.image.layers.map((layer) => layer.name).join(', ')}.` : ''}
        {figure.image ? '' : figure.drawingLeftOut ? ' The plan’s drawing could not be read for printing (one stored before drawings were bounded may be too large: upload it again), so the runs are shown on a blank sheet.' : ' No drawing image is attached to this plan, so the runs are shown on a blank sheet.'}
      </Text>
      <View style={{ width, height, borderWidth: 0.5, borderColor: '#cfd1d4', position: 'relative' }}>
        {figure.image && figure.image.format !== 'lines' && <Image src={figure.image} style={{ position: 'absolute', top: 0, left: 0, width, height, opacity: 0.8 }} />}
        <Svg width={width} height={height} viewBox={`${figure.originX} ${figure.originY} ${figure.widthPx} ${figure.heightPx}`} style={{ position: 'absolute', top: 0, left: 0 }}>
          {figure.image?.format === 'lines' && figure.image.layers.map((layer) => (
            <Path key={`drawing-${layer.name}`} d={layer.d} fill="none" stroke={DRAWING_LINE} strokeWidth={px(0.4)} />
          ))}
          {figure.rooms.map((room, index) => (
            <Rect key={`room-${index}`} x={room.x} y={room.y} width={room.widthPx} height={room.heightPx} fill="none" stroke={ROOM_LINE} strokeWidth={px(0.8)} strokeDasharray={`${px(4)} ${px(2.5)}`} />
          ))}
          {figure.lines.filter((line) => line.treated).map((line) => (
            <Line key={`treated-${line.segmentId}`} x1={line.x1} y1={line.y1} x2={line.x2} y2={line.y2} stroke={TREATED} strokeOpacity={0.35} strokeWidth={px(7)} strokeLinecap="butt" />
          ))}
          {figure.lines.map((line) => (
            <Line key={line.segmentId} x1={line.x1} y1={line.y1} x2={line.x2} y2={line.y2} stroke={RUN_LINE} strokeWidth={px(2.2)} strokeLinecap="round" />
          ))}
          {figure.marks.map((mark, index) => (mark.kind === 'start'
            ? <Circle key={index} cx={mark.x} cy={mark.y} r={px(3)} fill={RUN_LINE} />
            : mark.kind === 'outlet'
              ? <Rect key={index} x={mark.x - px(2.6)} y={mark.y - px(2.6)} width={px(5.2)} height={px(5.2)} fill="#ffffff" stroke={INK} strokeWidth={px(0.9)} />
              : <Circle key={index} cx={mark.x} cy={mark.y} r={px(2.6)} fill="#ffffff" stroke={INK} strokeWidth={px(0.9)} />))}
          {figure.labels.filter((label) => label.kind === 'treatment').map((label) => (
            <Rect key={`tag-${label.text}`} x={label.x} y={label.y} width={label.widthPx} height={label.heightPx} rx={px(1.5)} fill={TREATED} />
          ))}
        </Svg>
        {figure.labels.map((label, index) => (
          <Text key={`${label.kind}-${index}`} style={{
            position: 'absolute', left: (label.x - figure.originX) * scale, top: (label.y - figure.originY) * scale, width: label.widthPx * scale,
            fontSize: LABEL_FONT_PT[label.kind], lineHeight: 1.3, paddingLeft: 1.5, color: LABEL_COLOUR[label.kind],
            fontWeight: label.kind === 'run' || label.kind === 'treatment' ? 600 : label.kind === 'room' ? 500 : 400,
          }}>{label.text}</Text>
        ))}
      </View>
      <ScaleBarView widthShownM={figure.widthPx * figure.metresPerPixel} pointsPerMetre={scale / figure.metresPerPixel} />
      <Text style={[styles.small, styles.muted, { marginTop: 6 }]}>
        Key: filled dot, a run’s start (fan side); open square, an outlet into a room; open ring, a listener (L1, L2 …); dashed outline, a room; shaded duct and tag T1, T2 …, a chosen treatment.
      </Text>
      {figure.treatments.length > 0 ? (
        <View style={{ marginTop: 6 }} wrap={false}>
          <Table
            columns={[{ title: 'Tag', width: 0.08 }, { title: 'Chosen treatment', width: 0.72 }, { title: 'Where', width: 0.2 }]}
            rows={figure.treatments.map((treatment) => [treatment.tag, treatment.description, treatment.where])}
          />
        </View>
      ) : <Text style={[styles.small, styles.muted]}>No treatment is chosen in this revision, so none is marked.</Text>}
    </View>
  );
}

/** Alternating dark and light divisions with 0 and the bar's length written at its ends. */
function ScaleBarView({ widthShownM, pointsPerMetre }: { widthShownM: number; pointsPerMetre: number }) {
  const bar = scaleBarFor(widthShownM);
  const lengthPt = bar.lengthM * pointsPerMetre;
  const divisionPt = lengthPt / bar.divisions;
  return (
    <View style={{ flexDirection: 'row', alignItems: 'center', marginTop: 6 }}>
      <Text style={{ fontSize: 7, marginRight: 4 }}>0</Text>
      <Svg width={lengthPt} height={5}>
        {Array.from({ length: bar.divisions }, (_, index) => (
          <Rect key={index} x={index * divisionPt} y={0} width={divisionPt} height={5} fill={index % 2 === 0 ? '#1f2328' : '#ffffff'} stroke="#1f2328" strokeWidth={0.5} />
        ))}
      </Svg>
      <Text style={{ fontSize: 7, marginLeft: 4 }}>{bar.label}</Text>
    </View>
  );
}
