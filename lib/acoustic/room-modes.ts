// Natural modes of a rectangular room with rigid walls.
import { speedOfSound } from './air';
import { DEFAULT_TEMPERATURE_C } from './constants';
import { requireAbove } from './input-error';
import { highestModeIndex, requireListableModes, validateRoomBox } from './room/room-box';
import type { RoomBox, RoomMode, RoomModeType } from './types';

const MODE_TYPES: RoomModeType[] = ['axial', 'tangential', 'oblique'];

/** Rayleigh (1896), The Theory of Sound, vol. 2, §267: f = (c/2) sqrt((nx/Lx)^2 + (ny/Ly)^2 + (nz/Lz)^2) */
function modeHz(room: RoomBox, indices: readonly [number, number, number], speedMps: number): number {
  return (speedMps / 2) * Math.hypot(indices[0] / room.lengthM, indices[1] / room.widthM, indices[2] / room.heightM);
}

const ascending = (first: RoomMode, second: RoomMode): number =>
  first.frequencyHz - second.frequencyHz ||
  first.indices[0] - second.indices[0] ||
  first.indices[1] - second.indices[1] ||
  first.indices[2] - second.indices[2];

/** The room's speed of sound after checking the box and maxHz. */
function checkedSpeed(room: RoomBox, maxHz: number): number {
  validateRoomBox(room, '');
  requireAbove(maxHz, 0, 'maxHz');
  return room.speedOfSoundMps ?? speedOfSound(room.temperatureC ?? DEFAULT_TEMPERATURE_C);
}

/** All modes up to maxHz, ascending in frequency (ties by indices). */
export function roomModes(room: RoomBox, maxHz: number): RoomMode[] {
  const speedMps = checkedSpeed(room, maxHz);
  requireListableModes(room, maxHz, speedMps, 'maxHz');
  const modes: RoomMode[] = [];
  for (let nx = 0; nx <= highestModeIndex(maxHz, room.lengthM, speedMps); nx++) {
    for (let ny = 0; ny <= highestModeIndex(maxHz, room.widthM, speedMps); ny++) {
      for (let nz = 0; nz <= highestModeIndex(maxHz, room.heightM, speedMps); nz++) {
        const nonZero = (nx > 0 ? 1 : 0) + (ny > 0 ? 1 : 0) + (nz > 0 ? 1 : 0);
        if (nonZero === 0) continue;
        const frequencyHz = modeHz(room, [nx, ny, nz], speedMps);
        if (frequencyHz <= maxHz * (1 + 1e-12)) modes.push({ frequencyHz, indices: [nx, ny, nz], type: MODE_TYPES[nonZero - 1] });
      }
    }
  }
  return modes.sort(ascending);
}

/** The axial modes up to maxHz only (those roomModes lists with one index non-zero), in the same order. */
export function axialRoomModes(room: RoomBox, maxHz: number): RoomMode[] {
  const speedMps = checkedSpeed(room, maxHz);
  const sides = [room.lengthM, room.widthM, room.heightM];
  const modes: RoomMode[] = [];
  sides.forEach((sideM, axis) => {
    for (let order = 1; order <= highestModeIndex(maxHz, sideM, speedMps); order++) {
      const indices: [number, number, number] = [0, 0, 0];
      indices[axis] = order;
      const frequencyHz = modeHz(room, indices, speedMps);
      if (frequencyHz <= maxHz * (1 + 1e-12)) modes.push({ frequencyHz, indices, type: 'axial' });
    }
  });
  return modes.sort(ascending);
}
