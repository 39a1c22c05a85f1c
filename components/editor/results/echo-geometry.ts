// Turns an echo's path text ("tee@1.50 m → end → start") into points of a space-time
// diagram: position along the chosen path (m) against time (s). Legs inside a side branch
// are drawn at the tee's position.
import type { Echo } from '@/lib/acoustic';

export interface EchoPoint { positionM: number; timeS: number; inBranch: boolean }

function positionOf(label: string, lengthM: number): { positionM: number; inBranch: boolean } {
  const branch = /^branch@([\d.]+) m: /.exec(label);
  if (branch) return { positionM: Number(branch[1]), inBranch: true };
  if (label === 'start') return { positionM: 0, inBranch: false };
  if (label === 'end') return { positionM: lengthM, inBranch: false };
  const at = /@([\d.]+) m$/.exec(label);
  return { positionM: at ? Number(at[1]) : 0, inBranch: false };
}

// The wave's corners in order; times are spread in proportion to distance travelled so the
// last point lands exactly on the echo's computed delay.
export function echoPolyline(echo: Echo, lengthM: number): EchoPoint[] {
  const labels = echo.path ? echo.path.split(' → ') : [];
  const corners = [{ positionM: 0, inBranch: false }, ...labels.map((label) => positionOf(label, lengthM)), { positionM: 0, inBranch: false }];
  const legs = corners.slice(1).map((corner, index) => Math.abs(corner.positionM - corners[index].positionM));
  const pathM = legs.reduce((sum, leg) => sum + leg, 0);
  let travelledM = 0;
  return corners.map((corner, index) => {
    if (index > 0) travelledM += legs[index - 1];
    return { positionM: corner.positionM, timeS: pathM > 0 ? (echo.delayS * travelledM) / pathM : 0, inBranch: corner.inBranch };
  });
}
