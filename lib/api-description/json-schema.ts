// zod → JSON Schema draft 2020-12 (the dialect of OpenAPI 3.1), with zod's own converter. The input
// side is described, since that is what a caller sends (a transform's output is the server's business).
import { z } from 'zod';
import type { HandQueryParameter, JsonSchema } from './types';

/** Where definitions that a schema refers to (a recursive one's) go: the document's components.schemas. */
export interface DefinitionSink {
  schemas: Record<string, JsonSchema>;
  /** Names a definition zod left unnamed, unique within the document. */
  prefix: string;
}

function withRefsRenamed(value: unknown, names: Map<string, string>): unknown {
  if (Array.isArray(value)) return value.map((entry) => withRefsRenamed(entry, names));
  if (typeof value !== 'object' || value === null) return value;
  return Object.fromEntries(Object.entries(value).map(([key, entry]) => [
    key,
    key === '$ref' && typeof entry === 'string' && names.has(entry) ? names.get(entry) : withRefsRenamed(entry, names),
  ]));
}

/**
 * The schema as JSON Schema. Definitions it refers to (`$defs`, from a recursive schema) move into the
 * sink, since inside an OpenAPI document "#/…" means the document's own root.
 */
export function jsonSchemaOf(schema: z.ZodType, sink?: DefinitionSink): JsonSchema {
  const converted = z.toJSONSchema(schema, { target: 'draft-2020-12', io: 'input', unrepresentable: 'any' }) as JsonSchema;
  delete converted.$schema;
  const defs = converted.$defs as Record<string, JsonSchema> | undefined;
  if (!defs) return converted;
  if (!sink) throw new Error('This schema refers to definitions of its own: give jsonSchemaOf a place to put them.');
  delete converted.$defs;
  const names = new Map(Object.keys(defs).map((name) => [`#/$defs/${name}`, `#/components/schemas/${name.startsWith('__') ? `${sink.prefix}Part${name.replace(/^_+schema/, '')}` : name}`]));
  for (const [name, definition] of Object.entries(defs)) {
    const target = names.get(`#/$defs/${name}`)!.replace('#/components/schemas/', '');
    const renamed = withRefsRenamed(definition, names) as JsonSchema;
    const earlier = sink.schemas[target];
    if (earlier && JSON.stringify(earlier) !== JSON.stringify(renamed)) throw new Error(`Two different schemas are both named ${target}.`);
    sink.schemas[target] = renamed;
  }
  return withRefsRenamed(converted, names) as JsonSchema;
}

export type QueryParameterObject = {
  name: string;
  in: 'query';
  required: boolean;
  description?: string;
  schema: JsonSchema;
};

/** Each property of a query's zod object as one query parameter, its description lifted out. */
export function queryParametersOf(schema: z.ZodType): QueryParameterObject[] {
  const converted = jsonSchemaOf(schema);
  const properties = (converted.properties ?? {}) as Record<string, JsonSchema>;
  const required = new Set((converted.required ?? []) as string[]);
  return Object.entries(properties).map(([name, property]) => {
    const { description, ...rest } = property;
    return { name, in: 'query', required: required.has(name), ...(typeof description === 'string' ? { description } : {}), schema: rest };
  });
}

export function handQueryParameters(parameters: HandQueryParameter[]): QueryParameterObject[] {
  return parameters.map((parameter) => ({ name: parameter.name, in: 'query', required: false, description: parameter.description, schema: parameter.schema }));
}

/** The names of a path's parameters: /api/v1/plans/{planId} → ['planId']. */
export function pathParameterNames(path: string): string[] {
  return [...path.matchAll(/\{([^}]+)\}/g)].map((match) => match[1]);
}
