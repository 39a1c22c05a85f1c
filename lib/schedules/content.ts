// Everything a treatment schedule shows, gathered from a frozen revision as plain data, so the
// PDF pieces only lay it out.
import type { Termination } from '@/lib/acoustic';
import { nodePositions } from '@/lib/plan/document';
import { drawnArea } from '@/lib/plan/drawn-area';
import { planLabels, type PlanLabels } from '@/lib/plan/labels';
import { roomRectPx } from '@/lib/plan/rooms/room-input';
import type { RunResult } from '@/lib/plans/results';
import { resonanceTarget } from '@/lib/revisions/rows';
import { isAcceptedForIssue, revisionStateLabel } from '@/lib/revisions/states';
import type { RevisionView, RiskRow, RoomRow, TreatmentRow } from '@/lib/revisions/types';
import type { DecisionView } from '@/lib/reviews/data';
import { DECISION_LABELS } from '@/lib/reviews/decisions';
import { describeSection, describeTermination } from './describe';

export interface ScheduleLine { x1: number; y1: number; x2: number; y2: number }
export interface ScheduleRoomOutline { x: number; y: number; widthPx: number; heightPx: number; name: string }
export interface ScheduleFigure {
  metresPerPixel: number; widthPx: number; heightPx: number; originX: number; originY: number;
  image: { data: Buffer; format: 'png' | 'jpg' } | null;
  /** The plan has a drawing, but it could not be decoded for printing (one stored before drawings were bounded). */
  drawingLeftOut: boolean;
  lines: ScheduleLine[]; labels: { x: number; y: number; text: string }[]; rooms: ScheduleRoomOutline[];
}

export interface ScheduleRun {
  name: string;
  problem: string | null;
  temperatureC: number;
  fan: string;
  lengthM: number | null;
  cutoffHz: number | null;
  speedOfSoundMps: number | null;
  sections: { index: number; label: string; lengthM: number; section: string; lining: string }[];
  terminations: { where: string; kind: string }[];
  resonances: { order: number; frequencyHz: number; q: number | null; bandwidthHz: number | null; fanTone: string; review: string }[];
  // Resonances of the revision left out of the printed table (above the lowest orders, clear
  // of fan tones and not flagged): how many and their range.
  omitted: { count: number; fromHz: number; toHz: number } | null;
  reflections: { atM: number; kind: string; magnitude: string }[];
  warnings: string[];
}

export interface ScheduleContent {
  projectName: string;
  planName: string;
  revisionNumber: number;
  dateText: string;
  preparedBy: string;
  reviewedBy: string;
  stateLabel: string;
  draft: boolean;
  issuedBy: string | null;
  figure: ScheduleFigure;
  runs: ScheduleRun[];
  risks: readonly RiskRow[];
  treatments: readonly TreatmentRow[];
  rooms: readonly RoomRow[];
  temperaturesC: number[];
}

const FIGURE_MARGIN_PX = 60;
// The printed table keeps the lowest orders, where duct rumble lives, and every row that
// matters beyond them (near a fan tone, or flagged); the revision holds the full list.
export const PRINTED_LOWEST_ORDERS = 12;

/** The plan figure: the drawing (or a blank sheet around what is drawn), run lines and names, room outlines. */
export function planFigure(revision: Pick<RevisionView, 'document' | 'metresPerPixel' | 'background' | 'extras'>, image: ScheduleFigure['image']): ScheduleFigure {
  const doc = revision.document;
  const positions = nodePositions(doc);
  const lines = doc.segments.flatMap((segment) => {
    const from = positions.get(segment.from);
    const to = positions.get(segment.to);
    return from && to ? [{ x1: from.x, y1: from.y, x2: to.x, y2: to.y }] : [];
  });
  const names = labelsOf(revision);
  const segmentLabels = doc.segments.flatMap((segment) => {
    const from = positions.get(segment.from);
    const to = positions.get(segment.to);
    const text = names.segments[segment.id];
    return from && to && text ? [{ x: (from.x + to.x) / 2, y: (from.y + to.y) / 2, text }] : [];
  });
  const labels = [...doc.runs.flatMap((run) => {
    const start = positions.get(run.startNodeId);
    return start ? [{ x: start.x, y: start.y, text: `${run.name} (${names.runs[run.id] ?? ''})` }] : [];
  }), ...segmentLabels];
  const rooms = doc.rooms.map((room) => {
    const rect = roomRectPx(room, revision.metresPerPixel);
    return { x: rect.x, y: rect.y, widthPx: rect.width, heightPx: rect.height, name: room.name };
  });
  if (image && revision.background?.widthPx && revision.background.heightPx) {
    return { metresPerPixel: revision.metresPerPixel, widthPx: revision.background.widthPx, heightPx: revision.background.heightPx, originX: 0, originY: 0, image, drawingLeftOut: false, lines, labels, rooms };
  }
  // A blank sheet: the drawn runs and rooms with a margin (from the plan's origin, at least 400 × 300 px).
  const drawn = drawnArea(doc, revision.metresPerPixel) ?? { x: 0, y: 0, widthPx: 0, heightPx: 0 };
  const minX = Math.min(drawn.x, 0) - FIGURE_MARGIN_PX;
  const minY = Math.min(drawn.y, 0) - FIGURE_MARGIN_PX;
  const maxX = Math.max(drawn.x + drawn.widthPx, 400) + FIGURE_MARGIN_PX;
  const maxY = Math.max(drawn.y + drawn.heightPx, 300) + FIGURE_MARGIN_PX;
  return { metresPerPixel: revision.metresPerPixel, widthPx: maxX - minX, heightPx: maxY - minY, originX: minX, originY: minY, image: null, drawingLeftOut: revision.background !== null, lines, labels, rooms };
}

/** The frozen plan's labels (revisions frozen before labels existed get the ones the editor gives). */
function labelsOf(revision: Pick<RevisionView, 'document' | 'extras'>): PlanLabels {
  return revision.extras.labels ?? planLabels(revision.document);
}

/** |R| with a minus sign when the reflection is inverted (phase beyond ±90°), as the editor's table shows it. */
function signedMagnitude(band: { magnitude: number; phaseRad: number }): string {
  return `${Math.abs(band.phaseRad) > Math.PI / 2 ? '−' : ''}${band.magnitude.toFixed(2)}`;
}

function magnitudeText(bands: readonly { hz: number; magnitude: number; phaseRad: number }[]): string {
  if (bands.length === 0) return '—';
  const low = bands[0];
  const high = bands[bands.length - 1];
  return `${signedMagnitude(low)} at ${low.hz.toFixed(0)} Hz · ${signedMagnitude(high)} at ${high.hz.toFixed(0)} Hz`;
}

function runOf(revision: RevisionView, result: RunResult, decisions: ReadonlyMap<string, DecisionView>): ScheduleRun {
  const run = revision.document.runs.find((candidate) => candidate.id === result.runId);
  const labels = labelsOf(revision);
  const segments = new Map(revision.document.segments.map((segment) => [segment.id, segment]));
  const analysis = result.analysis;
  const all = analysis?.resonances ?? [];
  const keep = (resonance: (typeof all)[number], index: number) => index < PRINTED_LOWEST_ORDERS
    || (result.nearFanTone[resonance.order] ?? null) !== null
    || decisions.get(resonanceTarget(result.runId, resonance.order))?.decision === 'query';
  const printed = all.filter(keep);
  const left = all.filter((resonance, index) => !keep(resonance, index));
  const terminations = Object.entries(run?.terminations ?? {}).map(([nodeId, termination]: [string, Termination]) => ({
    where: `${labels.nodes[nodeId] ?? ''} · ${nodeId === run?.startNodeId ? 'start (fan side)' : nodeId === (result.path.at(-1)?.toNodeId ?? run?.endNodeId) ? 'end of the main path' : 'branch end'}`,
    kind: describeTermination(termination),
  }));
  return {
    name: result.name,
    problem: result.problem,
    temperatureC: run?.temperatureC ?? 20,
    fan: run?.fan ? `${run.fan.blades} blades at ${run.fan.rpm} rpm` : 'No fan entered',
    lengthM: analysis?.lengthM ?? null,
    cutoffHz: analysis?.cutoffHz ?? null,
    speedOfSoundMps: analysis?.speedOfSoundMps ?? null,
    sections: result.path.map((piece, index) => {
      const segment = segments.get(piece.segmentId);
      return {
        index: index + 1, label: labels.segments[piece.segmentId] ?? String(index + 1), lengthM: piece.endM - piece.startM, section: segment ? describeSection(segment.section) : '—',
        lining: segment?.lining ? `${(segment.lining.thicknessM * 1000).toFixed(0)} mm, ${segment.lining.absorption === undefined ? 'fibrous liner by band' : `absorption ${segment.lining.absorption.toFixed(2)}`}` : 'none',
      };
    }),
    terminations,
    resonances: printed.map((resonance) => {
      const tone = result.nearFanTone[resonance.order] ?? null;
      const decision = decisions.get(resonanceTarget(result.runId, resonance.order));
      return {
        order: resonance.order, frequencyHz: resonance.frequencyHz, q: resonance.q, bandwidthHz: resonance.bandwidthHz,
        fanTone: tone === null ? 'clear' : `near ${tone.toFixed(0)} Hz`,
        review: decision ? `${DECISION_LABELS[decision.decision]}${decision.note ? `: ${decision.note}` : ''}` : 'not reviewed',
      };
    }),
    omitted: left.length === 0 ? null : { count: left.length, fromHz: left[0].frequencyHz, toHz: left[left.length - 1].frequencyHz },
    reflections: (analysis?.reflections ?? []).map((reflection) => ({ atM: reflection.atM, kind: reflection.kind, magnitude: magnitudeText(reflection.bands) })),
    warnings: analysis?.warnings ?? [],
  };
}

export function scheduleContent(input: {
  revision: RevisionView; decisions: readonly DecisionView[]; image: ScheduleFigure['image']; issuedBy: string | null; date: Date;
}): ScheduleContent {
  const { revision } = input;
  const decisions = new Map(input.decisions.map((decision) => [decision.target, decision]));
  return {
    projectName: revision.project.name,
    planName: revision.planName,
    revisionNumber: revision.number,
    dateText: input.date.toISOString().slice(0, 10),
    preparedBy: revision.submittedByName,
    reviewedBy: revision.reviewedByName ?? 'Not reviewed yet',
    stateLabel: revisionStateLabel(revision.state),
    draft: !isAcceptedForIssue(revision.state),
    issuedBy: input.issuedBy,
    figure: planFigure(revision, input.image),
    runs: revision.analysis.map((result) => runOf(revision, result, decisions)),
    risks: revision.extras.risks ?? [],
    treatments: revision.extras.treatments ?? [],
    rooms: revision.extras.rooms ?? [],
    temperaturesC: [...new Set(revision.document.runs.map((run) => run.temperatureC))].sort((a, b) => a - b),
  };
}
