// The one zod schema of the plan document, shared by the editor and the server.
import { z } from 'zod';
import type { PlanDocument } from './document';

export const MAX_ID_LENGTH = 40;
export const MAX_ITEMS = 5000;
export const MIN_SECTION_M = 0.01;
export const MIN_TEMPERATURE_C = -40;
export const MAX_TEMPERATURE_C = 60;

const idSchema = z
  .string({ error: 'must be an id (text)' })
  .min(1, 'must not be empty')
  .max(MAX_ID_LENGTH, `must be at most ${MAX_ID_LENGTH} characters`);

const finite = (what: string) => z.number({ error: `${what} must be a finite number` });

const sectionSizeM = finite('a section size').min(MIN_SECTION_M, `must be at least ${MIN_SECTION_M} m (10 mm)`).max(10, 'must be at most 10 m');

export const sectionSchema = z.discriminatedUnion(
  'shape',
  [
    z.object({ shape: z.literal('round'), diameterM: sectionSizeM }),
    z.object({ shape: z.literal('rect'), widthM: sectionSizeM, heightM: sectionSizeM }),
  ],
  { error: "shape must be 'round' or 'rect'" },
);

const absorptionSchema = finite('absorption').min(0, 'must be between 0 and 1').max(1, 'must be between 0 and 1');

export const liningSchema = z.object({
  thicknessM: finite('lining thickness').gt(0, 'must be more than 0 m').max(1, 'must be at most 1 m'),
  absorption: absorptionSchema,
});

export const terminationSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('closed') }),
    z.object({ kind: z.literal('open'), flange: z.enum(['flanged', 'unflanged'], { error: "must be 'flanged' or 'unflanged'" }) }),
    z.object({ kind: z.literal('lined'), absorption: absorptionSchema }),
    z.object({ kind: z.literal('anechoic') }),
  ],
  { error: "kind must be 'closed', 'open', 'lined' or 'anechoic'" },
);

export const temperatureCSchema = finite('temperature')
  .min(MIN_TEMPERATURE_C, `must be at least ${MIN_TEMPERATURE_C} °C`)
  .max(MAX_TEMPERATURE_C, `must be at most ${MAX_TEMPERATURE_C} °C`);

export const fanSchema = z.object({
  blades: z.number().int('must be a whole number').min(1, 'must be at least 1').max(100, 'must be at most 100'),
  rpm: finite('speed').gt(0, 'must be more than 0 rpm').max(100000, 'must be at most 100000 rpm'),
});

export const lengthOverrideMSchema = finite('length').gt(0, 'must be more than 0 m').max(100000, 'must be at most 100 km');

const nodeSchema = z.object({ id: idSchema, x: finite('x'), y: finite('y') });

const segmentSchema = z.object({
  id: idSchema,
  from: idSchema,
  to: idSchema,
  section: sectionSchema,
  lining: liningSchema.nullable().optional(),
  lengthOverrideM: lengthOverrideMSchema.nullable().optional(),
});

export const runNameSchema = z.string({ error: 'must be text' }).trim().min(1, 'give the run a name').max(120, 'must be at most 120 characters');

const runSchema = z.object({
  id: idSchema,
  name: runNameSchema,
  startNodeId: idSchema,
  endNodeId: idSchema.nullable(),
  temperatureC: temperatureCSchema,
  fan: fanSchema.nullable(),
  terminations: z.record(idSchema, terminationSchema),
});

const placeholders = z.array(z.record(z.string(), z.unknown())).max(MAX_ITEMS);

const documentShape = z.object({
  schemaVersion: z.literal(1, { error: 'must be 1' }),
  nodes: z.array(nodeSchema).max(MAX_ITEMS, `at most ${MAX_ITEMS} nodes`),
  segments: z.array(segmentSchema).max(MAX_ITEMS, `at most ${MAX_ITEMS} segments`),
  runs: z.array(runSchema).max(MAX_ITEMS, `at most ${MAX_ITEMS} runs`),
  rooms: placeholders,
  outlets: placeholders,
  listeners: placeholders,
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
    for (const nodeId of Object.keys(run.terminations)) {
      if (!nodeIds.has(nodeId)) context.addIssue({ code: 'custom', path: ['runs', index, 'terminations', nodeId], message: `names node "${nodeId}", which does not exist` });
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
