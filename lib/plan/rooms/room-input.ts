// A plan room → the engine's RoomInput, a new room's defaults, and the room's rectangle on the plan.
import { SURFACE_NAMES, type RoomInput, type RoomSurfaces } from '@/lib/acoustic';
import { DEFAULT_FINISH_IDS, findFinish } from './finishes';
import type { PlanRoom, RoomSurface, SurfaceName } from './room-types';

export { SURFACE_NAMES } from '@/lib/acoustic';

export const DEFAULT_CRITERION_NC = 25;
/** Outlet 0.3 m below the ceiling and listener seated (1.2 m) at the room's middle (product defaults). */
const OUTLET_BELOW_CEILING_M = 0.3;
const SEATED_EAR_HEIGHT_M = 1.2;

export function toRoomInput(room: PlanRoom, temperatureC?: number): RoomInput {
  const surfaces = Object.fromEntries(SURFACE_NAMES.map((name) => [name, [...room.surfaces[name].absorption]])) as RoomSurfaces;
  return {
    box: { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM, ...(temperatureC !== undefined ? { temperatureC } : {}) },
    surfaces,
    criterionNc: room.criterionNc,
    outlet: { xM: room.outlet.xM, yM: room.outlet.yM, zM: room.outlet.zM },
    listener: { xM: room.listener.xM, yM: room.listener.yM, zM: room.listener.zM },
  };
}

export function defaultSurfaces(): Record<SurfaceName, RoomSurface> {
  const surface = (name: SurfaceName): RoomSurface => {
    const finish = findFinish(DEFAULT_FINISH_IDS[name]);
    return { finishId: finish?.id ?? null, absorption: [...(finish?.absorption ?? [])] };
  };
  return {
    floor: surface('floor'), ceiling: surface('ceiling'),
    wallXMin: surface('wallXMin'), wallXMax: surface('wallXMax'), wallYMin: surface('wallYMin'), wallYMax: surface('wallYMax'),
  };
}

export type NewRoomShape = Pick<PlanRoom, 'name' | 'x' | 'y' | 'lengthM' | 'widthM' | 'heightM'>;

/** A room with default finishes, NC 25, outlet near the ceiling and listener seated, both at the middle. */
export function newRoom(id: string, shape: NewRoomShape): PlanRoom {
  const middle = { xM: shape.lengthM / 2, yM: shape.widthM / 2 };
  return {
    id,
    ...shape,
    surfaces: defaultSurfaces(),
    criterionNc: DEFAULT_CRITERION_NC,
    outlet: { nodeId: null, ...middle, zM: Math.max(0, shape.heightM - OUTLET_BELOW_CEILING_M) },
    listener: { ...middle, zM: Math.min(SEATED_EAR_HEIGHT_M, shape.heightM) },
    outletSoundPowerDb: null,
  };
}

/** The room's rectangle in plan pixels at the plan's scale. */
export function roomRectPx(room: PlanRoom, metresPerPixel: number): { x: number; y: number; width: number; height: number } {
  return { x: room.x, y: room.y, width: room.lengthM / metresPerPixel, height: room.widthM / metresPerPixel };
}

/** A point in the room (m) → plan pixels. */
export function roomPointPx(room: PlanRoom, point: { xM: number; yM: number }, metresPerPixel: number): { x: number; y: number } {
  return { x: room.x + point.xM / metresPerPixel, y: room.y + point.yM / metresPerPixel };
}
