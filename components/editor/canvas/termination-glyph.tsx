'use client';

import { Group, Line, Rect, Text } from 'react-konva';
import type { Termination } from '@/lib/acoustic';
import { boxIsClear, type DuctLine } from './box-clear';
import { endWordPlace, endWordSizePx, type EndWordSide } from './end-word-place';

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

const WORD_FONT_PX = 12;
/** The glyph reaches this far across from a thin duct, screen px; a duct drawn wider gets a glyph as wide. */
const GLYPH_HALF_PX = 9;

// A shape per end type (never colour alone) drawn at a leaf node, pointing along the duct, and its word on
// the duct's left-hand side, clear of the duct, the end's name and a room outlet's word (end-word-place.ts).
// When the left-hand side would cover another duct or a segment's words, the word goes beyond the
// end, under the end's name (belowName), where the duct never is.
export function TerminationGlyph({ x, y, angleRad, termination, scale, ductHalfWidthPx = 0, otherDucts = [], belowName = null }: {
  x: number; y: number; angleRad: number; termination: Termination; scale: number;
  /** Half the duct's drawn width on screen, px. */
  ductHalfWidthPx?: number;
  /** The other ducts on the plan, plan pixels, for keeping the word off them. */
  otherDucts?: readonly DuctLine[];
  /** Top-left corner of the line under the end's name, plan pixels, and its centre x. */
  belowName?: { x: number; y: number; centreX: number } | null;
}) {
  const size = Math.max(GLYPH_HALF_PX, ductHalfWidthPx + 3) / scale;
  const key = terminationKey(termination);
  const rotation = (angleRad * 180) / Math.PI;
  const word = TERMINATION_LABELS[key];
  const { widthPx, heightPx } = endWordSizePx(word.length, WORD_FONT_PX, 0);
  const at = (side: EndWordSide) => endWordPlace({ x, y }, angleRad, side, word.length, WORD_FONT_PX, 0, scale, ductHalfWidthPx);
  const clear = (corner: { x: number; y: number }) => boxIsClear({ ...corner, width: widthPx / scale, height: heightPx / scale }, otherDucts);
  const left = at('left');
  const right = at('right');
  const below = belowName ? { x: belowName.centreX - widthPx / 2 / scale, y: belowName.y } : null;
  // the right-hand side is a room outlet's (end-word-place.ts): only when there is no line under the name
  const place = clear(left) ? left : below ?? (clear(right) ? right : left);
  return (
    <>
    <Text text={word} x={place.x} y={place.y} fontSize={WORD_FONT_PX / scale} fontFamily="IBM Plex Sans, sans-serif" fill="#3a3e45" listening={false} name="termination-word" />
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
