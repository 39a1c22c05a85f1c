// Undo and redo over immutable snapshots (documents, or whatever the editor chooses to keep).
import type { PlanDocument } from './document';

export const DEFAULT_HISTORY_LIMIT = 200;

export interface History<T = PlanDocument> {
  readonly past: readonly T[];
  readonly present: T;
  readonly future: readonly T[];
  /** Most undo steps kept. */
  readonly limit: number;
}

export function createHistory<T = PlanDocument>(present: T, limit = DEFAULT_HISTORY_LIMIT): History<T> {
  return { past: [], present, future: [], limit: Math.max(1, Math.floor(limit)) };
}

/** Records a new present; clears redo. Pushing the present itself changes nothing. */
export function push<T>(history: History<T>, next: T): History<T> {
  if (next === history.present) return history;
  const past = [...history.past, history.present];
  return { ...history, past: past.length > history.limit ? past.slice(past.length - history.limit) : past, present: next, future: [] };
}

export function canUndo<T>(history: History<T>): boolean {
  return history.past.length > 0;
}

export function canRedo<T>(history: History<T>): boolean {
  return history.future.length > 0;
}

export function undo<T>(history: History<T>): History<T> {
  if (!canUndo(history)) return history;
  const previous = history.past[history.past.length - 1];
  return { ...history, past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future] };
}

export function redo<T>(history: History<T>): History<T> {
  if (!canRedo(history)) return history;
  const [next, ...future] = history.future;
  return { ...history, past: [...history.past, history.present], present: next, future };
}
