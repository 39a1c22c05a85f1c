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
  /** The section in words ("Ø 250 mm"), drawn on the other side of the middle. */
  size?: string;
}

const LABEL_FONT_PX = 12;
const SIZE_FONT_PX = 11;
const LABEL_OFFSET_PX = 9;
/** Plex Mono is 0.6 em a character. */
const MONO_EM = 0.6;

// One duct segment, drawn as wide as the duct is on the plan (at least a hairline) with its centre
// line, its label on one side and its size on the other. Memoised: while a vertex is dragged only the
// segments touching it redraw.
export const SegmentLine = memo(function SegmentLine({ id, x1, y1, x2, y2, widthPx, selected, onPath, lined, scale, label, size }: SegmentLineProps) {
  const lengthPx = Math.hypot(x2 - x1, y2 - y1) || 1;
  // beside the middle, on the side of the normal that points up-left on screen
  const normalX = -(y2 - y1) / lengthPx;
  const normalY = (x2 - x1) / lengthPx;
  const flip = normalY > 0 || (normalY === 0 && normalX > 0) ? -1 : 1;
  const offset = (LABEL_OFFSET_PX + widthPx / 2) / scale;
  const labelX = (x1 + x2) / 2 + flip * normalX * offset;
  const labelY = (y1 + y2) / 2 + flip * normalY * offset;
  // the size on the opposite side, far enough that its box clears the duct whichever way it runs
  const sizeWidthPx = (size?.length ?? 0) * SIZE_FONT_PX * MONO_EM;
  const sizeAwayPx = widthPx / 2 + 4 + (Math.abs(normalX) * sizeWidthPx + Math.abs(normalY) * SIZE_FONT_PX) / 2;
  const sizeX = (x1 + x2) / 2 - (flip * normalX * sizeAwayPx) / scale;
  const sizeY = (y1 + y2) / 2 - (flip * normalY * sizeAwayPx) / scale;
  const thin = widthPx <= 4;
  // the size only where the segment is long enough on screen to carry it beside the label
  const showSize = size !== undefined && Math.hypot(x2 - x1, y2 - y1) * scale >= sizeWidthPx + 2 * LABEL_FONT_PX * MONO_EM * (label?.length ?? 0) + 16;
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
      {showSize && (
        <Text x={sizeX} y={sizeY} text={size} fontSize={SIZE_FONT_PX / scale} fontFamily="IBM Plex Mono, monospace" fill="#5d626b"
          offsetX={sizeWidthPx / 2 / scale} offsetY={SIZE_FONT_PX / 2 / scale} listening={false} perfectDrawEnabled={false} name="segment-size" />
      )}
      {label && (
        <Text x={labelX} y={labelY} text={label} fontSize={LABEL_FONT_PX / scale} fontFamily="IBM Plex Mono, monospace" fill="#3a3e45"
          offsetX={(label.length * LABEL_FONT_PX * MONO_EM) / 2 / scale} offsetY={(LABEL_FONT_PX / 2) / scale} listening={false} perfectDrawEnabled={false} name="segment-label" />
      )}
    </>
  );
});
