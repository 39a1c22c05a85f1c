// Input shape of a room served by a duct run, and its validation (RangeError naming the field path).
import { OCTAVE_BANDS_HZ } from '../constants';
import { NC_CURVES } from '../nc-curves';
import { inputError, requireBetween } from '../input-error';
import type { Mounting, RoomBox } from '../types';
import { validateRoomBox } from './room-box';

/** A point in the room, m, from the corner at the origin: x along lengthM, y along widthM, z up (heightM). */
export interface Point3 {
  xM: number;
  yM: number;
  zM: number;
}

/** The six surfaces of a rectangular room. */
export type SurfaceName = 'floor' | 'ceiling' | 'wallXMin' | 'wallXMax' | 'wallYMin' | 'wallYMax';
export const SURFACE_NAMES: readonly SurfaceName[] = ['wallXMin', 'wallXMax', 'wallYMin', 'wallYMax', 'floor', 'ceiling'];

/** Random-incidence absorption coefficient of each surface in the octave bands 63 Hz to 8 kHz (8 values, 0..1). */
export type RoomSurfaces = Record<SurfaceName, number[]>;

export interface RoomInput {
  box: RoomBox;
  surfaces: RoomSurfaces;
  /** Criterion for the room, an NC value (e.g. 25). */
  criterionNc: number;
  /** The run's outlet (its end end) in the room. */
  outlet: Point3;
  listener: Point3;
  /** How the outlet meets the room, for the end reflection loss; default from the run's end (flanged: flush, else free). */
  outletMounting?: Mounting;
}

/** Checks a point lies inside the box, naming the field. */
export function validatePoint(point: unknown, box: RoomBox, path: string): void {
  if (typeof point !== 'object' || point === null) throw inputError(path, 'must be an object');
  const { xM, yM, zM } = point as Record<string, unknown>;
  requireBetween(xM, 0, box.lengthM, `${path}.xM`);
  requireBetween(yM, 0, box.widthM, `${path}.yM`);
  requireBetween(zM, 0, box.heightM, `${path}.zM`);
}

/** Checks the six surfaces' absorption, 8 bands each between 0 and 1, naming the field. */
export function validateSurfaces(surfaces: unknown, path: string): RoomSurfaces {
  if (typeof surfaces !== 'object' || surfaces === null) throw inputError(path, 'must be an object');
  for (const name of SURFACE_NAMES) {
    const bands = (surfaces as Record<string, unknown>)[name];
    if (!Array.isArray(bands) || bands.length !== OCTAVE_BANDS_HZ.length) {
      throw inputError(`${path}.${name}`, `must have ${OCTAVE_BANDS_HZ.length} octave-band absorption values`);
    }
    bands.forEach((value, band) => requireBetween(value, 0, 1, `${path}.${name}[${band}]`));
  }
  return surfaces as RoomSurfaces;
}

export function validateRoomInput(room: unknown, path = 'room'): RoomInput {
  if (typeof room !== 'object' || room === null) throw inputError(path, 'must be an object');
  const candidate = room as RoomInput;
  if (typeof candidate.box !== 'object' || candidate.box === null) throw inputError(`${path}.box`, 'must be an object');
  validateRoomBox(candidate.box, `${path}.box.`);
  validateSurfaces(candidate.surfaces, `${path}.surfaces`);
  // The published curves run from NC 15 to NC 70 (ANSI S12.2); between them the criterion is interpolated.
  requireBetween(candidate.criterionNc, NC_CURVES[0].rating, NC_CURVES[NC_CURVES.length - 1].rating, `${path}.criterionNc`);
  validatePoint(candidate.outlet, candidate.box, `${path}.outlet`);
  validatePoint(candidate.listener, candidate.box, `${path}.listener`);
  if (candidate.outletMounting !== undefined && candidate.outletMounting !== 'flush' && candidate.outletMounting !== 'free') {
    throw inputError(`${path}.outletMounting`, "must be 'flush' or 'free'");
  }
  return candidate;
}
