// What changed in the runs: name, air temperature, fan (blades, speed, sound power), start, the end
// chosen for results, and the termination of every end.
import type { PlanRun } from '@/lib/plan/document';
import type { ChangeContext, DocumentChange } from './types';
import { NONE } from './types';
import { bandsWords, otherFields, same, terminationWords, wallWords } from './words';

const DESCRIBED: readonly (keyof PlanRun)[] = ['id', 'name', 'letter', 'startNodeId', 'endNodeId', 'temperatureC', 'walls', 'fan', 'fanOfRunId', 'fanSoundPowerDb', 'terminations'];

function runSubject(run: PlanRun, letter: string | undefined): string {
  return `Run ${letter ?? run.letter ?? '?'} (${run.name})`;
}

function fanWords(fan: PlanRun['fan']): string {
  return fan ? `${fan.blades} blades at ${fan.rpm} rpm` : 'no fan';
}

function endLabel(context: ChangeContext, side: 'before' | 'after', nodeId: string | null): string {
  if (nodeId === null) return 'the farthest end';
  return context[side].labels.nodes[nodeId] ?? 'a point no longer on the plan';
}

function fanChanges(subject: string, before: PlanRun['fan'], after: PlanRun['fan']): DocumentChange[] {
  if (same(before, after)) return [];
  if (!before || !after) return [{ area: 'fan', subject, what: 'Fan', before: fanWords(before), after: fanWords(after) }];
  const lines: DocumentChange[] = [];
  if (before.blades !== after.blades) lines.push({ area: 'fan', subject, what: 'Fan blades', before: String(before.blades), after: String(after.blades) });
  if (before.rpm !== after.rpm) lines.push({ area: 'fan', subject, what: 'Fan speed', before: `${before.rpm} rpm`, after: `${after.rpm} rpm` });
  const range = (fan: NonNullable<PlanRun['fan']>) => (fan.minRpm == null && fan.maxRpm == null ? 'not given' : `${fan.minRpm ?? '?'}–${fan.maxRpm ?? '?'} rpm`);
  if (range(before) !== range(after)) lines.push({ area: 'fan', subject, what: 'Fan speed range', before: range(before), after: range(after) });
  for (const other of otherFields(before, after, ['blades', 'rpm', 'minRpm', 'maxRpm'])) lines.push({ area: 'fan', subject, what: `Fan ${other.field}`, before: other.before, after: other.after });
  return lines;
}

function terminationChanges(context: ChangeContext, before: PlanRun, after: PlanRun): DocumentChange[] {
  const nodeIds = [...new Set([...Object.keys(before.terminations), ...Object.keys(after.terminations)])];
  return nodeIds.flatMap((nodeId): DocumentChange[] => {
    const old = before.terminations[nodeId];
    const now = after.terminations[nodeId];
    if (same(old, now)) return [];
    const subject = context.after.labels.nodes[nodeId] ?? context.before.labels.nodes[nodeId] ?? 'an end no longer on the plan';
    return [{ area: 'end', subject, what: !old ? 'End added' : !now ? 'End removed' : 'Termination', before: old ? terminationWords(old) : NONE, after: now ? terminationWords(now) : NONE }];
  });
}

function keptRunChanges(context: ChangeContext, before: PlanRun, after: PlanRun): DocumentChange[] {
  const subject = runSubject(after, context.after.labels.runs[after.id]);
  const lines: DocumentChange[] = [];
  if (before.name !== after.name) lines.push({ area: 'run', subject, what: 'Name', before: before.name, after: after.name });
  const letters = [context.before.labels.runs[before.id], context.after.labels.runs[after.id]];
  if (letters[0] !== letters[1]) lines.push({ area: 'run', subject, what: 'Letter', before: letters[0] ?? NONE, after: letters[1] ?? NONE });
  if (before.temperatureC !== after.temperatureC) lines.push({ area: 'run', subject, what: 'Air temperature', before: `${before.temperatureC} °C`, after: `${after.temperatureC} °C` });
  if (!same(before.walls ?? null, after.walls ?? null)) lines.push({ area: 'run', subject, what: 'Walls', before: wallWords(before.walls, 'sheet metal'), after: wallWords(after.walls, 'sheet metal') });
  if ((before.fanOfRunId ?? null) !== (after.fanOfRunId ?? null)) {
    const whose = (doc: typeof context.after.document, id: string | null | undefined) => (id ? `shares the fan of ${doc.runs.find((run) => run.id === id)?.name ?? id}` : 'its own fan');
    lines.push({ area: 'fan', subject, what: 'Fan', before: whose(context.before.document, before.fanOfRunId), after: whose(context.after.document, after.fanOfRunId) });
  }
  lines.push(...fanChanges(subject, before.fan, after.fan));
  if (!same(before.fanSoundPowerDb, after.fanSoundPowerDb)) {
    lines.push({ area: 'fan', subject, what: 'Fan sound power', before: bandsWords(before.fanSoundPowerDb, 'dB'), after: bandsWords(after.fanSoundPowerDb, 'dB') });
  }
  const starts = [endLabel(context, 'before', before.startNodeId), endLabel(context, 'after', after.startNodeId)];
  if (before.startNodeId !== after.startNodeId) lines.push({ area: 'run', subject, what: 'Start (fan side)', before: starts[0], after: starts[1] });
  if (before.endNodeId !== after.endNodeId) {
    lines.push({ area: 'run', subject, what: 'End used for results', before: endLabel(context, 'before', before.endNodeId), after: endLabel(context, 'after', after.endNodeId) });
  }
  lines.push(...terminationChanges(context, before, after));
  for (const other of otherFields(before, after, DESCRIBED)) lines.push({ area: 'run', subject, what: other.field, before: other.before, after: other.after });
  return lines;
}

export function runChanges(context: ChangeContext): DocumentChange[] {
  const before = new Map(context.before.document.runs.map((run) => [run.id, run]));
  const after = new Map(context.after.document.runs.map((run) => [run.id, run]));
  const lines: DocumentChange[] = [];
  for (const run of context.after.document.runs) {
    const old = before.get(run.id);
    if (!old) lines.push({ area: 'run', subject: runSubject(run, context.after.labels.runs[run.id]), what: 'Added', before: NONE, after: fanWords(run.fan) });
    else lines.push(...keptRunChanges(context, old, run));
  }
  for (const run of context.before.document.runs) {
    if (!after.has(run.id)) lines.push({ area: 'run', subject: runSubject(run, context.before.labels.runs[run.id]), what: 'Removed', before: fanWords(run.fan), after: NONE });
  }
  return lines;
}
