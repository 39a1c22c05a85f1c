// Everything a treatment schedule shows, gathered from a frozen revision as plain data, so the
// PDF pieces only lay it out.
import type { Termination } from '@/lib/acoustic';
import { planLabels, type PlanLabels } from '@/lib/plan/labels';
import { outletReflectionLosses, type OutletReflectionLoss } from '@/lib/plan/outlet-reflection-loss';
import type { RunResult } from '@/lib/plans/results';
import { resonanceTarget } from '@/lib/revisions/rows';
import { isAcceptedForIssue, revisionStateLabel } from '@/lib/revisions/states';
import type { RevisionSummary, RevisionView, RiskRow, RoomRow, TreatmentRow } from '@/lib/revisions/types';
import type { DecisionView } from '@/lib/reviews/data';
import { DECISION_LABELS } from '@/lib/reviews/decisions';
import { describeSection, describeTermination } from './describe';
import { scheduleDocumentNumber } from './document-number';
import { planFigure, type ScheduleDrawing, type ScheduleFigure, type ScheduleImage } from './figure';
import { roomVerdicts, type RoomVerdict } from './in-brief';
import { reflectionKindWords } from '@/lib/plan/reflection-words';

export { planFigure, type ScheduleDrawing, type ScheduleFigure, type ScheduleImage };

/** Who issues the schedule: the practice's name and logo from the team settings. */
export interface SchedulePractice { name: string; logo: ScheduleImage | null }

/** One revision of the plan in the schedule's revision history. */
export interface ScheduleHistoryRow { number: number; dateText: string; submittedBy: string; outcome: string; reviewedBy: string; note: string }

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
  /** What the run's results assume (walls, lining, air, ends) and where they are broadband, in words. */
  assumptions: string[];
}

export interface ScheduleContent {
  practice: SchedulePractice;
  documentNumber: string;
  /** "Draft", "Issued", or "Preview, not issued". */
  status: string;
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
  roomVerdicts: RoomVerdict[];
  outlets: OutletReflectionLoss[];
  history: ScheduleHistoryRow[];
  temperaturesC: number[];
}

// The printed table keeps the lowest orders, where duct rumble lives, and every row that
// matters beyond them (near a fan tone, or flagged); the revision holds the full list.
export const PRINTED_LOWEST_ORDERS = 12;

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
        fanTone: resonance.broadband ? 'broad' : tone === null ? 'clear' : `meets ${tone.toFixed(0)} Hz`,
        review: decision ? `${DECISION_LABELS[decision.decision]}${decision.note ? `: ${decision.note}` : ''}` : 'not reviewed',
      };
    }),
    omitted: left.length === 0 ? null : { count: left.length, fromHz: left[0].frequencyHz, toHz: left[left.length - 1].frequencyHz },
    reflections: (analysis?.reflections ?? []).map((reflection) => ({ atM: reflection.atM, kind: reflectionKindWords(reflection.kind), magnitude: magnitudeText(reflection.bands) })),
    warnings: analysis?.warnings ?? [],
    assumptions: [
      ...(analysis?.assumptions ?? []),
      ...((analysis?.broadbandRangesHz ?? []).length > 0
        ? [`Broadband (resonances overlap or Q under 5, nothing to dodge): ${(analysis?.broadbandRangesHz ?? []).map(([lowHz, highHz]) => `${lowHz.toFixed(0)}–${highHz.toFixed(0)} Hz`).join(', ')}.`]
        : []),
    ],
  };
}

function dateOf(iso: string): string {
  return iso.slice(0, 10);
}

/** The plan's revisions up to the printed one, oldest first, with the review's outcome and overall note. */
function historyRows(history: readonly RevisionSummary[], upTo: number): ScheduleHistoryRow[] {
  return [...history].filter((row) => row.number <= upTo).sort((a, b) => a.number - b.number).map((row) => ({
    number: row.number, dateText: dateOf(row.createdAt), submittedBy: row.submittedByName, outcome: revisionStateLabel(row.state),
    reviewedBy: row.reviewedByName ? `${row.reviewedByName}${row.reviewedAt ? `, ${dateOf(row.reviewedAt)}` : ''}` : '—', note: row.reviewNote || '—',
  }));
}

export function scheduleContent(input: {
  revision: RevisionView; decisions: readonly DecisionView[]; image: ScheduleDrawing | null; issuedBy: string | null; date: Date;
  practice: SchedulePractice; history: readonly RevisionSummary[];
}): ScheduleContent {
  const { revision } = input;
  const decisions = new Map(input.decisions.map((decision) => [decision.target, decision]));
  const draft = !isAcceptedForIssue(revision.state);
  const rooms = revision.extras.rooms ?? [];
  // the history always carries the printed revision, as it stands now
  const history = [...input.history.filter((row) => row.number !== revision.number), revision];
  return {
    practice: input.practice,
    documentNumber: scheduleDocumentNumber(revision.project.name, revision.planName, revision.planId),
    status: draft ? 'Draft' : input.issuedBy ? 'Issued' : 'Preview, not issued',
    projectName: revision.project.name,
    planName: revision.planName,
    revisionNumber: revision.number,
    dateText: input.date.toISOString().slice(0, 10),
    preparedBy: revision.submittedByName,
    reviewedBy: revision.reviewedByName ?? 'Not reviewed yet',
    stateLabel: revisionStateLabel(revision.state),
    draft,
    issuedBy: input.issuedBy,
    figure: planFigure(revision, input.image),
    runs: revision.analysis.map((result) => runOf(revision, result, decisions)),
    risks: revision.extras.risks ?? [],
    treatments: revision.extras.treatments ?? [],
    rooms,
    roomVerdicts: roomVerdicts(rooms, revision.document),
    outlets: outletReflectionLosses(revision.document, undefined, labelsOf(revision)),
    history: historyRows(history, revision.number),
    temperaturesC: [...new Set(revision.document.runs.map((run) => run.temperatureC))].sort((a, b) => a - b),
  };
}
