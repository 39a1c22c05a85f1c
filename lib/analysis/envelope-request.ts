// Which pressure envelopes an analysis answer carries. By default none: an answer lists each
// resonance's frequency, Q, bandwidth, nodes and antinodes, and the envelope (hundreds of samples per
// resonance, drawn one at a time by the editor's mode overlay) comes only when asked for:
//   include=envelopes        every resonance's envelope
//   envelopes=3,4,10         the envelopes of those orders (orders the answer does not list are skipped)
// These zod schemas are the one definition of the query parameters of POST /api/v1/analyze and
// GET /api/v1/plans/{planId}/results; the routes' documentation is written from them.
import { z } from 'zod';
import { MAX_RESONANCES } from '@/lib/acoustic';
import { text } from '@/lib/text';
import { parseWith } from '@/lib/validation';

export type EnvelopeRequest = { kind: 'none' } | { kind: 'all' } | { kind: 'orders'; orders: number[] };

export const NO_ENVELOPES: EnvelopeRequest = { kind: 'none' };

/** The parts an answer can be asked to include on top of its default content. */
export const INCLUDABLE_PARTS = ['envelopes'] as const;

const includeParam = text()
  .regex(/^[a-z]+(,[a-z]+)*$/, `include: name the parts to include, separated by commas: ${INCLUDABLE_PARTS.join(', ')}`)
  .transform((value) => value.split(','))
  .pipe(z.array(z.enum(INCLUDABLE_PARTS, { error: `include: the parts that can be included are ${INCLUDABLE_PARTS.join(', ')}` })));

const ordersParam = text()
  .regex(/^\d{1,6}(,\d{1,6})*$/, 'envelopes: give resonance orders separated by commas, e.g. envelopes=3,4,10')
  .transform((value) => [...new Set(value.split(',').map(Number))])
  .pipe(z.array(z.number().int().min(1, 'envelopes: resonance orders count from 1').max(MAX_RESONANCES, `envelopes: resonance orders go up to ${MAX_RESONANCES}`)));

const envelopeFields = {
  include: includeParam.optional().describe('Parts to add to the answer, comma-separated: "envelopes" adds every resonance\'s pressureEnvelope.'),
  envelopes: ordersParam.optional().describe('Resonance orders, comma-separated, whose pressureEnvelope the answer carries.'),
};

const unknownParameter = (known: string) => (issue: z.core.$ZodRawIssue) =>
  issue.code === 'unrecognized_keys' ? `unknown query parameter ${(issue.keys as string[]).join(', ')}: this route takes ${known}` : undefined;

const notBoth = <T extends { include?: string[]; envelopes?: number[] }>(query: T) => !(query.include?.includes('envelopes') && query.envelopes);
const NOT_BOTH = { message: 'envelopes: give include=envelopes (every envelope) or envelopes=<orders> (chosen ones), not both', path: ['envelopes'] };

/** Query of POST /api/v1/analyze. */
export const analyzeQuerySchema = z.strictObject(envelopeFields, { error: unknownParameter('include and envelopes') }).refine(notBoth, NOT_BOTH);

/** Query of GET /api/v1/plans/{planId}/results: the same, and runId to compute envelopes for that run only. */
export const planResultsQuerySchema = z
  .strictObject({
    ...envelopeFields,
    runId: text().min(1).max(200, 'runId: at most 200 characters').optional().describe('Only this run\'s resonances carry the envelopes asked for (the others none).'),
  }, { error: unknownParameter('include, envelopes and runId') })
  .refine(notBoth, NOT_BOTH);

/** A query string as the schemas read it: each parameter once (a repeated one is joined with commas). */
export function queryObject(params: URLSearchParams): Record<string, string> {
  const query: Record<string, string> = {};
  for (const name of new Set(params.keys())) query[name] = params.getAll(name).join(',');
  return query;
}

export function envelopeRequestOf(query: { include?: string[]; envelopes?: number[] }): EnvelopeRequest {
  if (query.include?.includes('envelopes')) return { kind: 'all' };
  if (query.envelopes) return { kind: 'orders', orders: query.envelopes };
  return NO_ENVELOPES;
}

/** The envelopes asked for in POST /api/v1/analyze's query; a bad parameter is a 400 naming it. */
export function analyzeEnvelopeRequest(url: string): EnvelopeRequest {
  return envelopeRequestOf(parseWith(analyzeQuerySchema, queryObject(new URL(url).searchParams)));
}

/** The envelopes asked for in the plan results' query, and the run they are asked for (null: every run). */
export function planResultsRequest(url: string): { envelopes: EnvelopeRequest; runId: string | null } {
  const query = parseWith(planResultsQuerySchema, queryObject(new URL(url).searchParams));
  return { envelopes: envelopeRequestOf(query), runId: query.runId ?? null };
}

export function wantsEnvelope(request: EnvelopeRequest, order: number): boolean {
  return request.kind === 'all' || (request.kind === 'orders' && request.orders.includes(order));
}
