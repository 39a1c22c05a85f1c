// The room correction Lp - Lw of one outlet at one listener by the room equation, for a bare room: the
// direct field with the outlet's boundary gain (Waterhouse) and the reverberant field of the room's own
// absorption, surfaces and air (Long, Architectural Acoustics, 2nd ed., ch. 8). In furnished rooms the
// empirical relation of Schultz (schultz-room-correction.ts) is the better estimate.
import { OCTAVE_BANDS_HZ } from '../constants';
import { inputError } from '../input-error';
import { boundaryGain, directivityAt } from './boundary-gain';
import { roomBands } from './room-acoustics';
import { validateRoomBox } from './room-box';
import { validatePoint, validateSurfaces, type Point3, type RoomSurfaces } from './room-input';
import type { RoomBox } from '../types';

/** The room equation's near field is not modelled: outlet–listener distances below this are taken as this, m (product rule). */
export const ROOM_EQUATION_MIN_DISTANCE_M = 0.1;

export interface RoomEquationInput {
  box: RoomBox;
  surfaces: RoomSurfaces;
  outlet: Point3;
  listener: Point3;
}

/** Lp - Lw per band, dB, at the listener from the outlet (octave bands 63 Hz to 8 kHz unless given). */
export function roomEquationCorrectionDb(input: RoomEquationInput, bandsHz: readonly number[] = OCTAVE_BANDS_HZ): number[] {
  if (typeof input !== 'object' || input === null) throw inputError('input', 'must be an object');
  const box = validateRoomBox(input.box, 'box.');
  validateSurfaces(input.surfaces, 'surfaces');
  validatePoint(input.outlet, box, 'outlet');
  validatePoint(input.listener, box, 'listener');
  const gain = boundaryGain(box, input.outlet);
  const bands = roomBands(box, input.surfaces, bandsHz);
  const { outlet, listener } = input;
  const distanceM = Math.max(ROOM_EQUATION_MIN_DISTANCE_M, Math.hypot(outlet.xM - listener.xM, outlet.yM - listener.yM, outlet.zM - listener.zM));
  return bands.map((band) => {
    const roomConstantM2 = band.roomConstantM2;
    if (!(roomConstantM2 > 0)) throw inputError('surfaces', `absorb nothing in the ${band.hz} Hz band: the room equation needs some absorption (or choose the furnished-room correction)`);
    const q = directivityAt(gain, band.hz);
    // Long, ch. 8: Lp - Lw = 10 log(Q / 4 pi r² + 4 / R); R infinite (all absorbed) leaves the direct field
    return 10 * Math.log10(q / (4 * Math.PI * distanceM * distanceM) + (Number.isFinite(roomConstantM2) ? 4 / roomConstantM2 : 0));
  });
}
