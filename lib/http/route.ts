// The one wrapper every route handler goes through: origin check, who is asking, the
// permission map, body parsing with a size limit, and errors in one shape.
import { verifyRequestOrigin } from 'lucia';
import { z } from 'zod';
import { actorFromSessionId, sessionIdFromCookieHeader, type Actor, type TeamMembership } from '@/lib/auth/actor';
import { assertMayAct } from '@/lib/auth/may-act';
import { AppError, notSignedIn } from '@/lib/errors';
import type { Action } from '@/lib/permissions';
import { zodToAppError } from '@/lib/validation';
import { consumeRateLimit, type RateLimitName } from './rate-limit';

export type Access = 'public' | 'signed-in' | Action;

export interface RouteContext<Params> {
  request: Request;
  params: Params;
  actor: Actor | null;
  // Present whenever access names an action: the active team and the role checked.
  team: TeamMembership | null;
  readJson: <T extends z.ZodType>(schema: T) => Promise<z.infer<T>>;
}

export interface RouteOptions { access: Access; maxBodyBytes?: number; rateLimit?: RateLimitName }

export type RouteHandler = ((request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>) & {
  access: Access;
};

const DEFAULT_MAX_BODY_BYTES = 256 * 1024;
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export function json(data: unknown, status = 200, headers: HeadersInit = {}): Response {
  return Response.json(data, { status, headers });
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    const headers: Record<string, string> = {};
    if (error.retryAfterS !== undefined) headers['Retry-After'] = String(error.retryAfterS);
    return json(error.toBody(), error.status, headers);
  }
  if (error instanceof z.ZodError) return errorResponse(zodToAppError(error));
  if (error instanceof RangeError) return errorResponse(new AppError('bad_input', error.message));
  console.error('[api] unexpected error', error);
  return json({ error: { code: 'internal', message: 'Something went wrong on the server. Nothing was changed; try again.' } }, 500);
}

export function clientAddress(request: Request): string | null {
  return request.headers.get('x-forwarded-for')?.split(',')[0]?.trim() || request.headers.get('x-real-ip') || null;
}

function assertSameOrigin(request: Request): void {
  if (SAFE_METHODS.has(request.method)) return;
  const origin = request.headers.get('origin');
  if (!origin) return; // scripts and API clients send no Origin; browsers always do on writes
  const host = request.headers.get('x-forwarded-host') ?? request.headers.get('host');
  if (!host || !verifyRequestOrigin(origin, [host])) {
    throw new AppError('forbidden', 'This request came from another site and was refused.');
  }
}

async function readBody<T extends z.ZodType>(request: Request, schema: T, maxBytes: number): Promise<z.infer<T>> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > maxBytes) throw new AppError('too_large', `The request body is over ${Math.round(maxBytes / 1024)} KB.`);
  const text = await request.text();
  if (Buffer.byteLength(text) > maxBytes) throw new AppError('too_large', `The request body is over ${Math.round(maxBytes / 1024)} KB.`);
  if (!text.trim()) throw new AppError('bad_input', 'The request needs a JSON body.');
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError('bad_input', 'The request body is not valid JSON.');
  }
  const result = schema.safeParse(value);
  if (!result.success) throw zodToAppError(result.error);
  return result.data;
}

export function route<Params extends Record<string, string> = Record<string, never>>(
  options: RouteOptions,
  handler: (context: RouteContext<Params>) => Promise<Response>,
): RouteHandler {
  const wrapped = async (request: Request, context: { params: Promise<Record<string, string>> }): Promise<Response> => {
    let actor: Actor | null = null;
    try {
      assertSameOrigin(request);
      if (options.access !== 'public') {
        actor = await actorFromSessionId(sessionIdFromCookieHeader(request.headers.get('cookie')));
        if (!actor) throw notSignedIn();
      }
      let team: TeamMembership | null = actor?.team ?? null;
      if (options.access !== 'public' && options.access !== 'signed-in') {
        await assertMayAct(team, options.access);
      } else if (options.access === 'public') {
        team = null;
      }
      if (options.rateLimit && actor) await consumeRateLimit(options.rateLimit, actor.user.id);
      const params = ((await context?.params) ?? {}) as Params;
      const maxBytes = options.maxBodyBytes ?? DEFAULT_MAX_BODY_BYTES;
      const response = await handler({ request, params, actor, team, readJson: (schema) => readBody(request, schema, maxBytes) });
      if (actor?.refreshedCookie && !response.headers.has('set-cookie')) {
        response.headers.append('set-cookie', actor.refreshedCookie.serialize());
      }
      return response;
    } catch (error) {
      return errorResponse(error);
    }
  };
  return Object.assign(wrapped, { access: options.access });
}
