// Client-side JSON calls to /api/v1 with the one error shape turned into a result.
import type { ErrorBody } from '@/lib/errors';

export type ApiResult<T> = { ok: true; status: number; data: T } | { ok: false; status: number; error: ErrorBody['error'] };

export async function apiFetch<T>(url: string, options: { method?: string; body?: unknown; signal?: AbortSignal } = {}): Promise<ApiResult<T>> {
  let response: Response;
  try {
    response = await fetch(url, {
      method: options.method ?? 'GET',
      headers: options.body === undefined ? undefined : { 'content-type': 'application/json' },
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (error) {
    if ((error as Error).name === 'AbortError') throw error;
    return { ok: false, status: 0, error: { code: 'internal', message: 'The server could not be reached. Check the connection; nothing was lost on this page.' } };
  }
  const text = await response.text();
  let parsed: unknown = null;
  try { parsed = text ? JSON.parse(text) : null; } catch { /* not JSON */ }
  if (response.ok) return { ok: true, status: response.status, data: parsed as T };
  const error = (parsed as ErrorBody | null)?.error ?? { code: 'internal' as const, message: `The server answered ${response.status}.` };
  return { ok: false, status: response.status, error };
}
