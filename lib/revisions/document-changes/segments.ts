// What changed in the segments: added or removed, where they connect, length (drawn or typed),
// section, lining, silencers and other losses, and the label.
import { segmentLengthM } from '@/lib/plan/geometry/length';
import { nodePositions, type PlanSegment } from '@/lib/plan/document';
import { formatLength } from '@/lib/plan/units';
import type { ChangeContext, DocumentChange, PlanSide } from './types';
import { NONE } from './types';
import { liningWords, otherFields, same, sectionWords, wallWords } from './words';

const DESCRIBED: readonly (keyof PlanSegment)[] = ['id', 'from', 'to', 'section', 'lining', 'wall', 'lengthOverrideM', 'number', 'inserts'];
/** Drawn lengths closer than this are the same length (a re-save rounds nothing, but a scale of many digits can). */
const SAME_LENGTH_M = 0.0005;

function drawnLengthM(side: PlanSide, segment: PlanSegment): number | null {
  const nodes = nodePositions(side.document);
  const from = nodes.get(segment.from);
  const to = nodes.get(segment.to);
  return from && to ? segmentLengthM(from, to, side.metresPerPixel) : null;
}

function lengthWords(context: ChangeContext, side: PlanSide, segment: PlanSegment): string {
  const lengthM = segment.lengthOverrideM ?? drawnLengthM(side, segment);
  if (lengthM === null) return NONE;
  return `${formatLength(lengthM, context.units, 'run')}${segment.lengthOverrideM != null ? ' (typed)' : ' (drawn)'}`;
}

function insertsWords(segment: PlanSegment): string {
  const inserts = segment.inserts ?? [];
  return inserts.length === 0 ? 'none' : inserts.map((insert) => `${insert.kind === 'silencer' ? 'silencer' : 'loss'} ${insert.label}`).join(', ');
}

function ends(side: PlanSide, segment: PlanSegment): string {
  const label = (nodeId: string) => side.labels.nodes[nodeId] ?? 'a point';
  return `${label(segment.from)} to ${label(segment.to)}`;
}

function keptSegmentChanges(context: ChangeContext, before: PlanSegment, after: PlanSegment): DocumentChange[] {
  const subject = context.after.labels.segments[after.id] ?? context.before.labels.segments[before.id] ?? 'a segment';
  const lines: DocumentChange[] = [];
  const labels = [context.before.labels.segments[before.id], context.after.labels.segments[after.id]];
  if (labels[0] !== labels[1]) lines.push({ area: 'segment', subject, what: 'Label', before: labels[0] ?? NONE, after: labels[1] ?? NONE });
  if (before.from !== after.from || before.to !== after.to) lines.push({ area: 'segment', subject, what: 'Connects', before: ends(context.before, before), after: ends(context.after, after) });
  const lengths = [before.lengthOverrideM ?? drawnLengthM(context.before, before), after.lengthOverrideM ?? drawnLengthM(context.after, after)];
  const typedChanged = (before.lengthOverrideM ?? null) !== (after.lengthOverrideM ?? null);
  const lengthChanged = lengths[0] === null || lengths[1] === null ? lengths[0] !== lengths[1] : Math.abs(lengths[0] - lengths[1]) > SAME_LENGTH_M;
  if (typedChanged || lengthChanged) lines.push({ area: 'segment', subject, what: 'Length', before: lengthWords(context, context.before, before), after: lengthWords(context, context.after, after) });
  if (!same(before.section, after.section)) lines.push({ area: 'segment', subject, what: 'Section', before: sectionWords(before.section, context.units), after: sectionWords(after.section, context.units) });
  if (!same(before.lining, after.lining)) lines.push({ area: 'segment', subject, what: 'Lining', before: liningWords(before.lining, context.units), after: liningWords(after.lining, context.units) });
  if (!same(before.wall ?? null, after.wall ?? null)) lines.push({ area: 'segment', subject, what: 'Walls', before: wallWords(before.wall, 'as the run'), after: wallWords(after.wall, 'as the run') });
  if (!same(before.inserts ?? [], after.inserts ?? [])) lines.push({ area: 'segment', subject, what: 'Silencers and losses', before: insertsWords(before), after: insertsWords(after) });
  for (const other of otherFields(before, after, DESCRIBED)) lines.push({ area: 'segment', subject, what: other.field, before: other.before, after: other.after });
  return lines;
}

export function segmentChanges(context: ChangeContext): DocumentChange[] {
  const before = new Map(context.before.document.segments.map((segment) => [segment.id, segment]));
  const after = new Set(context.after.document.segments.map((segment) => segment.id));
  const lines: DocumentChange[] = [];
  for (const segment of context.after.document.segments) {
    const old = before.get(segment.id);
    if (!old) {
      lines.push({ area: 'segment', subject: context.after.labels.segments[segment.id] ?? 'a new segment', what: 'Added', before: NONE, after: `${sectionWords(segment.section, context.units)}, ${lengthWords(context, context.after, segment)}` });
    } else {
      lines.push(...keptSegmentChanges(context, old, segment));
    }
  }
  for (const segment of context.before.document.segments) {
    if (!after.has(segment.id)) {
      lines.push({ area: 'segment', subject: context.before.labels.segments[segment.id] ?? 'a segment', what: 'Removed', before: `${sectionWords(segment.section, context.units)}, ${lengthWords(context, context.before, segment)}`, after: NONE });
    }
  }
  return lines;
}
