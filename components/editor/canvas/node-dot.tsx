'use client';

import { memo } from 'react';
import { Circle } from 'react-konva';

interface NodeDotProps {
  id: string;
  x: number;
  y: number;
  selected: boolean;
  isStart: boolean;
  scale: number;
}

/** Grabbed within about 12 px of its centre (a dot of 4 px and half this stroke around it). */
const HIT_STROKE_PX = 16;

// A vertex: start ends are a ring, others a dot; selected ones grow and take the selection accent.
// Dragging is handled by the canvas (so only the moving pieces redraw), not by Konva.
export const NodeDot = memo(function NodeDot({ id, x, y, selected, isStart, scale }: NodeDotProps) {
  const radius = (selected ? 6 : 4) / scale;
  return (
    <Circle
      id={`node:${id}`}
      name="node"
      x={x}
      y={y}
      radius={isStart ? radius * 1.4 : radius}
      fill={isStart ? '#f7f6f2' : selected ? '#2d6a96' : '#25282d'}
      stroke={selected ? '#2d6a96' : '#25282d'}
      strokeWidth={(isStart ? 2.5 : 1) / scale}
      hitStrokeWidth={HIT_STROKE_PX / scale}
      perfectDrawEnabled={false}
    />
  );
});
