'use client';

import { memo } from 'react';
import { Line, Text } from 'react-konva';

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
}

const LABEL_FONT_PX = 11;
const LABEL_OFFSET_PX = 9;

// One duct segment. Memoised: while a vertex is dragged only the segments touching it redraw.
export const SegmentLine = memo(function SegmentLine({ id, x1, y1, x2, y2, widthPx, selected, onPath, lined, scale, label }: SegmentLineProps) {
  const lengthPx = Math.hypot(x2 - x1, y2 - y1) || 1;
  // beside the middle, on the side of the normal that points up-left on screen
  const normalX = -(y2 - y1) / lengthPx;
  const normalY = (x2 - x1) / lengthPx;
  const flip = normalY > 0 || (normalY === 0 && normalX > 0) ? -1 : 1;
  const offset = (LABEL_OFFSET_PX + widthPx / 2) / scale;
  const labelX = (x1 + x2) / 2 + flip * normalX * offset;
  const labelY = (y1 + y2) / 2 + flip * normalY * offset;
  return (
    <>
      {selected && <Line points={[x1, y1, x2, y2]} stroke="#2d6a96" strokeWidth={(widthPx + 6) / scale} opacity={0.35} lineCap="round" listening={false} perfectDrawEnabled={false} />}
      <Line
        id={`segment:${id}`}
        name="segment"
        points={[x1, y1, x2, y2]}
        stroke={onPath ? '#3a3e45' : '#5d626b'}
        strokeWidth={widthPx / scale}
        lineCap="butt"
        dash={lined ? [6 / scale, 3 / scale] : undefined}
        hitStrokeWidth={Math.max(12, widthPx + 8) / scale}
        perfectDrawEnabled={false}
        shadowForStrokeEnabled={false}
      />
      {label && (
        <Text x={labelX} y={labelY} text={label} fontSize={LABEL_FONT_PX / scale} fontFamily="IBM Plex Mono, monospace" fill="#3a3e45"
          offsetX={(label.length * LABEL_FONT_PX * 0.3) / scale} offsetY={(LABEL_FONT_PX / 2) / scale} listening={false} perfectDrawEnabled={false} name="segment-label" />
      )}
    </>
  );
});
