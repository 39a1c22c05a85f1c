// The plan: the background drawing with every room outlined (dashed) and every duct segment
// drawn over it, each run named at its start and each room under its outline; a scale bar under it.
import { Image, Svg, Line, Circle, Rect, Text, View } from '@react-pdf/renderer';
import type { ScheduleContent } from '../content';
import { scaleBarFor } from '../scale-bar';
import { RUN_LINE, styles } from './styles';

const FIGURE_WIDTH_PT = 499;
const ROOM_LINE = '#5d626b';
const FIGURE_MAX_HEIGHT_PT = 600;

export function PlanFigure({ content }: { content: ScheduleContent }) {
  const figure = content.figure;
  const scale = Math.min(FIGURE_WIDTH_PT / figure.widthPx, FIGURE_MAX_HEIGHT_PT / figure.heightPx);
  const width = figure.widthPx * scale;
  const height = figure.heightPx * scale;
  const strokePx = 2.2 / scale;
  return (
    <View>
      <Text style={styles.h2}>1. Plan with the duct runs</Text>
      <Text style={[styles.paragraph, styles.muted]}>
        Duct runs as frozen in revision {content.revisionNumber}; the filled dot marks each run’s start (fan side).
        {' '}Scale as set on the plan: {(figure.metresPerPixel * 1000).toFixed(1)} mm per drawing pixel; the area shown is
        {' '}{(figure.widthPx * figure.metresPerPixel).toFixed(1)} m × {(figure.heightPx * figure.metresPerPixel).toFixed(1)} m.
        {figure.image ? '' : figure.drawingLeftOut ? ' The plan’s drawing could not be read for printing (one stored before drawings were bounded may be too large: upload it again), so the runs are shown on a blank sheet.' : ' No drawing image is attached to this plan, so the runs are shown on a blank sheet.'}
      </Text>
      <View style={{ width, height, borderWidth: 0.5, borderColor: '#cfd1d4', position: 'relative' }}>
        {figure.image && <Image src={figure.image} style={{ position: 'absolute', top: 0, left: 0, width, height, opacity: 0.8 }} />}
        <Svg width={width} height={height} viewBox={`${figure.originX} ${figure.originY} ${figure.widthPx} ${figure.heightPx}`} style={{ position: 'absolute', top: 0, left: 0 }}>
          {figure.rooms.map((room, index) => (
            <Rect key={`room-${index}`} x={room.x} y={room.y} width={room.widthPx} height={room.heightPx} fill="none" stroke={ROOM_LINE} strokeWidth={0.8 / scale} strokeDasharray={`${4 / scale} ${2.5 / scale}`} />
          ))}
          {figure.lines.map((line, index) => (
            <Line key={index} x1={line.x1} y1={line.y1} x2={line.x2} y2={line.y2} stroke={RUN_LINE} strokeWidth={strokePx} strokeLinecap="round" />
          ))}
          {figure.labels.map((label, index) => <Circle key={index} cx={label.x} cy={label.y} r={4 / scale} fill={RUN_LINE} />)}
        </Svg>
        {figure.rooms.map((room, index) => (
          <Text key={`room-${index}`} style={{ position: 'absolute', left: (room.x - figure.originX) * scale, top: (room.y + room.heightPx - figure.originY) * scale + 2, fontSize: 6.5, color: ROOM_LINE }}>{room.name}</Text>
        ))}
        {figure.labels.map((label, index) => (
          <Text key={index} style={{ position: 'absolute', left: (label.x - figure.originX) * scale + 5, top: (label.y - figure.originY) * scale - 11, fontSize: 7, color: RUN_LINE, fontWeight: 600 }}>{label.text}</Text>
        ))}
      </View>
      <ScaleBarView widthShownM={figure.widthPx * figure.metresPerPixel} pointsPerMetre={scale / figure.metresPerPixel} />
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
