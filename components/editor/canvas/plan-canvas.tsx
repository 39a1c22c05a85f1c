'use client';

import type Konva from 'konva';
import { Fragment, useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Circle, Image as KonvaImage, Layer, Line, Rect, Stage, Text } from 'react-konva';
import type { Resonance } from '@/lib/acoustic';
import { nodePositions, type PlanDocument } from '@/lib/plan/document';
import { planLabels } from '@/lib/plan/labels';
import { withOutletAtItsEnd } from '@/lib/plan/rooms/outlet-link';
import type { Selection } from '@/lib/plan/editor-state';
import type { Point } from '@/lib/plan/geometry';
import type { MainPathPiece } from '@/lib/plan/to-run-input';
import { DxfLines } from './dxf-lines';
import { GridShape } from './grid-shape';
import type { PlanBackground } from './plan-background';
import { useDxfDrawing } from './use-dxf-drawing';
import { ModeOverlay } from './mode-overlay';
import { RoomShape } from './room-shape';
import { NodeDot } from './node-dot';
import { DraggedEndOutlets, OutletLinkShape, roomOutletMarks } from './outlet-link-shape';
import { SegmentLine } from './segment-line';
import { PlaceHighlight, type PlanPlace } from './place-highlight';
import { endNamePlace, END_NAME_FONT_PX } from './end-word-place';
import { TerminationGlyph } from './termination-glyph';
import { segmentWords, wordObstacle } from './segment-words';
import type { DuctLine } from './box-clear';
import { formatLength, type UnitSystem } from '@/lib/plan/units';
import type { Section } from '@/lib/plan/document';
import { useRoomDrag } from './use-room-drag';
import { GRID_AREA_PX, openingArea } from './opening-area';
import { fitView, screenToPlan, viewAfterResize, zoomAt, type View } from './view';

/** Screen distance from a run end to its label, px. */

export interface CanvasTarget { nodeId?: string; segmentId?: string; roomId?: string }
export interface CanvasPointer { type: 'down' | 'move' | 'dblclick'; point: Point; target: CanvasTarget; shiftKey: boolean; scale: number }

export interface PlanCanvasProps {
  document: PlanDocument;
  widthPx: number;
  heightPx: number;
  background: PlanBackground | null;
  /** The drawing grid: step and origin, plan pixels. */
  grid: { spacingPx: number; origin: Point | null };
  metresPerPixel: number;
  /** Sizes on the drawing in these units (SI when absent). */
  unitSystem?: UnitSystem;
  selection: Selection;
  editable: boolean;
  panning: boolean;
  mainPath: readonly MainPathPiece[];
  mode: { resonance: Resonance; speedOfSoundMps: number } | null;
  preview: { from: Point; to: Point } | null;
  /** The room being drawn with the Room tool: two opposite corners. */
  roomPreview?: { from: Point; to: Point } | null;
  selectedRoomId?: string | null;
  flaggedRoomIds?: ReadonlySet<string>;
  calibration: readonly Point[];
  onPointer: (pointer: CanvasPointer) => void;
  onNodeDrag: (nodeId: string, point: Point, phase: 'move' | 'end') => void;
  /** A room dragged with the select tool: its top-left corner where it was let go, plan pixels (not snapped). */
  onRoomDrag?: (roomId: string, corner: Point) => void;
  /** Where the noise-path element under the pointer came from, highlighted on the plan. */
  highlight?: PlanPlace | null;
  // Told whenever the view pans or zooms, so HTML overlays (comment pins) can follow the plan.
  onViewChange?: (view: View) => void;
}

const ZOOM_STEP = 1.15;
/** Thinnest a duct is drawn, screen px, however far out the view is zoomed. */
const MIN_DUCT_SCREEN_PX = 2;

/** Across the duct on the plan: a round duct's diameter, a rectangular one's width. */
function planWidthM(section: Section): number {
  return section.shape === 'round' ? section.diameterM : section.widthM;
}

function sectionWords(section: Section, system: UnitSystem): string {
  const size = (metres: number) => formatLength(metres, system, 'section');
  return section.shape === 'round' ? `Ø ${size(section.diameterM)}` : `${size(section.widthM).replace(/ (mm|in)$/, '')} × ${size(section.heightM)}`;
}
const ignoreRoomDrag = () => {};

function targetOf(event: Konva.KonvaEventObject<MouseEvent>): CanvasTarget {
  const id = event.target.id();
  if (id.startsWith('node:')) return { nodeId: id.slice(5) };
  if (id.startsWith('segment:')) return { segmentId: id.slice(8) };
  if (id.startsWith('room:')) return { roomId: id.slice(5) };
  return {};
}

function useImage(url: string | null): HTMLImageElement | null {
  const [image, setImage] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    if (!url) { setImage(null); return; }
    const element = new window.Image();
    element.onload = () => setImage(element);
    element.src = url;
    return () => { element.onload = null; };
  }, [url]);
  return image;
}

export default function PlanCanvas(props: PlanCanvasProps) {
  const { document: doc, widthPx, heightPx, background, selection, editable } = props;
  const contentWidth = background?.widthPx ?? GRID_AREA_PX.widthPx;
  const contentHeight = background?.heightPx ?? GRID_AREA_PX.heightPx;
  const fitFor = (area: ReturnType<typeof openingArea>, width: number, height: number) => fitView(area.widthPx, area.heightPx, width, height, area.x, area.y);
  const [view, setView] = useState<View>(() => fitFor(openingArea(doc, props.metresPerPixel, background), widthPx, heightPx));
  // What the view was last fitted to (the drawing, or the drawn area when the plan opened), the
  // viewport size it was last laid out for, and whether the person has panned or zoomed since
  // the fit (then a resize keeps the centre instead).
  const fitted = useRef({ key: '', area: openingArea(doc, props.metresPerPixel, background), widthPx, heightPx, movedSinceFit: false });
  const image = useImage(background?.kind === 'image' ? background.url : null);
  const dxf = useDxfDrawing(background?.kind === 'dxf' ? background.url : null);
  // A vertex being dragged: it and the segments touching it are drawn on their own layer, so
  // each move redraws a handful of shapes instead of the whole plan.
  const [drag, setDrag] = useState<{ nodeId: string; x: number; y: number; moved: boolean } | null>(null);
  const roomDrag = useRoomDrag(props.onRoomDrag ?? ignoreRoomDrag);
  const draggedRoomId = roomDrag.drag?.roomId ?? null;

  useEffect(() => {
    if (widthPx <= 0 || heightPx <= 0) return;
    const key = background?.url ?? 'grid';
    const last = fitted.current;
    if (last.key === key && last.widthPx === widthPx && last.heightPx === heightPx) return;
    const to = { widthPx, heightPx };
    if (last.key !== key) {
      const area = openingArea(doc, props.metresPerPixel, background);
      fitted.current = { key, area, ...to, movedSinceFit: false };
      setView(fitFor(area, widthPx, heightPx));
      return;
    }
    const resize = { content: last.area, from: { widthPx: last.widthPx, heightPx: last.heightPx }, to, movedSinceFit: last.movedSinceFit };
    fitted.current = { ...last, ...to };
    setView((current) => viewAfterResize(current, resize));
    // Fitted when the drawing changes or the viewport resizes, not as the plan is edited.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [background?.url, widthPx, heightPx]);

  const { onViewChange } = props;
  useEffect(() => { onViewChange?.(view); }, [view, onViewChange]);

  const positions = useMemo(() => nodePositions(doc), [doc]);
  const outletMarks = useMemo(() => new Map(doc.rooms.map((room) => [room.id, roomOutletMarks(doc, room, props.metresPerPixel, positions)])), [doc, props.metresPerPixel, positions]);
  const dragNodeId = drag?.nodeId ?? null;
  const activeSegmentIds = useMemo(() => new Set(dragNodeId ? doc.segments.filter((segment) => segment.from === dragNodeId || segment.to === dragNodeId).map((segment) => segment.id) : []), [doc.segments, dragNodeId]);
  const selectedNodes = useMemo(() => new Set(selection.nodeIds), [selection.nodeIds]);
  const selectedSegments = useMemo(() => new Set(selection.segmentIds), [selection.segmentIds]);
  const onPath = useMemo(() => new Set(props.mainPath.map((piece) => piece.segmentId)), [props.mainPath]);
  const startNodes = useMemo(() => new Set(doc.runs.map((run) => run.startNodeId)), [doc.runs]);
  const labels = useMemo(() => planLabels(doc), [doc]);

  // Drawn to scale: the duct's width on the plan, in screen pixels.
  const sectionWidthPx = useCallback((sizeM: number) => Math.max(MIN_DUCT_SCREEN_PX, (sizeM / props.metresPerPixel) * view.scale), [props.metresPerPixel, view.scale]);
  const unitSystem = props.unitSystem ?? 'si';

  const segmentLine = useCallback((segment: PlanDocument['segments'][number], at: ReadonlyMap<string, { x: number; y: number }>) => {
    const from = at.get(segment.from);
    const to = at.get(segment.to);
    if (!from || !to) return null;
    return (
      <SegmentLine key={segment.id} id={segment.id} x1={from.x} y1={from.y} x2={to.x} y2={to.y} widthPx={sectionWidthPx(planWidthM(segment.section))}
        selected={selectedSegments.has(segment.id)} onPath={onPath.has(segment.id)} lined={Boolean(segment.lining)} scale={view.scale} label={labels.segments[segment.id]}
        size={sectionWords(segment.section, unitSystem)} />
    );
  }, [sectionWidthPx, selectedSegments, onPath, view.scale, labels, unitSystem]);

  // Everything that stays still during a drag, built once per document, selection or zoom.
  const staticShapes = useMemo(() => {
    const glyphs: ReactNode[] = [];
    // the ducts and their words, as obstacles for the words at the ends
    const ducts = doc.segments.flatMap((segment) => {
      const from = positions.get(segment.from);
      const to = positions.get(segment.to);
      if (!from || !to) return [];
      const widthPx = sectionWidthPx(planWidthM(segment.section));
      const words = segmentWords(from.x, from.y, to.x, to.y, widthPx, view.scale, labels.segments[segment.id], sectionWords(segment.section, unitSystem));
      const wordLines = [words.label, words.size].flatMap((box) => (box ? [wordObstacle(box, view.scale)] : []));
      return [{ id: segment.id, line: { x1: from.x, y1: from.y, x2: to.x, y2: to.y, halfWidth: widthPx / 2 / view.scale } satisfies DuctLine, wordLines }];
    });
    for (const run of doc.runs) {
      for (const [nodeId, termination] of Object.entries(run.terminations)) {
        const node = positions.get(nodeId);
        const segment = doc.segments.find((candidate) => candidate.from === nodeId || candidate.to === nodeId);
        const other = segment && positions.get(segment.from === nodeId ? segment.to : segment.from);
        if (!node || !other || nodeId === dragNodeId) continue;
        const angleRad = Math.atan2(node.y - other.y, node.x - other.x);
        const halfWidthPx = sectionWidthPx(planWidthM(segment.section)) / 2;
        const endLabel = labels.nodes[nodeId];
        const namePlace = endLabel ? endNamePlace(node, angleRad, endLabel.length, view.scale, halfWidthPx) : null;
        const belowName = namePlace && endLabel
          ? { x: namePlace.x, y: namePlace.y + (END_NAME_FONT_PX * 1.3) / view.scale, centreX: namePlace.x + (endLabel.length * END_NAME_FONT_PX * 0.6) / 2 / view.scale }
          : null;
        glyphs.push(<TerminationGlyph key={`t${nodeId}`} x={node.x} y={node.y} angleRad={angleRad} termination={termination} scale={view.scale}
          ductHalfWidthPx={halfWidthPx} otherDucts={ducts.flatMap((duct) => (duct.id === segment.id ? duct.wordLines : [duct.line, ...duct.wordLines]))} belowName={belowName} />);
        if (endLabel) {
          // beyond the end, along the segment's direction
          const place = namePlace!;
          glyphs.push(<Text key={`l${nodeId}`} x={place.x} y={place.y} text={endLabel} fontSize={END_NAME_FONT_PX / view.scale}
            fontFamily="IBM Plex Mono, monospace" fill="#5d626b" listening={false} name="end-label" />);
        }
      }
    }
    return (
      <>
        {doc.segments.map((segment) => (activeSegmentIds.has(segment.id) ? null : segmentLine(segment, positions)))}
        {glyphs}
        {doc.nodes.map((node) => (node.id === dragNodeId ? null : (
          <NodeDot key={node.id} id={node.id} x={node.x} y={node.y} selected={selectedNodes.has(node.id)} isStart={startNodes.has(node.id)} scale={view.scale} />
        )))}
      </>
    );
  }, [doc, positions, activeSegmentIds, dragNodeId, segmentLine, selectedNodes, startNodes, view.scale, labels, sectionWidthPx, unitSystem]);

  const toPlan = (stage: Konva.Stage | null): Point | null => {
    const pointer = stage?.getPointerPosition();
    return pointer ? screenToPlan(view, pointer) : null;
  };

  const finishDrag = useCallback(() => {
    setDrag((current) => {
      if (current?.moved) props.onNodeDrag(current.nodeId, { x: current.x, y: current.y }, 'end');
      return null;
    });
  }, [props.onNodeDrag]); // eslint-disable-line react-hooks/exhaustive-deps

  useEffect(() => {
    if (!drag) return;
    window.addEventListener('mouseup', finishDrag);
    return () => window.removeEventListener('mouseup', finishDrag);
  }, [drag, finishDrag]);

  const emit = (type: CanvasPointer['type']) => (event: Konva.KonvaEventObject<MouseEvent>) => {
    if (props.panning || event.evt.button === 1) return;
    const point = toPlan(event.target.getStage());
    if (!point) return;
    const target = targetOf(event);
    if (type === 'move' && drag) {
      setDrag({ ...drag, x: point.x, y: point.y, moved: true });
      return;
    }
    if (type === 'move' && roomDrag.drag) {
      roomDrag.moveTo(point, view.scale);
      return;
    }
    if (type === 'down' && editable && target.nodeId && !event.evt.shiftKey) {
      const node = positions.get(target.nodeId);
      if (node) setDrag({ nodeId: target.nodeId, x: node.x, y: node.y, moved: false });
    }
    if (type === 'down' && editable && props.onRoomDrag && target.roomId && !event.evt.shiftKey) {
      const room = doc.rooms.find((candidate) => candidate.id === target.roomId);
      if (room) roomDrag.grab(room.id, { x: room.x, y: room.y }, point);
    }
    props.onPointer({ type, point, target, shiftKey: event.evt.shiftKey, scale: view.scale });
  };

  const onWheel = (event: Konva.KonvaEventObject<WheelEvent>) => {
    event.evt.preventDefault();
    const pointer = event.target.getStage()?.getPointerPosition();
    if (!pointer) return;
    fitted.current.movedSinceFit = true;
    setView((current) => zoomAt(current, pointer, event.evt.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP));
  };

  const dragPositions = useMemo(() => {
    if (!drag) return positions;
    const moved = new Map(positions);
    moved.set(drag.nodeId, { id: drag.nodeId, x: drag.x, y: drag.y });
    return moved;
  }, [positions, drag]);

  const draggedRoom = draggedRoomId ? doc.rooms.find((room) => room.id === draggedRoomId) ?? null : null;
  // A room being dragged keeps its outlet at the duct end that feeds it, as move-room will.
  const movedRoom = draggedRoom && roomDrag.drag ? withOutletAtItsEnd(doc, { ...draggedRoom, x: roomDrag.drag.corner.x, y: roomDrag.drag.corner.y }, props.metresPerPixel) : null;

  return (
    <Stage
      width={widthPx}
      height={heightPx}
      x={view.offsetX}
      y={view.offsetY}
      scaleX={view.scale}
      scaleY={view.scale}
      draggable={props.panning}
      onDragEnd={(event) => {
        if (event.target !== event.target.getStage()) return;
        fitted.current.movedSinceFit = true;
        setView((current) => ({ ...current, offsetX: event.target.x(), offsetY: event.target.y() }));
      }}
      onWheel={onWheel}
      onMouseDown={emit('down')}
      onMouseMove={emit('move')}
      onDblClick={emit('dblclick')}
      style={{ cursor: props.panning ? 'grab' : drag || roomDrag.drag ? 'grabbing' : 'crosshair' }}
    >
      <Layer listening={false}>
        <Rect x={0} y={0} width={contentWidth} height={contentHeight} fill="#ffffff" />
        {image && <KonvaImage image={image} x={0} y={0} width={contentWidth} height={contentHeight} opacity={0.85} />}
        <GridShape widthPx={contentWidth} heightPx={contentHeight} spacingPx={props.grid.spacingPx} origin={props.grid.origin} scale={view.scale} />
        {/* over the grid: a DXF's lines are thin and would vanish under a grid line they lie on */}
        {dxf.drawing && <DxfLines drawing={dxf.drawing} hiddenLayers={background?.hiddenLayers} />}
      </Layer>
      <Layer>
        {doc.rooms.map((room) => (room.id === draggedRoomId ? null : (
          <Fragment key={room.id}>
            <RoomShape room={room} metresPerPixel={props.metresPerPixel} selected={props.selectedRoomId === room.id} flagged={props.flaggedRoomIds?.has(room.id) ?? false} scale={view.scale} />
            {(outletMarks.get(room.id) ?? []).filter((mark) => dragNodeId === null || mark.nodeId !== dragNodeId).map((mark) => <OutletLinkShape key={mark.key} mark={mark} scale={view.scale} />)}
          </Fragment>
        )))}
      </Layer>
      <Layer>{staticShapes}</Layer>
      <Layer>
        {movedRoom && (
          <>
            <RoomShape room={movedRoom} metresPerPixel={props.metresPerPixel} selected flagged={props.flaggedRoomIds?.has(movedRoom.id) ?? false} scale={view.scale} />
            {roomOutletMarks(doc, movedRoom, props.metresPerPixel, positions).map((mark) => <OutletLinkShape key={mark.key} mark={mark} scale={view.scale} />)}
          </>
        )}
        {drag && doc.segments.filter((segment) => activeSegmentIds.has(segment.id)).map((segment) => segmentLine(segment, dragPositions))}
        {drag && <DraggedEndOutlets doc={{ ...doc, rooms: doc.rooms.filter((room) => room.id !== draggedRoomId) }} end={drag} nodeId={drag.nodeId} metresPerPixel={props.metresPerPixel} scale={view.scale} />}
        {drag && <NodeDot id={drag.nodeId} x={drag.x} y={drag.y} selected isStart={startNodes.has(drag.nodeId)} scale={view.scale} />}
        {props.highlight && <PlaceHighlight place={props.highlight} document={doc} scale={view.scale} />}
        {props.mode && !drag && <ModeOverlay resonance={props.mode.resonance} speedOfSoundMps={props.mode.speedOfSoundMps} path={props.mainPath} nodes={positions} scale={view.scale} />}
        {props.preview && (
          <Line points={[props.preview.from.x, props.preview.from.y, props.preview.to.x, props.preview.to.y]} stroke="#2d6a96" strokeWidth={2 / view.scale} dash={[6 / view.scale, 4 / view.scale]} listening={false} />
        )}
        {props.roomPreview && (
          <Rect x={Math.min(props.roomPreview.from.x, props.roomPreview.to.x)} y={Math.min(props.roomPreview.from.y, props.roomPreview.to.y)}
            width={Math.abs(props.roomPreview.to.x - props.roomPreview.from.x)} height={Math.abs(props.roomPreview.to.y - props.roomPreview.from.y)}
            stroke="#2d6a96" strokeWidth={2 / view.scale} dash={[6 / view.scale, 4 / view.scale]} listening={false} />
        )}
        {props.calibration.map((point, index) => (
          <Circle key={`c${index}`} x={point.x} y={point.y} radius={5 / view.scale} stroke="#2d6a96" strokeWidth={2 / view.scale} listening={false} />
        ))}
        {props.calibration.length === 2 && (
          <Line points={[props.calibration[0].x, props.calibration[0].y, props.calibration[1].x, props.calibration[1].y]} stroke="#2d6a96" strokeWidth={2 / view.scale} listening={false} />
        )}
      </Layer>
    </Stage>
  );
}
export type { View } from './view';
