'use client';

import { Group, Line, Rect, Text } from 'react-konva';
import type { Termination } from '@/lib/acoustic';
import { endWordPlace } from './end-word-place';

export const TERMINATION_LABELS: Record<string, string> = {
  closed: 'closed',
  'open-flanged': 'open, flanged',
  'open-unflanged': 'open',
  lined: 'lined',
  anechoic: 'anechoic',
};

export function terminationKey(termination: Termination): string {
  return termination.kind === 'open' ? `open-${termination.flange}` : termination.kind;
}

const WORD_FONT_PX = 10;

// A shape per end type (never colour alone) drawn at a leaf node, pointing along the duct, and its word on
// the duct's left-hand side, clear of the duct, the end's name and a room outlet's word (end-word-place.ts).
export function TerminationGlyph({ x, y, angleRad, termination, scale }: { x: number; y: number; angleRad: number; termination: Termination; scale: number }) {
  const size = 9 / scale;
  const key = terminationKey(termination);
  const rotation = (angleRad * 180) / Math.PI;
  const word = TERMINATION_LABELS[key];
  const place = endWordPlace({ x, y }, angleRad, 'left', word.length, WORD_FONT_PX, 0, scale);
  return (
    <>
    <Text text={word} x={place.x} y={place.y} fontSize={WORD_FONT_PX / scale} fill="#3a3e45" listening={false} />
    <Group x={x} y={y} rotation={rotation} listening={false}>
      {key === 'closed' && <Line points={[0, -size, 0, size]} stroke="#25282d" strokeWidth={3 / scale} />}
      {key === 'open-unflanged' && <Line points={[size, -size, 0, 0, size, size]} stroke="#25282d" strokeWidth={1.5 / scale} />}
      {key === 'open-flanged' && (
        <>
          <Line points={[size, -size, 0, 0, size, size]} stroke="#25282d" strokeWidth={1.5 / scale} />
          <Line points={[0, -size * 1.4, 0, size * 1.4]} stroke="#25282d" strokeWidth={1.5 / scale} />
        </>
      )}
      {key === 'lined' && <Rect x={-size / 2} y={-size} width={size} height={size * 2} stroke="#25282d" strokeWidth={1.5 / scale} dash={[2 / scale, 2 / scale]} />}
      {key === 'anechoic' && <Line points={[0, -size, size * 1.5, 0, 0, size]} closed stroke="#25282d" strokeWidth={1.5 / scale} />}
    </Group>
    </>
  );
}
