// A write from a browser carries its page's Origin; one from another site is refused. Shared by
// the route wrapper and the server-action check (lib/server-actions/check-request.ts).
import { verifyRequestOrigin } from 'lucia';
import { AppError } from '@/lib/errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export function assertSameOrigin(request: Request): void {
  if (SAFE_METHODS.has(request.method)) return;
  const origin = request.headers.get('origin');
  if (!origin) return; // scripts and API clients send no Origin; browsers always do on writes
  const host = request.headers.get('x-forwarded-host') ?? request.headers.get('host');
  if (!host || !verifyRequestOrigin(origin, [host])) {
    throw new AppError('forbidden', 'This request came from another site and was refused.');
  }
}
