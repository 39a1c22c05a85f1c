'use client';

import { memo } from 'react';
import { Line } from 'react-konva';

export interface SegmentLineProps {
  id: string;
  x1: number; y1: number; x2: number; y2: number;
  widthPx: number;          // drawn duct width on screen
  selected: boolean;
  onPath: boolean;          // on the chosen run's main path
  lined: boolean;
  scale: number;
}

// One duct segment. Memoised: while a vertex is dragged only the segments touching it redraw.
export const SegmentLine = memo(function SegmentLine({ id, x1, y1, x2, y2, widthPx, selected, onPath, lined, scale }: SegmentLineProps) {
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
    </>
  );
});
