// Draw one segment: from an existing node or a new point, to a new point or an existing node.
// Starting in empty space (and ending there) creates a new run: round Ø 250 mm, closed start,
// open unflanged end, 20 °C. Joining two runs keeps the run drawn from.
import { DEFAULT_END_TERMINATION, DEFAULT_SECTION, DEFAULT_START_TERMINATION, DEFAULT_TEMPERATURE_C, findNode, type PlanDocument, type PlanNode, type PlanRun, type Section } from '../document';
import { PlanError } from '../errors';
import { pointsEqual, type Point } from '../geometry/point';
import { buildAdjacency, componentOf } from '../graph';
import type { IdGenerator } from '../ids';
import { nextRunName } from '../normalize';
import { sectionSchema } from '../schema';
import { runOfNode } from '../topology';
import { checked, defineCommand, type CommandResult } from './define';
import type { EditorState } from '../editor-state';
import { requireOnPlan } from './plan-limits';

export type NodeRef = { readonly nodeId: string } | { readonly point: Point };

export interface DrawSegmentArgs {
  readonly from: NodeRef;
  readonly to: NodeRef;
  /** Default: the section of a segment already at the start node, else round Ø 250 mm. */
  readonly section?: Section;
}

function resolveNode(doc: PlanDocument, ref: NodeRef, newId: IdGenerator): { node: PlanNode; isNew: boolean } {
  if ('nodeId' in ref) {
    const node = findNode(doc, ref.nodeId);
    if (!node) throw new PlanError(`There is no point with id "${ref.nodeId}".`, { nodeId: ref.nodeId });
    return { node, isNew: false };
  }
  requireOnPlan(ref.point);
  return { node: { id: newId(), x: ref.point.x, y: ref.point.y }, isNew: true };
}

function newRun(doc: PlanDocument, startNodeId: string, endNodeId: string, newId: IdGenerator): PlanRun {
  return {
    id: newId(),
    name: nextRunName(doc.runs),
    startNodeId,
    endNodeId: null,
    temperatureC: DEFAULT_TEMPERATURE_C,
    fan: null,
    terminations: { [startNodeId]: DEFAULT_START_TERMINATION, [endNodeId]: DEFAULT_END_TERMINATION },
  };
}

/** The edit behind draw-segment and add-tee (not normalized). */
export function drawSegmentEdit(doc: PlanDocument, state: EditorState, args: DrawSegmentArgs, newId: IdGenerator): CommandResult {
  const from = resolveNode(doc, args.from, newId);
  const to = resolveNode(doc, args.to, newId);
  if (from.node.id === to.node.id || pointsEqual(from.node, to.node)) throw new PlanError('A segment needs two different points.');
  if (!from.isNew && !to.isNew) {
    if (componentOf(buildAdjacency(doc), from.node.id).nodeIds.has(to.node.id)) throw new PlanError('That would close a loop; a duct run branches like a tree and never joins itself.', { nodeId: to.node.id });
  }
  const nearby = from.isNew ? undefined : doc.segments.find((segment) => segment.from === from.node.id || segment.to === from.node.id);
  const section = checked(sectionSchema, args.section ?? nearby?.section ?? DEFAULT_SECTION, 'Section');
  const segment = { id: newId(), from: from.node.id, to: to.node.id, section: { ...section } };
  const nodes = [...doc.nodes, ...(from.isNew ? [from.node] : []), ...(to.isNew ? [to.node] : [])];

  const fromRun = from.isNew ? null : runOfNode(doc, from.node.id);
  const toRun = to.isNew ? null : runOfNode(doc, to.node.id);
  let runs: PlanRun[];
  let activeRunId: string;
  if (fromRun && toRun && fromRun.id !== toRun.id) {
    const merged: PlanRun = { ...fromRun, terminations: { ...toRun.terminations, ...fromRun.terminations } };
    runs = doc.runs.filter((run) => run.id !== toRun.id).map((run) => (run.id === fromRun.id ? merged : run));
    activeRunId = fromRun.id;
  } else if (fromRun || toRun) {
    runs = [...doc.runs];
    activeRunId = (fromRun ?? toRun)?.id ?? '';
  } else {
    const run = newRun(doc, from.node.id, to.node.id, newId);
    runs = [...doc.runs, run];
    activeRunId = run.id;
  }
  return {
    doc: { ...doc, nodes, segments: [...doc.segments, segment], runs },
    state: { ...state, selection: { nodeIds: [], segmentIds: [segment.id] }, activeRunId },
  };
}

export const drawSegment = defineCommand('draw-segment', 'Draw a segment from a point or an existing end to a new point or an existing end.', drawSegmentEdit);
