// What the API description says about one operation (one path and method of app/api/v1). Every
// schema named here is the zod object the route itself parses with, imported, never copied.
import type { z } from 'zod';
import type { Access } from '@/lib/http/route';

export const HTTP_METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
export type HttpMethod = (typeof HTTP_METHODS)[number];

/** The areas the reference page groups operations under, in its order. */
export const API_AREAS = ['Analysis', 'Projects and plans', 'Revisions, review and schedules', 'Comments', 'Team', 'Account and sign-in', 'Service'] as const;
export type ApiArea = (typeof API_AREAS)[number];

export type JsonSchema = Record<string, unknown>;

/** A query parameter a route reads by hand (no zod schema of its own). */
export interface HandQueryParameter {
  name: string;
  description: string;
  schema: JsonSchema;
}

export type RequestBody =
  | { kind: 'json'; schema: z.ZodType; example: unknown; exampleSummary: string }
  | { kind: 'form'; field: string; description: string }
  | { kind: 'text'; description: string; header: { name: string; description: string } }
  | { kind: 'none' };

export interface ApiResponse {
  description: string;
  contentType?: 'application/json' | 'application/pdf' | 'text/csv' | 'application/octet-stream';
  /** A zod schema of the answer, where one exists; its example must parse with it. */
  schema?: z.ZodType;
  /** Otherwise the answer's top-level fields, each described in words. */
  fields?: Record<string, string>;
  example?: unknown;
}

/** Refusals particular to an operation, beyond those every operation of its kind can meet. */
export type SpecificRefusal = 409 | 422 | 429;

export interface ApiOperation {
  method: HttpMethod;
  /** OpenAPI form: /api/v1/plans/{planId} (Next's [planId]). */
  path: string;
  area: ApiArea;
  summary: string;
  description?: string;
  /** As the route declares it (checked against the route by the description test). */
  access: Access;
  /** Only a signed-in browser session, never an API token. */
  sessionOnly?: boolean;
  /** Counts against the person's analysis rate limit. */
  rateLimited?: boolean;
  maxBodyBytes?: number;
  query?: { schema: z.ZodType; example?: Record<string, string> } | { parameters: HandQueryParameter[]; example?: Record<string, string> };
  /** Example values of the path's ids, for the example call. */
  pathExample?: Record<string, string>;
  body: RequestBody;
  /** The answer when it works, by status. */
  responses: Partial<Record<200 | 201 | 202, ApiResponse>>;
  refusals?: Partial<Record<SpecificRefusal, string>>;
}
