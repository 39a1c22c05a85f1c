// Boundary gain of a source near the room's surfaces: the power a small source radiates near rigid
// planes, relative to free field, is the sum over the source and its images of sin(kD)/(kD), D the
// distance to each image (Waterhouse (1955), JASA 27, 247). Used as the directivity factor Q in the
// room equation, it tends to 2, 4 and 8 on one, two and three planes at low frequency (Long,
// Architectural Acoustics, 2nd ed., ch. 2) and falls smoothly to 1 above: one plane gives
// 1 + sin(2kd)/(2kd), already 1 (0 dB) at d = lambda / 4: a smooth curve, never a step at a quarter
// wavelength. Only the nearest plane on each axis counts: the three mutually perpendicular planes of the
// nearest corner, whose images are those of a corner.
import { BOUNDARY_HALF_CONTRIBUTION_KD } from '../constants';
import type { RoomBox } from '../types';
import type { Point3, SurfaceName } from './room-input';
import { roomSpeedOfSound } from './room-acoustics';

export interface NearPlane {
  surface: SurfaceName;
  distanceM: number;
  /** Below this frequency the plane's image adds at least half its full low-frequency share to Q, Hz. */
  belowHz: number;
}

export interface BoundaryGain {
  /** Nearest plane on each axis, nearest first. */
  planes: NearPlane[];
  speedOfSoundMps: number;
}

export function boundaryGain(room: RoomBox, point: Point3): BoundaryGain {
  const speedMps = roomSpeedOfSound(room);
  const nearest = (low: SurfaceName, high: SurfaceName, coordinateM: number, lengthM: number): NearPlane => {
    const [surface, distanceM] = coordinateM <= lengthM - coordinateM ? [low, coordinateM] : [high, lengthM - coordinateM];
    // sin(2kd)/(2kd) = 1/2 at 2kd = BOUNDARY_HALF_CONTRIBUTION_KD, so f = x c / (4 pi d)
    return { surface, distanceM, belowHz: distanceM > 0 ? (BOUNDARY_HALF_CONTRIBUTION_KD * speedMps) / (4 * Math.PI * distanceM) : Infinity };
  };
  const planes = [
    nearest('wallXMin', 'wallXMax', point.xM, room.lengthM),
    nearest('wallYMin', 'wallYMax', point.yM, room.widthM),
    nearest('floor', 'ceiling', point.zM, room.heightM),
  ].sort((first, second) => first.distanceM - second.distanceM);
  return { planes, speedOfSoundMps: speedMps };
}

/** sin(x)/x, 1 at 0. */
function sinc(x: number): number {
  return Math.abs(x) < 1e-9 ? 1 : Math.sin(x) / x;
}

/** Q at a frequency: sum of sin(kD)/(kD) over the source and its seven images in the corner of the nearest planes (Waterhouse 1955). */
export function directivityAt(gain: BoundaryGain, frequencyHz: number): number {
  const k = (2 * Math.PI * frequencyHz) / gain.speedOfSoundMps;
  const [a, b, c] = gain.planes.map((plane) => 2 * plane.distanceM);
  const images = [0, a, b, c, Math.hypot(a, b), Math.hypot(a, c), Math.hypot(b, c), Math.hypot(a, b, c)];
  return images.reduce((sum, distanceM) => sum + sinc(k * distanceM), 0);
}
