// Low-frequency boundary gain of a source near the room's surfaces: the directivity factor Q is 2, 4
// or 8 on one, two or three reflecting planes (Long, Architectural Acoustics, 2nd ed., ch. 2). A plane
// counts while the source lies within a quarter wavelength of it (from memory; Waterhouse (1955), JASA 27),
// i.e. below f = c / (4 d), d the distance to the plane. Only the nearest plane on each axis counts:
// the three mutually perpendicular planes of the nearest corner.
import { BOUNDARY_GAIN_WAVELENGTH_FRACTION, DIRECTIVITY_PER_REFLECTING_PLANE } from '../constants';
import type { RoomBox } from '../types';
import type { Point3, SurfaceName } from './room-input';
import { roomSpeedOfSound } from './room-acoustics';

export interface NearPlane {
  surface: SurfaceName;
  distanceM: number;
  /** The plane adds to Q below this frequency, Hz. */
  belowHz: number;
}

export interface BoundaryGain {
  /** Nearest plane on each axis, nearest first. */
  planes: NearPlane[];
  /** Q = 8 below steps[0].belowHz, 4 below steps[1].belowHz, 2 below steps[2].belowHz, 1 above. */
  steps: { q: number; belowHz: number }[];
}

export function boundaryGain(room: RoomBox, point: Point3): BoundaryGain {
  const speedMps = roomSpeedOfSound(room);
  const nearest = (low: SurfaceName, high: SurfaceName, coordinateM: number, lengthM: number): NearPlane => {
    const [surface, distanceM] = coordinateM <= lengthM - coordinateM ? [low, coordinateM] : [high, lengthM - coordinateM];
    // quarter-wavelength rule: d <= lambda / 4  <=>  f <= c / (4 d)
    return { surface, distanceM, belowHz: distanceM > 0 ? (BOUNDARY_GAIN_WAVELENGTH_FRACTION * speedMps) / distanceM : Infinity };
  };
  const planes = [
    nearest('wallXMin', 'wallXMax', point.xM, room.lengthM),
    nearest('wallYMin', 'wallYMax', point.yM, room.widthM),
    nearest('floor', 'ceiling', point.zM, room.heightM),
  ].sort((first, second) => first.distanceM - second.distanceM);
  const steps = [3, 2, 1].map((count) => ({ q: DIRECTIVITY_PER_REFLECTING_PLANE ** count, belowHz: planes[count - 1].belowHz }));
  return { planes, steps };
}

/** Q at a frequency: 2 to the number of planes within a quarter wavelength. */
export function directivityAt(gain: BoundaryGain, frequencyHz: number): number {
  const count = gain.planes.filter((plane) => frequencyHz <= plane.belowHz).length;
  return DIRECTIVITY_PER_REFLECTING_PLANE ** count;
}
