// Finds every route handler under app/api and calls it directly, as Next would.
import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { PEER_HEADER } from '@/lib/http/client-address';
import type { RouteHandler } from '@/lib/http/route';

export const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
export type Method = (typeof METHODS)[number];

export interface RouteFile { urlPath: string; file: string; params: string[] }

export function listRouteFiles(root = path.resolve('app/api')): RouteFile[] {
  const found: RouteFile[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const full = path.join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else if (name === 'route.ts') {
        const relative = path.relative(path.resolve('app'), path.dirname(full)).split(path.sep);
        found.push({
          file: full,
          urlPath: '/' + relative.filter((part) => !part.startsWith('(')).join('/'),
          params: relative.filter((part) => part.startsWith('[')).map((part) => part.replace(/^\[+\.*|\]+$/g, '')),
        });
      }
    }
  };
  walk(root);
  return found.sort((a, b) => a.urlPath.localeCompare(b.urlPath));
}

export async function loadHandlers(route: RouteFile): Promise<Partial<Record<Method, RouteHandler>>> {
  const module = (await import(route.file)) as Record<string, unknown>;
  const handlers: Partial<Record<Method, RouteHandler>> = {};
  for (const method of METHODS) if (typeof module[method] === 'function') handlers[method] = module[method] as RouteHandler;
  return handlers;
}

// The address requests of this test file come from (the server's peer header, as
// scripts/serve.mjs sets it): one per file, so the per-address budgets one file spends do not
// hold back another's.
export const FILE_PEER = `10.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}.${1 + Math.floor(Math.random() * 250)}`;

/** A fresh peer address, for a request that must not meet a per-address budget another spent. */
export function freshPeer(): Record<string, string> {
  const part = (from: number, span: number) => from + Math.floor(Math.random() * span);
  return { [PEER_HEADER]: `100.${part(64, 60)}.${part(0, 250)}.${part(1, 250)}` };
}

export async function call(
  handler: RouteHandler,
  method: Method,
  urlPath: string,
  // body is sent as JSON; rawBody (for bodies that may not be JSON at all) exactly as given.
  options: { cookie?: string; body?: unknown; rawBody?: string; params?: Record<string, string>; headers?: Record<string, string> } = {},
): Promise<{ status: number; body: unknown; headers: Headers }> {
  const headers: Record<string, string> = { host: 'localhost', [PEER_HEADER]: FILE_PEER, ...options.headers };
  if (options.cookie) headers.cookie = options.cookie;
  let body: string | undefined = options.rawBody;
  if (options.body !== undefined) body = JSON.stringify(options.body);
  if (body !== undefined) headers['content-type'] = 'application/json';
  const request = new Request(`http://localhost${urlPath}`, { method, headers, body });
  const response = await handler(request, { params: Promise.resolve(options.params ?? {}) });
  const text = await response.text();
  let parsed: unknown = text;
  try { parsed = text ? JSON.parse(text) : null; } catch { /* not JSON */ }
  return { status: response.status, body: parsed, headers: response.headers };
}
