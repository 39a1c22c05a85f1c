'use client';

import { memo } from 'react';
import { Line, Text } from 'react-konva';
import { LABEL_FONT_PX, SIZE_FONT_PX, segmentWords } from './segment-words';

export interface SegmentLineProps {
  id: string;
  x1: number; y1: number; x2: number; y2: number;
  widthPx: number;          // drawn duct width on screen
  selected: boolean;
  onPath: boolean;          // on the chosen run's main path
  lined: boolean;
  scale: number;
  /** The segment's stable label ("A3"), drawn beside its middle. */
  label?: string;
  /** The section in words ("Ø 250 mm"), drawn on the other side of the middle. */
  size?: string;
}

// One duct segment, drawn as wide as the duct is on the plan (at least a hairline) with its centre
// line, its label on one side and its size on the other. Memoised: while a vertex is dragged only the
// segments touching it redraw.
export const SegmentLine = memo(function SegmentLine({ id, x1, y1, x2, y2, widthPx, selected, onPath, lined, scale, label, size }: SegmentLineProps) {
  const words = segmentWords(x1, y1, x2, y2, widthPx, scale, label, size);
  const thin = widthPx <= 4;
  return (
    <>
      {selected && <Line points={[x1, y1, x2, y2]} stroke="#2d6a96" strokeWidth={(widthPx + 6) / scale} opacity={0.35} lineCap="round" listening={false} perfectDrawEnabled={false} />}
      <Line
        id={`segment:${id}`}
        name="segment"
        points={[x1, y1, x2, y2]}
        stroke={onPath ? '#3a3e45' : '#5d626b'}
        opacity={thin ? 1 : 0.45}
        strokeWidth={widthPx / scale}
        lineCap="butt"
        dash={lined ? [6 / scale, 3 / scale] : undefined}
        hitStrokeWidth={Math.max(12, widthPx + 8) / scale}
        perfectDrawEnabled={false}
        shadowForStrokeEnabled={false}
      />
      {!thin && <Line points={[x1, y1, x2, y2]} stroke="#25282d" strokeWidth={1 / scale} listening={false} perfectDrawEnabled={false} />}
      {words.size && (
        <Text x={words.size.centreX} y={words.size.centreY} text={size} fontSize={SIZE_FONT_PX / scale} fontFamily="IBM Plex Mono, monospace" fill="#5d626b"
          offsetX={words.size.widthPx / 2 / scale} offsetY={SIZE_FONT_PX / 2 / scale} listening={false} perfectDrawEnabled={false} name="segment-size" />
      )}
      {words.label && (
        <Text x={words.label.centreX} y={words.label.centreY} text={label} fontSize={LABEL_FONT_PX / scale} fontFamily="IBM Plex Mono, monospace" fill="#3a3e45"
          offsetX={words.label.widthPx / 2 / scale} offsetY={(LABEL_FONT_PX / 2) / scale} listening={false} perfectDrawEnabled={false} name="segment-label" />
      )}
    </>
  );
});
