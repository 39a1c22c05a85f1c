// The check of a server action call that the proxy (proxy.ts) makes before Next decodes it.
// Next answers 500 to a body it cannot decode, to a call from another site and to a body over
// its limit; here those are a 400, a 403 and a 413. The body is read under the limit, chunk by
// chunk, whether or not Content-Length was sent.
import { AppError } from '@/lib/errors';
import { readBodyBytes } from '@/lib/http/body';
import { assertSameOrigin } from '@/lib/http/same-origin';
import { plainReplyProblem } from './plain-reply';

// Also set as Next's own limit (experimental.serverActions.bodySizeLimit in next.config.mjs).
export const MAX_ACTION_BODY_BYTES = 256 * 1024;

export interface Refusal { status: number; message: string }

const INVALID = 'Invalid Server Action request';

function refusal(error: unknown): Refusal {
  if (error instanceof AppError) return { status: error.status, message: error.message };
  throw error;
}

/** Null when Next may decode and run the call; otherwise the answer to give instead. */
export async function checkActionRequest(request: Request): Promise<Refusal | null> {
  if (request.method !== 'POST') return null; // Next runs actions on POST only
  try {
    assertSameOrigin(request);
  } catch (error) {
    return refusal(error);
  }
  // React sends plain arguments as one text/plain JSON body. A multipart body would be a form
  // posted without JavaScript (this app has none) or arguments that are not plain data.
  const type = request.headers.get('content-type') ?? '';
  if (!/^text\/plain(;|$)/i.test(type)) {
    return { status: 400, message: `${INVALID}: the arguments must be sent as text/plain JSON (this app's actions take plain data).` };
  }
  let body: Uint8Array;
  try {
    body = await readBodyBytes(request, { maxBytes: MAX_ACTION_BODY_BYTES });
  } catch (error) {
    return refusal(error);
  }
  let value: unknown;
  try {
    value = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(body));
  } catch {
    return { status: 400, message: `${INVALID}: the body is not UTF-8 JSON.` };
  }
  const problem = plainReplyProblem(value);
  return problem ? { status: 400, message: `${INVALID}: ${problem}.` } : null;
}
