// What changed in the rooms: name, place and size, each surface's finish, the criterion, the run
// end that feeds the room, the outlet and listener, and any outlet sound power typed in.
import { findFinish, SURFACE_NAMES, type PlanRoom, type RoomPoint, type RoomSurface, type SurfaceName } from '@/lib/plan';
import { formatLength } from '@/lib/plan/units';
import type { ChangeContext, DocumentChange, PlanSide } from './types';
import { NONE } from './types';
import { bandsWords, otherFields, same } from './words';

const DESCRIBED: readonly (keyof PlanRoom)[] = ['id', 'name', 'x', 'y', 'lengthM', 'widthM', 'heightM', 'surfaces', 'criterionNc', 'outlet', 'listener', 'outletSoundPowerDb', 'extraOutlets', 'extraListeners', 'roomCorrection'];

const SURFACE_WORDS: Record<SurfaceName, string> = {
  floor: 'floor', ceiling: 'ceiling', wallXMin: 'left wall', wallXMax: 'right wall', wallYMin: 'top wall on the plan', wallYMax: 'bottom wall on the plan',
};

function sizeWords(room: PlanRoom, context: ChangeContext): string {
  const length = (metres: number) => formatLength(metres, context.units, 'run');
  return `${length(room.lengthM)} × ${length(room.widthM)}, ${length(room.heightM)} high`;
}

function placeWords(room: PlanRoom, side: PlanSide, context: ChangeContext): string {
  const length = (metres: number) => formatLength(metres, context.units, 'run');
  return `corner ${length(room.x * side.metresPerPixel)} from the plan's left, ${length(room.y * side.metresPerPixel)} from its top`;
}

function pointWords(point: RoomPoint, context: ChangeContext): string {
  const length = (metres: number) => formatLength(metres, context.units, 'run');
  return `${length(point.xM)}, ${length(point.yM)}, ${length(point.zM)} up`;
}

function surfaceWords(surface: RoomSurface): string {
  const finish = findFinish(surface.finishId);
  return finish && same(finish.absorption, surface.absorption) ? finish.name : `typed absorption ${surface.absorption.map((value) => value.toFixed(2)).join('/')}`;
}

function feedWords(side: PlanSide, nodeId: string | null): string {
  return nodeId === null ? 'not connected' : side.labels.nodes[nodeId] ?? 'a point no longer on the plan';
}

function correctionWords(room: PlanRoom): string {
  return room.roomCorrection === 'bare' ? 'bare room (room equation)' : 'furnished (Schultz)';
}

function extraOutletWords(room: PlanRoom, side: PlanSide, context: ChangeContext): string {
  const outlets = room.extraOutlets ?? [];
  return outlets.length === 0 ? 'none' : outlets.map((outlet) => `fed from ${feedWords(side, outlet.nodeId)} at ${pointWords(outlet, context)}`).join('; ');
}

function extraListenerWords(room: PlanRoom, context: ChangeContext): string {
  const listeners = room.extraListeners ?? [];
  return listeners.length === 0 ? 'none' : listeners.map((listener) => `${listener.name} at ${pointWords(listener, context)}`).join('; ');
}

function keptRoomChanges(context: ChangeContext, before: PlanRoom, after: PlanRoom): DocumentChange[] {
  const subject = after.name;
  const lines: DocumentChange[] = [];
  const add = (what: string, old: string, now: string) => lines.push({ area: 'room', subject, what, before: old, after: now });
  if (before.name !== after.name) add('Name', before.name, after.name);
  // Moved on the drawing (in its pixels): a new scale alone moves no room.
  if (before.x !== after.x || before.y !== after.y) add('Place on the plan', placeWords(before, context.before, context), placeWords(after, context.after, context));
  if (before.lengthM !== after.lengthM || before.widthM !== after.widthM || before.heightM !== after.heightM) add('Size', sizeWords(before, context), sizeWords(after, context));
  for (const name of SURFACE_NAMES) {
    if (!same(before.surfaces[name], after.surfaces[name])) add(`Finish of the ${SURFACE_WORDS[name]}`, surfaceWords(before.surfaces[name]), surfaceWords(after.surfaces[name]));
  }
  if (before.criterionNc !== after.criterionNc) add('Criterion', `NC ${before.criterionNc}`, `NC ${after.criterionNc}`);
  const feeds = [feedWords(context.before, before.outlet.nodeId), feedWords(context.after, after.outlet.nodeId)];
  if (before.outlet.nodeId !== after.outlet.nodeId || feeds[0] !== feeds[1]) add('Fed from', feeds[0], feeds[1]);
  if (before.outlet.xM !== after.outlet.xM || before.outlet.yM !== after.outlet.yM || before.outlet.zM !== after.outlet.zM) add('Outlet position', pointWords(before.outlet, context), pointWords(after.outlet, context));
  if (!same(before.listener, after.listener)) add('Listener position', pointWords(before.listener, context), pointWords(after.listener, context));
  if (!same(before.outletSoundPowerDb, after.outletSoundPowerDb)) add('Outlet sound power', bandsWords(before.outletSoundPowerDb, 'dB'), bandsWords(after.outletSoundPowerDb, 'dB'));
  const extraOutlets = [extraOutletWords(before, context.before, context), extraOutletWords(after, context.after, context)];
  if (extraOutlets[0] !== extraOutlets[1]) add('Further outlets', extraOutlets[0], extraOutlets[1]);
  const extraListeners = [extraListenerWords(before, context), extraListenerWords(after, context)];
  if (extraListeners[0] !== extraListeners[1]) add('Further listeners', extraListeners[0], extraListeners[1]);
  if (correctionWords(before) !== correctionWords(after)) add('Room correction', correctionWords(before), correctionWords(after));
  for (const other of otherFields(before, after, DESCRIBED)) add(other.field, other.before, other.after);
  return lines;
}

export function roomChanges(context: ChangeContext): DocumentChange[] {
  const before = new Map(context.before.document.rooms.map((room) => [room.id, room]));
  const after = new Set(context.after.document.rooms.map((room) => room.id));
  const lines: DocumentChange[] = [];
  for (const room of context.after.document.rooms) {
    const old = before.get(room.id);
    if (!old) lines.push({ area: 'room', subject: room.name, what: 'Added', before: NONE, after: `${sizeWords(room, context)}, NC ${room.criterionNc}` });
    else lines.push(...keptRoomChanges(context, old, room));
  }
  for (const room of context.before.document.rooms) {
    if (!after.has(room.id)) lines.push({ area: 'room', subject: room.name, what: 'Removed', before: `${sizeWords(room, context)}, NC ${room.criterionNc}`, after: NONE });
  }
  return lines;
}
