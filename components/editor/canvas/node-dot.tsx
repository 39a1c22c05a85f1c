'use client';

import type Konva from 'konva';
import { memo } from 'react';
import { Circle } from 'react-konva';

interface NodeDotProps {
  id: string;
  x: number;
  y: number;
  selected: boolean;
  isStart: boolean;
  draggable: boolean;
  scale: number;
  onDragMove: (id: string, x: number, y: number) => void;
  onDragEnd: (id: string, x: number, y: number) => void;
}

// A vertex: start ends are a ring, others a dot; selected ones grow and take the selection accent.
export const NodeDot = memo(function NodeDot({ id, x, y, selected, isStart, draggable, scale, onDragMove, onDragEnd }: NodeDotProps) {
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
      hitStrokeWidth={10 / scale}
      draggable={draggable}
      perfectDrawEnabled={false}
      onDragMove={(event: Konva.KonvaEventObject<DragEvent>) => onDragMove(id, event.target.x(), event.target.y())}
      onDragEnd={(event: Konva.KonvaEventObject<DragEvent>) => onDragEnd(id, event.target.x(), event.target.y())}
    />
  );
});
