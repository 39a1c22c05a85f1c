// A drawn run → the engine's RunInput. The main path runs from the start to the chosen end;
// every other subtree enters as a Branch at the far end of the path segment that reaches it.
// Inside a branch, a fork continues along the child with the longest reach to a leaf (first in
// document order on a tie); the other children become branches of the segment ending at the fork.
import type { Branch, RunInput, Segment, Termination } from '@/lib/acoustic';
import type { PlanRun } from './document';
import type { PlanDocument } from './document';
import { PlanError } from './errors';
import { buildRunTree, mainPathOf, type ChildLink, type MainPathPiece, type RunTree } from './run-tree';

export type { MainPathPiece };

export interface RunInputWithMap {
  input: RunInput;
  /** One entry per main-path segment, in order, with distances from the start end. */
  path: MainPathPiece[];
}

function terminationAt(run: PlanRun, nodeId: string): Termination {
  const termination = run.terminations[nodeId];
  if (!termination) throw new PlanError(`${run.name}: one end has no termination; choose closed, open, lined or anechoic.`, { runId: run.id, nodeId });
  return termination;
}

function engineSegment(link: ChildLink, branches: Branch[]): Segment {
  const { section, lining, wall } = link.segment;
  return {
    lengthM: link.lengthM,
    section: { ...section },
    ...(lining ? { lining: { thicknessM: lining.thicknessM, ...(lining.absorption === undefined ? {} : { absorption: lining.absorption }) } } : {}),
    ...(wall ? { wall } : {}),
    ...(branches.length > 0 ? { branches } : {}),
  };
}

/** Side subtrees at a node: every child link except the one the path continues along. */
function sideBranches(tree: RunTree, nodeId: string, continuingSegmentId: string | null): Branch[] {
  return (tree.children.get(nodeId) ?? []).filter((link) => link.segment.id !== continuingSegmentId).map((link) => branchFrom(tree, link));
}

/** The continuing child at a fork: the longest reach to a leaf, first in document order on a tie. */
function continuingLink(tree: RunTree, links: readonly ChildLink[]): ChildLink | null {
  let best: ChildLink | null = null;
  let bestReachM = -1;
  for (const link of links) {
    const reachM = link.lengthM + (tree.reachM.get(link.childNodeId) ?? 0);
    if (reachM > bestReachM) {
      best = link;
      bestReachM = reachM;
    }
  }
  return best;
}

function branchFrom(tree: RunTree, first: ChildLink): Branch {
  const segments: Segment[] = [];
  for (let link: ChildLink | null = first; link; ) {
    const next = continuingLink(tree, tree.children.get(link.childNodeId) ?? []);
    segments.push(engineSegment(link, sideBranches(tree, link.childNodeId, next ? next.segment.id : null)));
    if (!next) return { segments, end: terminationAt(tree.run, link.childNodeId) };
    link = next;
  }
  throw new PlanError(`${tree.run.name}: an empty branch.`, { runId: tree.run.id });
}

/** toRunInput with the main path's segment ids and distances, for drawing results on the plan. Throws PlanError. */
export function toRunInputWithMap(doc: PlanDocument, runId: string, metresPerPixel: number): RunInputWithMap {
  const tree = buildRunTree(doc, runId, metresPerPixel, ['missing-termination']);
  const { pieces, links } = mainPathOf(tree);
  const lastIndex = links.length - 1;
  const segments = links.map((link, index) => engineSegment(link, index === lastIndex ? [] : sideBranches(tree, link.childNodeId, links[index + 1].segment.id)));
  const input: RunInput = {
    temperatureC: tree.run.temperatureC,
    ...(tree.run.walls ? { walls: tree.run.walls } : {}),
    segments,
    start: terminationAt(tree.run, tree.run.startNodeId),
    end: terminationAt(tree.run, pieces[lastIndex].toNodeId),
  };
  return { input, path: pieces };
}

/** The engine input for one run of the plan. Throws PlanError with a plain message when the run cannot be analysed. */
export function toRunInput(doc: PlanDocument, runId: string, metresPerPixel: number): RunInput {
  return toRunInputWithMap(doc, runId, metresPerPixel).input;
}
