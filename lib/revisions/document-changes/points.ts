// Points of the drawing that moved on it (ends, tees and joints): each by its label, or a count when many
// moved at once (a run dragged across the plan).
import { formatLength } from '@/lib/plan/units';
import type { ChangeContext, DocumentChange } from './types';

const EACH_UP_TO = 8;
const SAME_PLACE_M = 0.0005;

export function pointChanges(context: ChangeContext): DocumentChange[] {
  const before = new Map(context.before.document.nodes.map((node) => [node.id, node]));
  const length = (metres: number) => formatLength(metres, context.units, 'run');
  const place = (x: number, y: number, metresPerPixel: number) => `${length(x * metresPerPixel)} from the left, ${length(y * metresPerPixel)} from the top`;
  const moved = context.after.document.nodes.flatMap((node) => {
    const old = before.get(node.id);
    if (!old) return [];
    // On the drawing, in its pixels: a new scale alone moves nothing.
    const shiftM = Math.hypot(node.x - old.x, node.y - old.y) * context.after.metresPerPixel;
    return shiftM > SAME_PLACE_M ? [{ old, node }] : [];
  });
  if (moved.length > EACH_UP_TO) {
    return [{ area: 'segment', subject: 'Drawing', what: 'Points moved', before: `${moved.length} points`, after: 'moved' }];
  }
  return moved.map(({ old, node }) => ({
    area: 'segment' as const,
    subject: context.after.labels.nodes[node.id] ?? 'a point',
    what: 'Moved',
    before: place(old.x, old.y, context.before.metresPerPixel),
    after: place(node.x, node.y, context.after.metresPerPixel),
  }));
}
