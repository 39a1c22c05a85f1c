// The plan label of the point where a reflection happens ("A2/A3", "A3 end"), found on the run's main
// path: the start end is the path's first point, any other reflection the point a path piece ends at.
import { POSITION_STEP_M } from '@/lib/analysis/answer-precision';
import type { RunResult } from '@/lib/plans/results';

/** Within this distance, m, a reflection is at the path point: both arrive rounded to 0.1 mm, each on its own. */
const SAME_POINT_M = 1.5 * POSITION_STEP_M;

export function reflectionPlace(path: RunResult['path'], nodeLabels: Readonly<Record<string, string>>, atM: number, kind: string): string | null {
  if (path.length === 0) return null;
  const nodeId = kind === 'start' ? path[0].fromNodeId : path.find((piece) => Math.abs(piece.endM - atM) < SAME_POINT_M)?.toNodeId;
  return nodeId ? nodeLabels[nodeId] ?? null : null;
}
