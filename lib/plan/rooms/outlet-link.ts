// A room's outlet belongs to the duct end that feeds it (room.outlet.nodeId). These functions say
// where the outlet sits in the room for an end at a plan point (the nearest point inside the room
// when the end is outside it), and how a room's stored outlet stands against its end.
import { findNode, type PlanDocument, type PlanNode } from '../document';
import { PlanError } from '../errors';
import { distancePx, type Point } from '../geometry/point';
import { roomPointPx } from './room-input';
import type { PlanRoom } from './room-types';

/** An outlet this close to its duct end, m, is at it (product choice: a millimetre, well inside any drawing's precision). */
export const OUTLET_AT_END_TOLERANCE_M = 1e-3;

export interface OutletPlacement {
  /** The outlet's place in the room, m from the room's corner (plan x along lengthM, plan y along widthM). */
  readonly xM: number;
  readonly yM: number;
  /** How far the end lies outside the room's rectangle, m (0 when inside or on a wall). */
  readonly outsideByM: number;
}

/** How a room's outlet stands against the duct end that feeds it. */
export type OutletLink =
  | { readonly kind: 'unlinked' }
  | { readonly kind: 'at-end'; readonly end: Point }
  /** The end is outside the room; the outlet is at the nearest point inside. */
  | { readonly kind: 'end-outside'; readonly end: Point; readonly outsideByM: number }
  /** The outlet is somewhere else than its end (a document from before outlets followed their ends). */
  | { readonly kind: 'apart'; readonly end: Point; readonly apartM: number };

const clamp = (value: number, low: number, high: number): number => Math.min(Math.max(value, low), high);

/** Refuses a scale that is not a positive number of metres per pixel. */
export function checkedScale(metresPerPixel: number): number {
  if (!Number.isFinite(metresPerPixel) || metresPerPixel <= 0) throw new PlanError('Set the plan scale first (metres per pixel must be more than 0).');
  return metresPerPixel;
}

/** The duct end that feeds the room, when it has one on the plan. */
export function outletEnd(doc: PlanDocument, room: PlanRoom): PlanNode | undefined {
  return room.outlet.nodeId === null ? undefined : findNode(doc, room.outlet.nodeId);
}

/** Where the outlet of the room sits for a duct end at the plan point: the point itself, or the nearest point inside the room. */
export function outletPlacementAt(room: PlanRoom, end: Point, metresPerPixel: number): OutletPlacement {
  const freeXM = (end.x - room.x) * metresPerPixel;
  const freeYM = (end.y - room.y) * metresPerPixel;
  const xM = clamp(freeXM, 0, room.lengthM);
  const yM = clamp(freeYM, 0, room.widthM);
  const outsideByM = Math.hypot(freeXM - xM, freeYM - yM);
  return { xM, yM, outsideByM: outsideByM < OUTLET_AT_END_TOLERANCE_M ? 0 : outsideByM };
}

/** The room with its outlet placed for a duct end at the plan point (height and end unchanged). */
export function withOutletAt(room: PlanRoom, end: Point, metresPerPixel: number): PlanRoom {
  const { xM, yM } = outletPlacementAt(room, end, metresPerPixel);
  return { ...room, outlet: { ...room.outlet, xM, yM } };
}

/** The room with its further outlets placed at their duct ends (an outlet without an end on the plan stays). */
export function withExtraOutletsAtTheirEnds(doc: PlanDocument, room: PlanRoom, metresPerPixel: number): PlanRoom {
  if (!room.extraOutlets || room.extraOutlets.length === 0) return room;
  const extraOutlets = room.extraOutlets.map((outlet) => {
    const end = outlet.nodeId === null ? undefined : findNode(doc, outlet.nodeId);
    if (!end) return outlet;
    const { xM, yM } = outletPlacementAt(room, end, metresPerPixel);
    return xM === outlet.xM && yM === outlet.yM ? outlet : { ...outlet, xM, yM };
  });
  return { ...room, extraOutlets };
}

/** The room with every outlet placed at its duct end, when it has one on the plan. */
export function withOutletAtItsEnd(doc: PlanDocument, room: PlanRoom, metresPerPixel: number): PlanRoom {
  const end = outletEnd(doc, room);
  return withExtraOutletsAtTheirEnds(doc, end ? withOutletAt(room, end, metresPerPixel) : room, metresPerPixel);
}

/** Whether any outlet of the room is fed from the end (from any end, without one). */
export function fedFrom(room: PlanRoom, nodeId?: string): boolean {
  const fed = (candidate: string | null) => candidate !== null && (nodeId === undefined || candidate === nodeId);
  return fed(room.outlet.nodeId) || (room.extraOutlets ?? []).some((outlet) => fed(outlet.nodeId));
}

/** Every room fed from the given end (or from any end, without one) with its outlets placed at their ends. */
export function placeOutletsAtEnds(doc: PlanDocument, metresPerPixel: number, nodeId?: string): PlanDocument {
  const follows = (room: PlanRoom) => fedFrom(room, nodeId);
  if (!doc.rooms.some(follows)) return doc;
  return { ...doc, rooms: doc.rooms.map((room) => (follows(room) ? withOutletAtItsEnd(doc, room, metresPerPixel) : room)) };
}

/** How the room's stored outlet stands against its duct end. */
export function outletLink(doc: PlanDocument, room: PlanRoom, metresPerPixel: number): OutletLink {
  return outletLinkTo(room, outletEnd(doc, room), metresPerPixel);
}

/** How the room's outlet stands against a duct end at the plan point (none: the room has no end). */
export function outletLinkTo(room: PlanRoom, endPoint: Point | undefined, metresPerPixel: number): OutletLink {
  return outletPointLink(room, room.outlet, endPoint, metresPerPixel);
}

/** How an outlet of the room at the given place stands against a duct end at the plan point (any of its outlets). */
export function outletPointLink(room: PlanRoom, outlet: { xM: number; yM: number }, endPoint: Point | undefined, metresPerPixel: number): OutletLink {
  if (!endPoint) return { kind: 'unlinked' };
  const end = { x: endPoint.x, y: endPoint.y };
  const placement = outletPlacementAt(room, end, metresPerPixel);
  const atPlacement = Math.hypot(outlet.xM - placement.xM, outlet.yM - placement.yM) < OUTLET_AT_END_TOLERANCE_M;
  if (!atPlacement) return { kind: 'apart', end, apartM: distancePx(roomPointPx(room, outlet, metresPerPixel), end) * metresPerPixel };
  return placement.outsideByM > 0 ? { kind: 'end-outside', end, outsideByM: placement.outsideByM } : { kind: 'at-end', end };
}

/**
 * The outlet of the room was placed by hand: its duct end moves to it on the plan, and every other
 * room fed from that end follows. The document as it is when the room has no end on the plan.
 */
export function moveEndToOutlet(doc: PlanDocument, room: PlanRoom, metresPerPixel: number): PlanDocument {
  const node = outletEnd(doc, room);
  if (!node) return doc;
  const to = roomPointPx(room, room.outlet, metresPerPixel);
  if (distancePx(node, to) * metresPerPixel < OUTLET_AT_END_TOLERANCE_M) return doc;
  const moved = { ...doc, nodes: doc.nodes.map((candidate) => (candidate.id === node.id ? { ...candidate, x: to.x, y: to.y } : candidate)) };
  return placeOutletsAtEnds(moved, metresPerPixel, node.id);
}
