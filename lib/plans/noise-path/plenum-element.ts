// A plenum box put into a segment, as the engine's Wells element: the inlet in the middle of one end
// wall, the outlet in the opposite end wall offset sideways by offsetM, so r = sqrt(L² + offset²) and
// θ = atan(offset / L); S the box's whole inside surface (the openings are left in, a small
// overestimate of the absorbing area while they are small against the walls).
import type { PathElement } from '@/lib/acoustic';
import type { PlenumBox } from '@/lib/plan/document';

export type PlenumElement = Extract<PathElement, { kind: 'plenum' }>;

export function plenumElement(box: PlenumBox): PlenumElement {
  const { lengthM, widthM, heightM } = box;
  return {
    kind: 'plenum',
    outletAreaM2: box.outletAreaM2,
    surfaceAreaM2: 2 * (lengthM * widthM + lengthM * heightM + widthM * heightM),
    absorption: box.absorption,
    distanceM: Math.hypot(lengthM, box.offsetM),
    angleDeg: (Math.atan2(box.offsetM, lengthM) * 180) / Math.PI,
  };
}
