'use client';

// What a click on the canvas does with each tool. Edits go through lib/plan commands.
import { useCallback, useRef, useState, type Dispatch } from 'react';
import { findNode, findSegment, snapPoint, type NodeRef, type Point } from '@/lib/plan';
import type { CanvasPointer } from './canvas/plan-canvas';
import { runCommand, type EditorAction, type EditorModel } from './editor-model';
import { mayUseTool, type ToolName } from './tools';
import { gridStepM } from '@/lib/plan/units';
import type { UnitSystem } from '@/models/user';

const SNAP_RADIUS_SCREEN_PX = 10;
// Two clicks this close in time and place end a drawn chain (a double-click).
const DOUBLE_CLICK_MS = 400;
const DOUBLE_CLICK_SCREEN_PX = 5;
/** A room drawn with the Room tool starts this high, m (product default; change it in the form). */
const NEW_ROOM_HEIGHT_M = 3;

export interface ToolFeedback {
  /** The rubber band from the last point to the pointer (drawing, a tee's branch, the scale line). */
  preview: { from: Point; to: Point } | null;
  roomPreview: { from: Point; to: Point } | null;
  calibration: Point[];
}

/** The drawing grid: its step in plan pixels (a round step in the person's units) and where it starts. */
export interface PlanGrid {
  readonly spacingPx: number;
  readonly origin: Point | null;
}

export function planGrid(metresPerPixel: number, unitSystem: UnitSystem, origin: Point | undefined): PlanGrid {
  return { spacingPx: gridStepM(unitSystem) / metresPerPixel, origin: origin ?? null };
}

/** "Room N" with the lowest N not already taken. */
function nextRoomName(names: readonly string[]): string {
  let number = names.length + 1;
  while (names.includes(`Room ${number}`)) number += 1;
  return `Room ${number}`;
}

export function useCanvasTools(model: EditorModel, dispatch: Dispatch<EditorAction>, tool: ToolName, grid: PlanGrid, onCalibrated: (points: [Point, Point]) => void, onRoom: (roomId: string | null) => void = () => {}) {
  const [roomFrom, setRoomFrom] = useState<Point | null>(null);
  const [drawFrom, setDrawFrom] = useState<NodeRef | null>(null);
  const [teeAt, setTeeAt] = useState<{ segmentId: string; at: Point } | null>(null);
  const [pointer, setPointer] = useState<Point | null>(null);
  const [calibration, setCalibration] = useState<Point[]>([]);
  const lastDown = useRef<{ point: Point; atMs: number; scale: number } | null>(null);
  const doc = model.history.present;

  const anchorOf = useCallback((ref: NodeRef | null): Point | null => {
    if (!ref) return null;
    if ('point' in ref) return ref.point;
    const node = findNode(doc, ref.nodeId);
    return node ? { x: node.x, y: node.y } : null;
  }, [doc]);

  const snapped = useCallback((event: CanvasPointer, anchor: Point | null) => {
    if (event.target.nodeId) return { ref: { nodeId: event.target.nodeId } as NodeRef, point: anchorOf({ nodeId: event.target.nodeId })! };
    const result = snapPoint(event.point, {
      nodes: doc.nodes,
      nodeRadiusPx: SNAP_RADIUS_SCREEN_PX / event.scale,
      anchor,
      angleStepDeg: event.shiftKey ? null : 45,
      gridSpacingPx: event.shiftKey ? null : grid.spacingPx,
      gridOrigin: grid.origin,
    });
    const ref: NodeRef = result.target.kind === 'node' ? { nodeId: result.target.nodeId } : { point: result.point };
    return { ref, point: result.point };
  }, [doc.nodes, grid, anchorOf]);

  const cancel = useCallback(() => { setDrawFrom(null); setTeeAt(null); setCalibration([]); setRoomFrom(null); }, []);

  const onPointer = useCallback((event: CanvasPointer) => {
    if (!mayUseTool(tool, model.editable)) return;
    if (event.type === 'move') { setPointer(event.point); return; }
    if (event.type === 'dblclick') return;
    const previous = lastDown.current;
    const now = performance.now();
    lastDown.current = { point: event.point, atMs: now, scale: event.scale };
    const isDoubleClick = previous !== null && now - previous.atMs < DOUBLE_CLICK_MS
      && Math.hypot(event.point.x - previous.point.x, event.point.y - previous.point.y) * event.scale < DOUBLE_CLICK_SCREEN_PX;
    if (isDoubleClick && tool === 'draw') { setDrawFrom(null); lastDown.current = null; return; }
    switch (tool) {
      case 'select': {
        const { nodeIds, segmentIds } = model.state.selection;
        const toggle = (list: readonly string[], id: string) => (list.includes(id) ? list.filter((item) => item !== id) : [...list, id]);
        if (event.target.roomId && !event.shiftKey) {
          onRoom(event.target.roomId);
          dispatch({ type: 'set-state', state: { ...model.state, selection: { nodeIds: [], segmentIds: [] } } });
          return;
        }
        if (event.target.nodeId) {
          onRoom(null);
          const selection = event.shiftKey ? { nodeIds: toggle(nodeIds, event.target.nodeId), segmentIds } : { nodeIds: [event.target.nodeId], segmentIds: [] };
          dispatch({ type: 'set-state', state: { ...model.state, selection } });
        } else if (event.target.segmentId) {
          onRoom(null);
          const selection = event.shiftKey ? { nodeIds, segmentIds: toggle(segmentIds, event.target.segmentId) } : { nodeIds: [], segmentIds: [event.target.segmentId] };
          dispatch({ type: 'set-state', state: { ...model.state, selection } });
        } else if (!event.shiftKey) {
          dispatch({ type: 'set-state', state: { ...model.state, selection: { nodeIds: [], segmentIds: [] } } });
        }
        return;
      }
      case 'draw': {
        const target = snapped(event, anchorOf(drawFrom));
        if (!drawFrom) { setDrawFrom(target.ref); return; }
        const result = runCommand(model, dispatch, 'draw-segment', { from: drawFrom, to: target.ref });
        const drawn = result && findSegment(result.doc, result.state.selection.segmentIds[0] ?? '');
        // Keep drawing from the point just placed, unless the click joined an existing point.
        setDrawFrom(drawn && !('nodeId' in target.ref) ? { nodeId: drawn.to } : null);
        return;
      }
      case 'split':
        if (event.target.segmentId) runCommand(model, dispatch, 'split-segment', { segmentId: event.target.segmentId, at: event.point });
        return;
      case 'tee': {
        if (!teeAt) {
          if (event.target.segmentId) setTeeAt({ segmentId: event.target.segmentId, at: event.point });
          return;
        }
        const target = snapped(event, teeAt.at);
        runCommand(model, dispatch, 'add-tee', { segmentId: teeAt.segmentId, at: teeAt.at, to: target.ref });
        setTeeAt(null);
        return;
      }
      case 'room': {
        const corner = snapPoint(event.point, { nodes: [], nodeRadiusPx: 0, anchor: null, angleStepDeg: null, gridSpacingPx: event.shiftKey ? null : grid.spacingPx, gridOrigin: grid.origin }).point;
        if (!roomFrom) { setRoomFrom(corner); return; }
        const lengthM = Math.abs(corner.x - roomFrom.x) * model.metresPerPixel;
        const widthM = Math.abs(corner.y - roomFrom.y) * model.metresPerPixel;
        setRoomFrom(null);
        const result = runCommand(model, dispatch, 'add-room', {
          name: nextRoomName(doc.rooms.map((room) => room.name)), x: Math.min(corner.x, roomFrom.x), y: Math.min(corner.y, roomFrom.y), lengthM, widthM, heightM: NEW_ROOM_HEIGHT_M,
        });
        const added = result?.doc.rooms.at(-1);
        if (added) onRoom(added.id);
        return;
      }
      case 'scale': {
        const next = calibration.length >= 2 ? [event.point] : [...calibration, event.point];
        setCalibration(next);
        if (next.length === 2) onCalibrated([next[0], next[1]]);
        return;
      }
      case 'origin':
        // Onto a drawn point when near one, otherwise exactly where clicked (not onto the old grid).
        runCommand(model, dispatch, 'set-grid-origin', { origin: snapPoint(event.point, { nodes: doc.nodes, nodeRadiusPx: SNAP_RADIUS_SCREEN_PX / event.scale }).point });
        return;
      case 'pan':
        return;
    }
  }, [tool, model, dispatch, snapped, anchorOf, drawFrom, teeAt, calibration, onCalibrated, roomFrom, onRoom, doc.rooms, doc.nodes, grid]);

  // The rubber band from the last point to the (snapped) pointer.
  let preview: ToolFeedback['preview'] = null;
  const from = tool === 'draw' ? anchorOf(drawFrom) : tool === 'tee' && teeAt ? teeAt.at : null;
  if (from && pointer) {
    const to = snapPoint(pointer, { nodes: doc.nodes, nodeRadiusPx: 0, anchor: from, angleStepDeg: 45, gridSpacingPx: grid.spacingPx }).point;
    preview = { from, to };
  }
  // While calibrating: from the first point to the pointer, unsnapped (the scale line follows the drawing).
  if (tool === 'scale' && calibration.length === 1 && pointer) preview = { from: calibration[0], to: pointer };
  const roomPreview = tool === 'room' && roomFrom && pointer ? { from: roomFrom, to: pointer } : null;
  return { onPointer, cancel, feedback: { preview, roomPreview, calibration } as ToolFeedback, drawing: drawFrom !== null || teeAt !== null || roomFrom !== null, clearCalibration: () => setCalibration([]) };
}
