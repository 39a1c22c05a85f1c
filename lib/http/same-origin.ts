// A write from a browser carries its page's Origin; one from anywhere but the app's own public
// address (ANTINODE_BASE_URL) is refused. The comparison is with that setting, never with the
// request's Host or X-Forwarded-Host, which whoever sends the request chooses. Shared by the
// route wrapper and the server-action check (lib/server-actions/check-request.ts).
import { AppError } from '@/lib/errors';
import { appUrl } from '@/lib/tokens';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The origin the app is served from, as browsers send it: scheme, host and port. */
export function publicOrigin(): string {
  return new URL(appUrl('/')).origin;
}

export function assertSameOrigin(request: Request): void {
  if (SAFE_METHODS.has(request.method)) return;
  const origin = request.headers.get('origin');
  if (!origin) return; // scripts and API clients send no Origin; browsers always do on writes
  if (origin !== publicOrigin()) {
    throw new AppError('forbidden', `This request came from another site (${origin.slice(0, 100)}) and was refused.`);
  }
}
