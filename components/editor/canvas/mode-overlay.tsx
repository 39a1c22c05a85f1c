'use client';

import { Circle, Group, Line, Text } from 'react-konva';
import type { Resonance } from '@/lib/acoustic';
import { POSITION_STEP_M } from '@/lib/analysis/answer-precision';
import type { PlanNode } from '@/lib/plan/document';
import type { MainPathPiece } from '@/lib/plan/to-run-input';
import { envelopeAt, extremaOf } from './mode-envelope';

interface ModeOverlayProps {
  resonance: Resonance;
  path: readonly MainPathPiece[];
  nodes: ReadonlyMap<string, PlanNode>;
  speedOfSoundMps: number;
  scale: number;
}

const SAMPLES_PER_SEGMENT = 24;
const ENVELOPE_HEIGHT_PX = 26;
/** Places along the path arrive rounded to 0.1 mm, each on its own: a sample and a piece's end may differ by one step. */
const SAME_PLACE_M = 1.5 * POSITION_STEP_M;

function pointAlong(piece: MainPathPiece, nodes: ReadonlyMap<string, PlanNode>, positionM: number) {
  const from = nodes.get(piece.fromNodeId);
  const to = nodes.get(piece.toNodeId);
  if (!from || !to) return null;
  const t = piece.endM > piece.startM ? (positionM - piece.startM) / (piece.endM - piece.startM) : 0;
  const length = Math.hypot(to.x - from.x, to.y - from.y) || 1;
  return { x: from.x + (to.x - from.x) * t, y: from.y + (to.y - from.y) * t, normalX: -(to.y - from.y) / length, normalY: (to.x - from.x) / length };
}

// The selected resonance's pressure envelope |p(x)| drawn on both sides of the run's main path,
// with its pressure nodes (N, hollow) and antinodes (A, filled) marked and labelled.
export function ModeOverlay({ resonance, path, nodes, speedOfSoundMps, scale }: ModeOverlayProps) {
  const extrema = extremaOf(resonance.antinodesM, resonance.nodesM);
  const quarterWavelengthM = speedOfSoundMps / (4 * resonance.frequencyHz);
  const height = ENVELOPE_HEIGHT_PX / scale;
  const marker = (positionM: number) => {
    const piece = path.find((candidate) => positionM >= candidate.startM - SAME_PLACE_M && positionM <= candidate.endM + SAME_PLACE_M);
    return piece ? pointAlong(piece, nodes, positionM) : null;
  };
  // The engine's own envelope once it has been fetched for this resonance; until then one drawn from the extrema.
  const fromEngine = resonance.pressureEnvelope !== undefined && resonance.pressureEnvelope.length > 1;
  const source = fromEngine ? 'engine' : 'extrema';
  const samples = fromEngine
    ? resonance.pressureEnvelope!.map((sample) => ({ positionM: sample.positionM, relative: sample.relative }))
    : path.flatMap((piece) => Array.from({ length: SAMPLES_PER_SEGMENT + 1 }, (_, index) => {
      const positionM = piece.startM + ((piece.endM - piece.startM) * index) / SAMPLES_PER_SEGMENT;
      return { positionM, relative: envelopeAt(positionM, extrema, quarterWavelengthM) };
    }));
  const upper: number[] = [];
  const lower: number[] = [];
  for (const sample of samples) {
    const point = marker(sample.positionM);
    if (!point) continue;
    const amplitude = sample.relative * height;
    upper.push(point.x + point.normalX * amplitude, point.y + point.normalY * amplitude);
    lower.push(point.x - point.normalX * amplitude, point.y - point.normalY * amplitude);
  }
  return (
    <Group listening={false}>
      <Line name={`mode-envelope ${source}`} points={upper} stroke="#2d6a96" strokeWidth={1.5 / scale} />
      <Line name={`mode-envelope ${source}`} points={lower} stroke="#2d6a96" strokeWidth={1.5 / scale} />
      {resonance.antinodesM.map((positionM) => {
        const point = marker(positionM);
        return point && (
          <Group key={`a${positionM}`}>
            <Circle x={point.x} y={point.y} radius={5 / scale} fill="#2d6a96" />
            <Text x={point.x + 6 / scale} y={point.y - 16 / scale} text="A" fontSize={11 / scale} fill="#1b4564" fontStyle="bold" />
          </Group>
        );
      })}
      {resonance.nodesM.map((positionM) => {
        const point = marker(positionM);
        return point && (
          <Group key={`n${positionM}`}>
            <Circle x={point.x} y={point.y} radius={5 / scale} stroke="#2d6a96" strokeWidth={2 / scale} fill="#ffffff" />
            <Text x={point.x + 6 / scale} y={point.y + 4 / scale} text="N" fontSize={11 / scale} fill="#1b4564" fontStyle="bold" />
          </Group>
        );
      })}
    </Group>
  );
}
