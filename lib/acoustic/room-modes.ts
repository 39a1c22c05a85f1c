// Natural modes of a rectangular room with rigid walls.
import { speedOfSound } from './air';
import { DEFAULT_TEMPERATURE_C } from './constants';
import { requireAbove } from './input-error';
import type { RoomBox, RoomMode, RoomModeType } from './types';

const MODE_TYPES: RoomModeType[] = ['axial', 'tangential', 'oblique'];

/** All modes up to maxHz, ascending in frequency (ties by indices). */
export function roomModes(room: RoomBox, maxHz: number): RoomMode[] {
  const lengthM = requireAbove(room.lengthM, 0, 'lengthM');
  const widthM = requireAbove(room.widthM, 0, 'widthM');
  const heightM = requireAbove(room.heightM, 0, 'heightM');
  requireAbove(maxHz, 0, 'maxHz');
  const speedMps =
    room.speedOfSoundMps !== undefined
      ? requireAbove(room.speedOfSoundMps, 0, 'speedOfSoundMps')
      : speedOfSound(room.temperatureC ?? DEFAULT_TEMPERATURE_C);
  const limit = (dimensionM: number): number => Math.floor((2 * maxHz * dimensionM) / speedMps);
  const modes: RoomMode[] = [];
  for (let nx = 0; nx <= limit(lengthM); nx++) {
    for (let ny = 0; ny <= limit(widthM); ny++) {
      for (let nz = 0; nz <= limit(heightM); nz++) {
        const nonZero = (nx > 0 ? 1 : 0) + (ny > 0 ? 1 : 0) + (nz > 0 ? 1 : 0);
        if (nonZero === 0) continue;
        // Rayleigh (1896), The Theory of Sound, vol. 2, §267: f = (c/2) sqrt((nx/Lx)^2 + (ny/Ly)^2 + (nz/Lz)^2)
        const frequencyHz = (speedMps / 2) * Math.hypot(nx / lengthM, ny / widthM, nz / heightM);
        if (frequencyHz <= maxHz * (1 + 1e-12)) modes.push({ frequencyHz, indices: [nx, ny, nz], type: MODE_TYPES[nonZero - 1] });
      }
    }
  }
  return modes.sort(
    (first, second) =>
      first.frequencyHz - second.frequencyHz ||
      first.indices[0] - second.indices[0] ||
      first.indices[1] - second.indices[1] ||
      first.indices[2] - second.indices[2],
  );
}
