// The one wrapper every route handler goes through: origin check, who is asking, the
// permission map, the URL's ids, body reading under a size limit, errors in one shape, and the
// security headers on every answer (lib/http/security-headers.ts).
import { z } from 'zod';
import { actorFromSessionId, sessionIdFromCookieHeader, type Actor, type TeamMembership } from '@/lib/auth/actor';
import { actorFromBearer, bearerToken } from '@/lib/auth/api-tokens';
import { assertMayAct } from '@/lib/auth/may-act';
import { isDatabaseUnreachable } from '@/lib/db';
import { AppError, notSignedIn } from '@/lib/errors';
import type { Action } from '@/lib/permissions';
import { zodToAppError } from '@/lib/validation';
import { readBodyText, readFormBody, readJsonBody, type BodyLimit } from './body';
import { consumeRateLimit, type RateLimitName } from './rate-limit';
import { assertRouteParams } from './route-params';
import { assertSameOrigin } from './same-origin';
import { withApiSecurityHeaders } from './security-headers';

export type Access = 'public' | 'signed-in' | Action;

export interface RouteContext<Params> {
  request: Request;
  params: Params;
  actor: Actor | null;
  // Present whenever access names an action: the active team and the role checked.
  team: TeamMembership | null;
  // The body, read under the route's limit (maxBodyBytes): never read it from `request` directly.
  readJson: <T extends z.ZodType>(schema: T) => Promise<z.infer<T>>;
  readText: () => Promise<string>;
  readForm: (field: string) => Promise<FormData>;
}

export interface RouteOptions {
  access: Access;
  maxBodyBytes?: number;
  // The refusal of a body over maxBytes, when the default ("over N KB") would not say enough.
  tooLarge?: BodyLimit['tooLarge'];
  // Counts each call against the person's rate limit of that name (lib/http/rate-limit.ts).
  rateLimit?: RateLimitName;
  // Only a signed-in browser session, never an API token (managing the tokens themselves).
  sessionOnly?: boolean;
}

/** Who is asking: an API token's person (Authorization: Bearer) or the session cookie's. */
async function actorOf(request: Request, sessionOnly: boolean): Promise<Actor | null> {
  const authorization = request.headers.get('authorization');
  if (authorization !== null) {
    if (sessionOnly) throw new AppError('forbidden', 'API tokens cannot do this; sign in on the account page.');
    const token = bearerToken(authorization);
    if (!token) throw new AppError('not_signed_in', 'Send the API token as "Authorization: Bearer <token>".');
    return actorFromBearer(token);
  }
  return actorFromSessionId(sessionIdFromCookieHeader(request.headers.get('cookie')));
}

export type RouteHandler = ((request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>) & {
  access: Access;
};

const DEFAULT_MAX_BODY_BYTES = 256 * 1024;

export function json(data: unknown, status = 200, headers: HeadersInit = {}): Response {
  return Response.json(data, { status, headers });
}

/** An answer already serialised as JSON (made off the request thread). */
export function jsonText(text: string, status = 200): Response {
  return new Response(text, { status, headers: { 'content-type': 'application/json' } });
}

/** What a request meets while PostgreSQL is down or restarting (503; the editor keeps its edits and saves again). */
export const DATABASE_UNREACHABLE = 'The server cannot reach its database just now; it may be restarting. Try again in a few seconds.';
const DATABASE_RETRY_AFTER_S = 5;

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    const headers: Record<string, string> = {};
    if (error.retryAfterS !== undefined) headers['Retry-After'] = String(error.retryAfterS);
    return json(error.toBody(), error.status, headers);
  }
  if (error instanceof z.ZodError) return errorResponse(zodToAppError(error));
  if (error instanceof RangeError) return errorResponse(new AppError('bad_input', error.message));
  if (isDatabaseUnreachable(error)) {
    console.warn('[api] the database is not answering:', error instanceof Error ? error.message : error);
    return errorResponse(new AppError('busy', DATABASE_UNREACHABLE, { retryAfterS: DATABASE_RETRY_AFTER_S }));
  }
  console.error('[api] unexpected error', error);
  return json({ error: { code: 'internal', message: 'Something went wrong on the server. Nothing was changed; try again.' } }, 500);
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
        actor = await actorOf(request, options.sessionOnly ?? false);
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
      assertRouteParams(params);
      const limit: BodyLimit = { maxBytes: options.maxBodyBytes ?? DEFAULT_MAX_BODY_BYTES, tooLarge: options.tooLarge };
      const response = await handler({
        request, params, actor, team,
        readJson: (schema) => readJsonBody(request, schema, limit),
        readText: () => readBodyText(request, limit),
        readForm: (field) => readFormBody(request, limit, field),
      });
      if (actor?.refreshedCookie && !response.headers.has('set-cookie')) {
        response.headers.append('set-cookie', actor.refreshedCookie.serialize());
      }
      return withApiSecurityHeaders(response);
    } catch (error) {
      return withApiSecurityHeaders(errorResponse(error));
    }
  };
  return Object.assign(wrapped, { access: options.access });
}
