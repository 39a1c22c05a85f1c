// The one zod schema of the plan document, shared by the editor and the server.
import { z } from 'zod';
import { text } from '@/lib/text';
import type { PlanDocument } from './document';
import { planTreatmentSchema, roomSchema, soundPowerBandsSchema } from './rooms/room-schema';
import { pathInsertSchema } from './noise/insert-schema';
import { roomPlaceProblems } from './rooms/room-places';
import {
  fanSchema, idSchema, lengthOverrideMSchema, liningSchema, wallSchema, MAX_ITEMS, MAX_PLAN_NODES, MAX_PLAN_ROOMS, MAX_PLAN_RUNS, MAX_PLAN_SEGMENTS,
  planCoordinateSchema, planList, runLetterSchema, sectionSchema, segmentNumberSchema, temperatureCSchema, terminationSchema,
} from './schema-parts';

export * from './schema-parts';

const nodeSchema = z.object({ id: idSchema, x: planCoordinateSchema('x'), y: planCoordinateSchema('y') });

const segmentSchema = z.object({
  id: idSchema,
  from: idSchema,
  to: idSchema,
  section: sectionSchema,
  lining: liningSchema.nullable().optional(),
  wall: wallSchema.nullable().optional(),
  lengthOverrideM: lengthOverrideMSchema.nullable().optional(),
  number: segmentNumberSchema.optional(),
  inserts: z.array(pathInsertSchema).max(8, 'at most 8 inserts on one segment').optional(),
});

export const runNameSchema = text({ error: 'must be text' }).trim().min(1, 'give the run a name').max(120, 'must be at most 120 characters');

const runSchema = z.object({
  id: idSchema,
  name: runNameSchema,
  letter: runLetterSchema.optional(),
  startNodeId: idSchema,
  endNodeId: idSchema.nullable(),
  temperatureC: temperatureCSchema,
  walls: wallSchema.nullable().optional(),
  fan: fanSchema.nullable(),
  fanOfRunId: idSchema.nullable().optional(),
  fanSoundPowerDb: soundPowerBandsSchema.nullable().optional(),
  terminations: z.record(idSchema, terminationSchema),
});

const placeholders = z.array(z.record(text(), z.unknown())).max(MAX_ITEMS);

const documentShape = z.object({
  schemaVersion: z.literal(1, { error: 'must be 1' }),
  nodes: planList(nodeSchema, MAX_PLAN_NODES, 'points'),
  segments: planList(segmentSchema, MAX_PLAN_SEGMENTS, 'segments'),
  runs: planList(runSchema, MAX_PLAN_RUNS, 'runs'),
  rooms: planList(roomSchema, MAX_PLAN_ROOMS, 'rooms'),
  outlets: placeholders,
  listeners: placeholders,
  // Documents saved before treatments existed have none.
  treatments: z.array(planTreatmentSchema).max(MAX_ITEMS, `at most ${MAX_ITEMS} treatments`).default([]),
  // Documents saved before the grid could move start it at the drawing's corner.
  gridOrigin: z.object({ x: planCoordinateSchema('x'), y: planCoordinateSchema('y') }).optional(),
});

type DocumentShape = z.infer<typeof documentShape>;

/** Ids unique; every reference points at an existing node. */
function checkReferences(doc: DocumentShape, context: z.RefinementCtx): void {
  const nodeIds = new Set<string>();
  doc.nodes.forEach((node, index) => {
    if (nodeIds.has(node.id)) context.addIssue({ code: 'custom', path: ['nodes', index, 'id'], message: `repeats the id "${node.id}"` });
    nodeIds.add(node.id);
  });
  const segmentIds = new Set<string>();
  doc.segments.forEach((segment, index) => {
    if (segmentIds.has(segment.id)) context.addIssue({ code: 'custom', path: ['segments', index, 'id'], message: `repeats the id "${segment.id}"` });
    segmentIds.add(segment.id);
    for (const end of ['from', 'to'] as const) {
      if (!nodeIds.has(segment[end])) context.addIssue({ code: 'custom', path: ['segments', index, end], message: `names node "${segment[end]}", which does not exist` });
    }
    if (segment.from === segment.to) context.addIssue({ code: 'custom', path: ['segments', index, 'to'], message: 'must differ from "from"' });
  });
  const runIds = new Set<string>();
  doc.runs.forEach((run, index) => {
    if (runIds.has(run.id)) context.addIssue({ code: 'custom', path: ['runs', index, 'id'], message: `repeats the id "${run.id}"` });
    runIds.add(run.id);
    if (!nodeIds.has(run.startNodeId)) context.addIssue({ code: 'custom', path: ['runs', index, 'startNodeId'], message: `names node "${run.startNodeId}", which does not exist` });
    if (run.endNodeId !== null && !nodeIds.has(run.endNodeId)) context.addIssue({ code: 'custom', path: ['runs', index, 'endNodeId'], message: `names node "${run.endNodeId}", which does not exist` });
    if (run.fanOfRunId != null) {
      const owner = doc.runs.find((candidate) => candidate.id === run.fanOfRunId);
      if (!owner || owner.id === run.id) context.addIssue({ code: 'custom', path: ['runs', index, 'fanOfRunId'], message: `names run "${run.fanOfRunId}", which is not another run of the plan` });
      else if (owner.fanOfRunId != null) context.addIssue({ code: 'custom', path: ['runs', index, 'fanOfRunId'], message: `names run "${owner.name}", which itself shares another run's fan; name that run instead` });
    }
    for (const nodeId of Object.keys(run.terminations)) {
      if (!nodeIds.has(nodeId)) context.addIssue({ code: 'custom', path: ['runs', index, 'terminations', nodeId], message: `names node "${nodeId}", which does not exist` });
    }
  });
  checkRooms(doc, nodeIds, context);
}

/** Room ids unique; every outlet's node exists and feeds the room once; outlets and listeners inside the box. */
function checkRooms(doc: DocumentShape, nodeIds: ReadonlySet<string>, context: z.RefinementCtx): void {
  const roomIds = new Set<string>();
  doc.rooms.forEach((room, index) => {
    if (roomIds.has(room.id)) context.addIssue({ code: 'custom', path: ['rooms', index, 'id'], message: `repeats the id "${room.id}"` });
    roomIds.add(room.id);
    for (const problem of roomPlaceProblems(room, (nodeId) => nodeIds.has(nodeId))) {
      context.addIssue({ code: 'custom', path: ['rooms', index, ...problem.path], message: problem.message });
    }
  });
}

export const planDocumentSchema: z.ZodType<PlanDocument, unknown> = documentShape.superRefine(checkReferences);

/** A zod issue path as text: `segments[2].section.diameterM`. */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((text, key) => {
    if (typeof key === 'number') return `${text}[${key}]`;
    const name = String(key);
    return text === '' ? name : `${text}.${name}`;
  }, '');
}

/** Plain messages naming the path, e.g. `segments[2].section.diameterM: must be at least 0.01 m (10 mm)`. */
export function describeIssues(error: z.ZodError): string[] {
  return error.issues.map((issue) => {
    const path = formatIssuePath(issue.path);
    return path === '' ? issue.message : `${path}: ${issue.message}`;
  });
}

export type ParseResult<T> = { ok: true; value: T } | { ok: false; errors: string[] };

export function parsePlanDocument(value: unknown): ParseResult<PlanDocument> {
  const result = planDocumentSchema.safeParse(value);
  return result.success ? { ok: true, value: result.data } : { ok: false, errors: describeIssues(result.error) };
}
