// A room's box checked against the physical limits, and how far up a list of its modes may go.
import { inputError, requireAbove, requireAboveAtMost, requireBetween } from '../input-error';
import { MAX_AIR_TEMPERATURE_C, MAX_ROOM_HEIGHT_M, MAX_ROOM_MODE_CANDIDATES, MAX_ROOM_SIDE_M, MIN_AIR_TEMPERATURE_C } from '../input-limits';
import type { RoomBox } from '../types';

/** Highest index along a side for modes up to maxHz: n c / 2L <= maxHz (Rayleigh, The Theory of Sound, vol. 2, §267). */
export function highestModeIndex(maxHz: number, sideM: number, speedOfSoundMps: number): number {
  return Math.floor((2 * maxHz * sideM) / speedOfSoundMps);
}

/** Checks the sides (and temperature or speed of sound when given); prefix is '' or e.g. 'room.box.'. */
export function validateRoomBox(box: unknown, prefix: string): RoomBox {
  if (typeof box !== 'object' || box === null) throw inputError(prefix.replace(/\.$/, '') || 'room', 'must be an object');
  const room = box as RoomBox;
  requireAboveAtMost(room.lengthM, 0, MAX_ROOM_SIDE_M, `${prefix}lengthM`);
  requireAboveAtMost(room.widthM, 0, MAX_ROOM_SIDE_M, `${prefix}widthM`);
  requireAboveAtMost(room.heightM, 0, MAX_ROOM_HEIGHT_M, `${prefix}heightM`);
  if (room.temperatureC !== undefined) requireBetween(room.temperatureC, MIN_AIR_TEMPERATURE_C, MAX_AIR_TEMPERATURE_C, `${prefix}temperatureC`);
  if (room.speedOfSoundMps !== undefined) requireAbove(room.speedOfSoundMps, 0, `${prefix}speedOfSoundMps`);
  if (room.relativeHumidityPercent !== undefined) requireBetween(room.relativeHumidityPercent, 0, 100, `${prefix}relativeHumidityPercent`);
  return room;
}

/** Index combinations a mode list up to maxHz tries (the zero mode left out). */
function modeCandidates(box: RoomBox, maxHz: number, speedOfSoundMps: number): number {
  const along = (sideM: number) => highestModeIndex(maxHz, sideM, speedOfSoundMps) + 1;
  return along(box.lengthM) * along(box.widthM) * along(box.heightM) - 1;
}

/** The highest frequency, Hz, up to which the room's modes may be listed (to 0.1 Hz, by bisection). */
export function highestListableModeHz(box: RoomBox, speedOfSoundMps: number): number {
  let lowHz = 0;
  let highHz = (MAX_ROOM_MODE_CANDIDATES * speedOfSoundMps) / (2 * Math.min(box.lengthM, box.widthM, box.heightM));
  while (highHz - lowHz > 0.1) {
    const middleHz = (lowHz + highHz) / 2;
    if (modeCandidates(box, middleHz, speedOfSoundMps) <= MAX_ROOM_MODE_CANDIDATES) lowHz = middleHz;
    else highHz = middleHz;
  }
  return lowHz;
}

/** Throws, naming the field, when a mode list of the room up to maxHz would try too many index combinations. */
export function requireListableModes(box: RoomBox, maxHz: number, speedOfSoundMps: number, fieldPath: string): void {
  if (modeCandidates(box, maxHz, speedOfSoundMps) <= MAX_ROOM_MODE_CANDIDATES) return;
  const limitHz = highestListableModeHz(box, speedOfSoundMps);
  throw inputError(fieldPath, `must be <= ${limitHz.toFixed(1)} for a room of ${box.lengthM} × ${box.widthM} × ${box.heightM} m ` +
    `(its modes up to ${maxHz} Hz would take more than ${MAX_ROOM_MODE_CANDIDATES} index combinations to list)`);
}
