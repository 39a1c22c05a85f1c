// A JSON Schema (as the OpenAPI document holds it) read as rows of a table for people: each field's
// name, type in words, whether it is required, its limits and what it means. Nested objects and
// arrays of objects give rows of their own (segments[].lengthM), down to a set depth.
import type { JsonSchema } from './types';

export interface FieldRow {
  name: string;
  type: string;
  required: boolean;
  limits: string;
  description: string;
}

type Resolve = (ref: string) => JsonSchema | undefined;

function resolved(schema: JsonSchema, resolve: Resolve): JsonSchema {
  return typeof schema.$ref === 'string' ? resolve(schema.$ref) ?? {} : schema;
}

function variants(schema: JsonSchema): JsonSchema[] | null {
  const list = (schema.oneOf ?? schema.anyOf) as JsonSchema[] | undefined;
  return Array.isArray(list) ? list : null;
}

/** A variant of a tagged union in words: closed | open (flange) | lined (absorption). */
function variantWords(variant: JsonSchema, resolve: Resolve): string {
  const schema = resolved(variant, resolve);
  if (schema.type !== 'object') return typeWords(schema, resolve);
  const properties = (schema.properties ?? {}) as Record<string, JsonSchema>;
  const tag = Object.values(properties).find((property) => property.const !== undefined)?.const;
  const others = Object.entries(properties).filter(([, property]) => property.const === undefined).map(([name]) => name);
  const head = tag !== undefined ? `"${String(tag)}"` : 'object';
  return others.length > 0 ? `${head} (${others.join(', ')})` : head;
}

export function typeWords(input: JsonSchema, resolve: Resolve): string {
  const schema = resolved(input, resolve);
  const options = variants(schema);
  if (options) {
    const words = options.map((option) => variantWords(option, resolve));
    return [...new Set(words)].join(' | ');
  }
  if (schema.const !== undefined) return JSON.stringify(schema.const);
  if (Array.isArray(schema.enum)) return (schema.enum as unknown[]).map((value) => JSON.stringify(value)).join(' | ');
  if (schema.type === 'array') return `array of ${typeWords((schema.items ?? {}) as JsonSchema, resolve)}`;
  if (schema.type === 'string' && schema.format === 'uuid') return 'id (UUID)';
  if (schema.type === 'string' && schema.format === 'email') return 'e-mail address';
  if (schema.type === 'integer') return 'whole number';
  if (typeof schema.type === 'string') return schema.type;
  return 'any';
}

/** A limit as shown to people: a negative one with the minus sign "−" (as lib/signed-number.ts does). */
function shown(value: number): string {
  return String(value).replace(/^-/, '\u2212');
}

export function limitWords(input: JsonSchema, resolve: Resolve): string {
  const schema = resolved(input, resolve);
  const parts: string[] = [];
  const number = (key: string) => (typeof schema[key] === 'number' ? (schema[key] as number) : undefined);
  const bound = (sign: string, key: string) => (number(key) !== undefined ? `${sign} ${shown(number(key)!)}` : null);
  const lower = bound('≥', 'minimum') ?? bound('>', 'exclusiveMinimum');
  const upper = (number('maximum') !== undefined && number('maximum')! < Number.MAX_SAFE_INTEGER ? bound('≤', 'maximum') : null) ?? bound('<', 'exclusiveMaximum');
  if (lower) parts.push(lower);
  if (upper) parts.push(upper);
  if (number('minLength') !== undefined || number('maxLength') !== undefined) parts.push(`${number('minLength') ?? 0}–${number('maxLength') ?? '…'} characters`);
  if (number('minItems') !== undefined || number('maxItems') !== undefined) parts.push(`${number('minItems') ?? 0}–${number('maxItems') ?? '…'} items`);
  if (typeof schema.pattern === 'string' && schema.format === undefined) parts.push(`pattern ${schema.pattern}`);
  if (schema.default !== undefined) parts.push(`default ${JSON.stringify(schema.default)}`);
  return parts.join(', ');
}

/** The object a schema describes (itself, or the items of an array of objects), or null. */
function objectOf(input: JsonSchema, resolve: Resolve): JsonSchema | null {
  const schema = resolved(input, resolve);
  if (schema.type === 'object' && schema.properties) return schema;
  if (schema.type === 'array' && schema.items) return objectOf(schema.items as JsonSchema, resolve);
  return null;
}

export function fieldRows(input: JsonSchema, resolve: Resolve, depth = 2, prefix = ''): FieldRow[] {
  const schema = objectOf(input, resolve);
  if (!schema || depth === 0) return [];
  const required = new Set((schema.required ?? []) as string[]);
  return Object.entries(schema.properties as Record<string, JsonSchema>).flatMap(([name, property]) => {
    const target = resolved(property, resolve);
    const row: FieldRow = {
      name: `${prefix}${name}`,
      type: typeWords(target, resolve),
      required: required.has(name),
      limits: limitWords(target, resolve),
      description: typeof (property.description ?? target.description) === 'string' ? String(property.description ?? target.description) : '',
    };
    const inner = target.type === 'array' ? `${prefix}${name}[].` : `${prefix}${name}.`;
    return [row, ...fieldRows(target, resolve, depth - 1, inner)];
  });
}

/** Resolves "#/components/schemas/…" in a document. */
export function resolverOf(document: { components: { schemas: Record<string, JsonSchema> } }): Resolve {
  return (ref) => document.components.schemas[ref.replace('#/components/schemas/', '')];
}
