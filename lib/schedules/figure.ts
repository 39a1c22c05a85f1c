// The schedule's plan figure as plain data: the drawing (or a blank sheet around what is drawn),
// every segment with its stable label and duct size, the run names, room outlines and names,
// outlets, listeners and each chosen treatment tagged where it goes, every word placed clear of the
// lines (label-place.ts).
import { nodePositions, type PlanDocument } from '@/lib/plan/document';
import { drawnArea } from '@/lib/plan/drawn-area';
import { planLabels, type PlanLabels } from '@/lib/plan/labels';
import { roomPointPx, roomRectPx } from '@/lib/plan/rooms/room-input';
import { roomListeners, roomOutlets } from '@/lib/plan/rooms/room-places';
import type { RevisionView } from '@/lib/revisions/types';
import { describeSize } from './describe';
import type { ScheduleLinesDrawing } from './drawing-paths';
import { boxEdges, placeBox, type Box, type LineSegment, type Obstacles } from './label-place';

export interface ScheduleImage { data: Buffer; format: 'png' | 'jpg' }
/** The plan's drawing for print: an image, or a DXF's paths. */
export type ScheduleDrawing = ScheduleImage | ScheduleLinesDrawing;
export interface ScheduleLine extends LineSegment { segmentId: string; treated: boolean }
export interface ScheduleRoomOutline { x: number; y: number; widthPx: number; heightPx: number; name: string }
export type FigureLabelKind = 'run' | 'segment' | 'room' | 'outlet' | 'listener' | 'treatment';
export interface FigureLabel { x: number; y: number; widthPx: number; heightPx: number; text: string; kind: FigureLabelKind }
export interface FigureMark { x: number; y: number; kind: 'start' | 'outlet' | 'listener' }
export interface FigureTreatment { tag: string; description: string; where: string; drawn: boolean }
export interface ScheduleFigure {
  metresPerPixel: number; widthPx: number; heightPx: number; originX: number; originY: number;
  /** Points per plan pixel on the page. */
  scale: number;
  image: ScheduleDrawing | null;
  /** The plan has a drawing, but it could not be decoded for printing (one stored before drawings were bounded). */
  drawingLeftOut: boolean;
  lines: ScheduleLine[]; rooms: ScheduleRoomOutline[]; marks: FigureMark[]; labels: FigureLabel[]; treatments: FigureTreatment[];
}

const FIGURE_MARGIN_PX = 60;
export const FIGURE_WIDTH_PT = 499;
export const FIGURE_MAX_HEIGHT_PT = 440;
/** Font size of each kind of word on the figure, pt. */
export const LABEL_FONT_PT: Record<FigureLabelKind, number> = { run: 7, segment: 6.5, room: 7, outlet: 6, listener: 6, treatment: 6.5 };
// Average advance of IBM Plex Sans, em per character, with a little room to spare (measured by eye; common practice, no source).
const CHARACTER_EM = 0.58;
const LABEL_PADDING_PT = 3;
const GAP_PT = 3;

type Sheet = Pick<ScheduleFigure, 'widthPx' | 'heightPx' | 'originX' | 'originY'>;

/** The drawing's own sheet, or a blank one around the drawn runs and rooms with a margin (from the plan's origin, at least 400 × 300 px). */
function sheetOf(revision: Pick<RevisionView, 'document' | 'metresPerPixel' | 'background'>, usesDrawing: boolean): Sheet {
  if (usesDrawing && revision.background?.widthPx && revision.background.heightPx) {
    return { widthPx: revision.background.widthPx, heightPx: revision.background.heightPx, originX: 0, originY: 0 };
  }
  const drawn = drawnArea(revision.document, revision.metresPerPixel) ?? { x: 0, y: 0, widthPx: 0, heightPx: 0 };
  const minX = Math.min(drawn.x, 0) - FIGURE_MARGIN_PX;
  const minY = Math.min(drawn.y, 0) - FIGURE_MARGIN_PX;
  const maxX = Math.max(drawn.x + drawn.widthPx, 400) + FIGURE_MARGIN_PX;
  const maxY = Math.max(drawn.y + drawn.heightPx, 300) + FIGURE_MARGIN_PX;
  return { widthPx: maxX - minX, heightPx: maxY - minY, originX: minX, originY: minY };
}

/** Where each chosen treatment goes: the segment or end its change names; a side branch has no drawn change. */
function treatmentPlaces(doc: PlanDocument, labels: PlanLabels): { tag: string; description: string; segmentId: string | null; nodeId: string | null; where: string }[] {
  return (doc.treatments ?? []).map((treatment, index) => {
    const change = treatment.planChange;
    const segmentId = change && change.kind !== 'termination' ? change.segmentId : null;
    const nodeId = change?.kind === 'termination' ? change.nodeId : null;
    const where = segmentId ? labels.segments[segmentId] ?? '' : nodeId ? labels.nodes[nodeId] ?? '' : 'to be placed by hand (not drawn)';
    return { tag: `T${index + 1}`, description: treatment.description, segmentId, nodeId, where };
  });
}

export function planFigure(revision: Pick<RevisionView, 'document' | 'metresPerPixel' | 'background' | 'extras'>, image: ScheduleDrawing | null): ScheduleFigure {
  const doc = revision.document;
  const mpp = revision.metresPerPixel;
  const labels = revision.extras.labels ?? planLabels(doc);
  const usesDrawing = Boolean(image && revision.background?.widthPx && revision.background.heightPx);
  const sheet = sheetOf(revision, usesDrawing);
  const scale = Math.min(FIGURE_WIDTH_PT / sheet.widthPx, FIGURE_MAX_HEIGHT_PT / sheet.heightPx);
  const positions = nodePositions(doc);
  const places = treatmentPlaces(doc, labels);
  const treatedSegments = new Set(places.flatMap((place) => (place.segmentId ? [place.segmentId] : [])));
  const lines: ScheduleLine[] = doc.segments.flatMap((segment) => {
    const from = positions.get(segment.from);
    const to = positions.get(segment.to);
    return from && to ? [{ x1: from.x, y1: from.y, x2: to.x, y2: to.y, segmentId: segment.id, treated: treatedSegments.has(segment.id) }] : [];
  });
  const rooms = doc.rooms.map((room) => {
    const rect = roomRectPx(room, mpp);
    return { x: rect.x, y: rect.y, widthPx: rect.width, heightPx: rect.height, name: room.name };
  });
  const marks: FigureMark[] = [
    ...doc.runs.flatMap((run) => { const start = positions.get(run.startNodeId); return start ? [{ ...start, kind: 'start' as const }] : []; }),
    ...doc.rooms.flatMap((room) => roomOutlets(room).map((outlet) => {
      const end = outlet.nodeId ? positions.get(outlet.nodeId) : undefined;
      return { ...(end ?? roomPointPx(room, outlet, mpp)), kind: 'outlet' as const };
    })),
    ...doc.rooms.flatMap((room) => roomListeners(room).map((listener) => ({ ...roomPointPx(room, listener, mpp), kind: 'listener' as const }))),
  ];

  // Words: each a box in plan pixels, placed clear of the duct lines, room walls, marks and words placed before it.
  const px = (pt: number) => pt / scale;
  const obstacles: Obstacles = {
    lines: [...lines, ...rooms.flatMap((room) => boxEdges({ x: room.x, y: room.y, widthPx: room.widthPx, heightPx: room.heightPx }))],
    boxes: marks.map((mark) => ({ x: mark.x - px(3), y: mark.y - px(3), widthPx: px(6), heightPx: px(6) })),
    bounds: { x: sheet.originX, y: sheet.originY, widthPx: sheet.widthPx, heightPx: sheet.heightPx },
  };
  const placed: FigureLabel[] = [];
  const size = (text: string, kind: FigureLabelKind) => ({ widthPx: px(text.length * LABEL_FONT_PT[kind] * CHARACTER_EM + LABEL_PADDING_PT), heightPx: px(LABEL_FONT_PT[kind] * 1.3) });
  /** Boxes around a point: right, left, above, below (then the diagonals), GAP_PT clear of it. */
  const around = (x: number, y: number, text: string, kind: FigureLabelKind): Box[] => {
    const { widthPx, heightPx } = size(text, kind);
    const gap = px(GAP_PT + 2);
    return [
      { x: x + gap, y: y - heightPx / 2, widthPx, heightPx }, { x: x - gap - widthPx, y: y - heightPx / 2, widthPx, heightPx },
      { x: x - widthPx / 2, y: y - gap - heightPx, widthPx, heightPx }, { x: x - widthPx / 2, y: y + gap, widthPx, heightPx },
      { x: x + gap, y: y - gap - heightPx, widthPx, heightPx }, { x: x + gap, y: y + gap, widthPx, heightPx },
      { x: x - gap - widthPx, y: y - gap - heightPx, widthPx, heightPx }, { x: x - gap - widthPx, y: y + gap, widthPx, heightPx },
    ];
  };
  const place = (text: string, kind: FigureLabelKind, candidates: Box[]) => placed.push({ ...placeBox(candidates, obstacles), text, kind });

  for (const run of doc.runs) {
    const start = positions.get(run.startNodeId);
    if (start) {
      const text = `${run.name} (${labels.runs[run.id] ?? ''})`;
      place(text, 'run', around(start.x, start.y, text, 'run'));
    }
  }
  for (const place of places) {
    const line = place.segmentId ? lines.find((candidate) => candidate.segmentId === place.segmentId) : undefined;
    const node = place.nodeId ? positions.get(place.nodeId) : undefined;
    const at = line ? { x: (line.x1 + line.x2) / 2, y: (line.y1 + line.y2) / 2 } : node;
    if (at) placed.push({ ...placeBox(around(at.x, at.y, place.tag, 'treatment'), obstacles), text: place.tag, kind: 'treatment' });
  }
  for (const line of lines) {
    const segment = doc.segments.find((candidate) => candidate.id === line.segmentId)!;
    const text = `${labels.segments[segment.id] ?? ''} ${describeSize(segment.section)}`.trim();
    const along = [0.5, 0.3, 0.7].map((t) => ({ x: line.x1 + t * (line.x2 - line.x1), y: line.y1 + t * (line.y2 - line.y1) }));
    place(text, 'segment', along.flatMap((point) => around(point.x, point.y, text, 'segment').slice(0, 4)));
  }
  for (const room of doc.rooms) {
    const rect = roomRectPx(room, mpp);
    const { widthPx, heightPx } = size(room.name, 'room');
    const inset = px(GAP_PT + 1);
    const right = rect.x + rect.width - inset - widthPx;
    const bottom = rect.y + rect.height - inset - heightPx;
    place(room.name, 'room', [
      { x: rect.x + inset, y: bottom, widthPx, heightPx }, { x: right, y: bottom, widthPx, heightPx },
      { x: rect.x + inset, y: rect.y + inset, widthPx, heightPx }, { x: right, y: rect.y + inset, widthPx, heightPx },
      { x: rect.x + (rect.width - widthPx) / 2, y: bottom, widthPx, heightPx }, { x: rect.x + (rect.width - widthPx) / 2, y: rect.y + inset, widthPx, heightPx },
      { x: rect.x, y: rect.y + rect.height + inset, widthPx, heightPx }, { x: rect.x, y: rect.y - inset - heightPx, widthPx, heightPx },
    ]);
    for (const outlet of roomOutlets(room)) {
      const at = (outlet.nodeId ? positions.get(outlet.nodeId) : undefined) ?? roomPointPx(room, outlet, mpp);
      const text = outlet.nodeId ? `outlet ${labels.nodes[outlet.nodeId] ?? ''}`.trim() : 'outlet (no duct end)';
      place(text, 'outlet', around(at.x, at.y, text, 'outlet'));
    }
    for (const listener of roomListeners(room)) {
      const at = roomPointPx(room, listener, mpp);
      place(listener.name, 'listener', around(at.x, at.y, listener.name, 'listener'));
    }
  }
  return {
    metresPerPixel: mpp, ...sheet, scale, image: usesDrawing ? image : null, drawingLeftOut: revision.background !== null && !usesDrawing,
    lines, rooms, marks, labels: placed,
    treatments: places.map((place) => ({ tag: place.tag, description: place.description, where: place.where, drawn: place.segmentId !== null || place.nodeId !== null })),
  };
}
