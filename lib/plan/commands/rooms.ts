// Room edits: add a room, change any of its properties, move it, delete it. A room's outlet stays
// with the duct end that feeds it: an outlet placed in the form takes its end along; any other
// change (a new end, a move, a new size) puts the outlet at its end, or the nearest point inside.
import { findNode, findRoom, type PlanDocument } from '../document';
import { PlanError } from '../errors';
import type { Point } from '../geometry/point';
import { checkedScale, moveEndToOutlet, withExtraOutletsAtTheirEnds, withOutletAtItsEnd } from '../rooms/outlet-link';
import { newRoom, type NewRoomShape } from '../rooms/room-input';
import { roomPlaceProblems } from '../rooms/room-places';
import { roomSchema } from '../rooms/room-schema';
import type { PlanRoom } from '../rooms/room-types';
import { checked, defineCommand } from './define';

export type AddRoomArgs = NewRoomShape;

export interface UpdateRoomArgs {
  readonly roomId: string;
  readonly changes: Partial<Omit<PlanRoom, 'id'>>;
  /** The plan scale, m per pixel: it ties the outlet to its duct end. */
  readonly metresPerPixel: number;
}

export interface MoveRoomArgs {
  readonly roomId: string;
  /** The room's new top-left corner, plan pixels. */
  readonly to: Point;
  /** The plan scale, m per pixel: it ties the outlet to its duct end. */
  readonly metresPerPixel: number;
}

export interface DeleteRoomArgs {
  readonly roomId: string;
}

/** The schema's checks plus: outlet and listener inside the box, the outlet's point on the plan. */
function checkedRoom(doc: PlanDocument, candidate: unknown): PlanRoom {
  return checkedPlaces(doc, checked(roomSchema, candidate, 'Room'));
}

/** The place's words in a message: "Room outlet x", "Room outlet 2 end", "Room listener L2 z". */
function placeWords(room: PlanRoom, path: readonly (string | number)[]): string {
  const [where, index, field] = path;
  const axis = (name: unknown) => (name === 'nodeId' ? 'end' : typeof name === 'string' && /^[xyz]M$/.test(name) ? name.slice(0, 1) : String(name ?? ''));
  if (where === 'outlet' || where === 'listener') return `Room ${where} ${axis(index)}`.trim();
  if (where === 'extraOutlets') return `Room outlet ${Number(index) + 2} ${axis(field)}`.trim();
  const listener = room.extraListeners?.[Number(index)];
  return `Room listener ${listener?.name ?? Number(index) + 2} ${axis(field)}`.trim();
}

function checkedPlaces(doc: PlanDocument, room: PlanRoom): PlanRoom {
  const [problem] = roomPlaceProblems(room, (nodeId) => findNode(doc, nodeId) !== undefined);
  if (problem) throw new PlanError(`${placeWords(room, problem.path)}: ${problem.message}.`, { roomId: room.id });
  return room;
}

function targetRoom(doc: PlanDocument, roomId: string): PlanRoom {
  const room = findRoom(doc, roomId);
  if (!room) throw new PlanError(`There is no room with id "${roomId}".`, { roomId });
  return room;
}

function replaceRoom(doc: PlanDocument, room: PlanRoom): PlanDocument {
  return { ...doc, rooms: doc.rooms.map((candidate) => (candidate.id === room.id ? room : candidate)) };
}

export const addRoom = defineCommand('add-room', 'Add a rectangular room to the plan.', (doc, state, args: AddRoomArgs, newId) => {
  const room = checkedRoom(doc, newRoom(newId(), args));
  return { doc: { ...doc, rooms: [...doc.rooms, room] }, state };
});

/** The same duct end, the outlet somewhere else: it was placed by hand. */
function outletPlacedByHand(before: PlanRoom, after: PlanRoom): boolean {
  return after.outlet.nodeId !== null && after.outlet.nodeId === before.outlet.nodeId && (after.outlet.xM !== before.outlet.xM || after.outlet.yM !== before.outlet.yM);
}

/** The document with the room changed, its outlet and duct end kept together. */
function withChangedRoom(doc: PlanDocument, before: PlanRoom, candidate: unknown, metresPerPixel: number): PlanDocument {
  const scale = checkedScale(metresPerPixel);
  const after = checked(roomSchema, candidate, 'Room');
  if (outletPlacedByHand(before, after)) {
    const room = checkedPlaces(doc, withExtraOutletsAtTheirEnds(doc, after, scale));
    return moveEndToOutlet(replaceRoom(doc, room), room, scale);
  }
  return replaceRoom(doc, checkedPlaces(doc, withOutletAtItsEnd(doc, after, scale)));
}

export const updateRoom = defineCommand('update-room', "Change a room's size, place, finishes, criterion, room correction, outlets or listeners (the first outlet placed here takes its duct end along).", (doc, state, args: UpdateRoomArgs) => {
  const room = targetRoom(doc, args.roomId);
  return { doc: withChangedRoom(doc, room, { ...room, ...args.changes, id: room.id }, args.metresPerPixel), state };
});

export const moveRoom = defineCommand('move-room', 'Move a room on the plan (its size and listener go with it; its outlet stays at the duct end that feeds it).', (doc, state, args: MoveRoomArgs) => {
  const room = targetRoom(doc, args.roomId);
  // The schema names a missing or non-finite coordinate ("Room (x): …").
  const to: Partial<Point> = args.to ?? {};
  return { doc: withChangedRoom(doc, room, { ...room, x: to.x, y: to.y }, args.metresPerPixel), state };
});

export const deleteRoom = defineCommand('delete-room', 'Delete a room (its chosen treatments stay in the list).', (doc, state, args: DeleteRoomArgs) => {
  targetRoom(doc, args.roomId);
  return { doc: { ...doc, rooms: doc.rooms.filter((room) => room.id !== args.roomId) }, state };
});
