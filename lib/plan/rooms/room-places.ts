// Every outlet and every listener of a room in one list each: the first ones (`outlet`, `listener`) and
// the further ones, with the ids, names and document paths the tables, checks and messages use.
import type { PlanRoom, RoomPoint } from './room-types';

/** The id the room's first outlet and first listener go by (further ones carry their own). */
export const FIRST_OUTLET_ID = 'outlet';
export const FIRST_LISTENER_ID = 'listener';
export const FIRST_LISTENER_NAME = 'L1';

export interface RoomOutletPlace extends RoomPoint {
  readonly id: string;
  readonly nodeId: string | null;
  /** Where it sits in the room document, e.g. ['outlet'] or ['extraOutlets', 0]. */
  readonly path: readonly (string | number)[];
}

export interface RoomListenerPlace extends RoomPoint {
  readonly id: string;
  readonly name: string;
  readonly path: readonly (string | number)[];
}

export function roomOutlets(room: PlanRoom): RoomOutletPlace[] {
  const { nodeId, xM, yM, zM } = room.outlet;
  return [
    { id: FIRST_OUTLET_ID, nodeId, xM, yM, zM, path: ['outlet'] },
    ...(room.extraOutlets ?? []).map((outlet, index) => ({ id: outlet.id, nodeId: outlet.nodeId, xM: outlet.xM, yM: outlet.yM, zM: outlet.zM, path: ['extraOutlets', index] })),
  ];
}

export function roomListeners(room: PlanRoom): RoomListenerPlace[] {
  const { xM, yM, zM } = room.listener;
  return [
    { id: FIRST_LISTENER_ID, name: FIRST_LISTENER_NAME, xM, yM, zM, path: ['listener'] },
    ...(room.extraListeners ?? []).map((listener, index) => ({ id: listener.id, name: listener.name, xM: listener.xM, yM: listener.yM, zM: listener.zM, path: ['extraListeners', index] })),
  ];
}

/** A name for the next listener: L2, L3, … the first not yet taken. */
export function nextListenerName(room: PlanRoom): string {
  const taken = new Set(roomListeners(room).map((listener) => listener.name));
  let number = 2;
  while (taken.has(`L${number}`)) number += 1;
  return `L${number}`;
}

export interface RoomPlaceProblem {
  readonly path: readonly (string | number)[];
  readonly message: string;
}

const AXES = [['xM', 'lengthM', 'length'], ['yM', 'widthM', 'width'], ['zM', 'heightM', 'height']] as const;

/**
 * What is wrong with the room's outlets and listeners: a point outside the box, an end that is not on
 * the plan, one end feeding the room twice, an id or a listener name used twice. Paths are within the room.
 */
export function roomPlaceProblems(room: PlanRoom, nodeExists: (nodeId: string) => boolean): RoomPlaceProblem[] {
  const problems: RoomPlaceProblem[] = [];
  const points: { path: readonly (string | number)[]; point: RoomPoint }[] = [...roomOutlets(room), ...roomListeners(room)].map((place) => ({ path: place.path, point: place }));
  for (const { path, point } of points) {
    for (const [axis, side, word] of AXES) {
      if (point[axis] > room[side]) problems.push({ path: [...path, axis], message: `must be inside the room (at most its ${word}, ${room[side]} m)` });
    }
  }
  const ends = new Map<string, string>();
  const ids = new Set<string>();
  for (const outlet of roomOutlets(room)) {
    if (ids.has(outlet.id)) problems.push({ path: [...outlet.path, 'id'], message: `repeats the id "${outlet.id}"` });
    ids.add(outlet.id);
    if (outlet.nodeId === null) continue;
    if (!nodeExists(outlet.nodeId)) problems.push({ path: [...outlet.path, 'nodeId'], message: `there is no point with id "${outlet.nodeId}" on the plan` });
    const already = ends.get(outlet.nodeId);
    if (already !== undefined) problems.push({ path: [...outlet.path, 'nodeId'], message: `feeds the room already as ${already}; one run end is one outlet` });
    ends.set(outlet.nodeId, outlet.id === FIRST_OUTLET_ID ? 'its first outlet' : 'another outlet');
  }
  const names = new Set<string>();
  for (const listener of roomListeners(room)) {
    if (ids.has(listener.id)) problems.push({ path: [...listener.path, 'id'], message: `repeats the id "${listener.id}"` });
    ids.add(listener.id);
    if (names.has(listener.name)) problems.push({ path: [...listener.path, 'name'], message: `"${listener.name}" names another listener of this room already` });
    names.add(listener.name);
  }
  return problems;
}
