// The shape of an editor command: a name, a plain description, and a pure perform.
import type { PlanDocument } from '../document';
import type { EditorState } from '../editor-state';
import { PlanError } from '../errors';
import { randomId, type IdGenerator } from '../ids';
import { normalizeDocument, normalizeState } from '../normalize';
import { requireWithinPlanLimits } from './plan-limits';
import type { z } from 'zod';

export type CommandName =
  | 'draw-segment'
  | 'move-node'
  | 'delete-selection'
  | 'split-segment'
  | 'add-tee'
  | 'set-section'
  | 'set-lining'
  | 'set-wall'
  | 'set-termination'
  | 'set-run-properties'
  | 'choose-end'
  | 'renumber-run'
  | 'set-length-override'
  | 'set-inserts'
  | 'add-room'
  | 'update-room'
  | 'move-room'
  | 'delete-room'
  | 'add-treatment'
  | 'remove-treatment'
  | 'set-grid-origin';

export interface CommandResult {
  readonly doc: PlanDocument;
  readonly state: EditorState;
}

export interface Command<Name extends CommandName, Args> {
  readonly name: Name;
  readonly description: string;
  /** Pure: returns a new, consistent document and state. Throws PlanError when the edit is refused. */
  perform(doc: PlanDocument, state: EditorState, args: Args, newId?: IdGenerator): CommandResult;
}

type Apply<Args> = (doc: PlanDocument, state: EditorState, args: Args, newId: IdGenerator) => CommandResult;

/** Wraps an edit so that every command leaves the document and the state consistent. */
export function defineCommand<Name extends CommandName, Args>(name: Name, description: string, apply: Apply<Args>): Command<Name, Args> {
  return {
    name,
    description,
    perform(doc, state, args, newId = randomId) {
      const result = apply(doc, state, args, newId);
      const normalized = normalizeDocument(result.doc, newId);
      requireWithinPlanLimits(doc, normalized);
      return { doc: normalized, state: normalizeState(normalized, result.state) };
    },
  };
}

/** Parses a value with one of the document's schemas, or refuses with the first message. */
export function checked<T>(schema: z.ZodType<T>, value: unknown, label: string): T {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const path = issue.path.length > 0 ? ` (${issue.path.join('.')})` : '';
  throw new PlanError(`${label}${path}: ${issue.message}`);
}

/** The ids given, or the selection's when none are given; refuses an empty or unknown list. */
export function targetSegmentIds(doc: PlanDocument, state: EditorState, segmentIds: readonly string[] | undefined): Set<string> {
  const ids = new Set(segmentIds ?? state.selection.segmentIds);
  if (ids.size === 0) throw new PlanError('Select a segment first.');
  for (const id of ids) {
    if (!doc.segments.some((segment) => segment.id === id)) throw new PlanError(`There is no segment with id "${id}".`, { segmentId: id });
  }
  return ids;
}
