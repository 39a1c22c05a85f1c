// Request bodies read chunk by chunk and cut at a limit, with or without Content-Length: a body
// over the limit is refused (413) as soon as the count passes it, and the rest is never read.
import type { z } from 'zod';
import { assertCleanInput } from '@/lib/clean-input';
import { AppError } from '@/lib/errors';
import { parseExactly } from '@/lib/validation';

export interface BodyLimit {
  maxBytes: number;
  // The refusal when the body is over maxBytes; by default it names the limit in KB.
  tooLarge?: { message: string; field?: string };
}

function tooLargeError(limit: BodyLimit): AppError {
  const message = limit.tooLarge?.message ?? `The request body is over ${Math.round(limit.maxBytes / 1024)} KB.`;
  return new AppError('too_large', message, { field: limit.tooLarge?.field });
}

export async function readBodyBytes(request: Request, limit: BodyLimit): Promise<Uint8Array<ArrayBuffer>> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > limit.maxBytes) throw tooLargeError(limit);
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read().catch(() => {
      throw new AppError('bad_input', 'The request body could not be read to its end (the connection was cut).');
    });
    if (done) break;
    total += value.byteLength;
    if (total > limit.maxBytes) {
      // Stop the source; what is still on its way is discarded, never buffered.
      await reader.cancel().catch(() => undefined);
      throw tooLargeError(limit);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}

/** The body as text, decoded like `Request.text()` (invalid UTF-8 becomes U+FFFD). */
export async function readBodyText(request: Request, limit: BodyLimit): Promise<string> {
  return new TextDecoder().decode(await readBodyBytes(request, limit));
}

const strictUtf8 = new TextDecoder('utf-8', { fatal: true });

/** application/json, or a type ending in +json, with any parameters. */
export function isJsonContentType(value: string | null): boolean {
  return /^application\/([\w.-]+\+)?json\s*(;|$)/i.test(value ?? '');
}

/**
 * A JSON body: sent as JSON (415 otherwise, before anything is read), valid UTF-8 and JSON,
 * clean text and bounded nesting, then the schema, which must know every key.
 */
export async function readJsonBody<T extends z.ZodType>(request: Request, schema: T, limit: BodyLimit): Promise<z.infer<T>> {
  if (!isJsonContentType(request.headers.get('content-type'))) {
    throw new AppError('unsupported_media_type', 'Send the body as JSON, with the header Content-Type: application/json.');
  }
  let text: string;
  try {
    text = strictUtf8.decode(await readBodyBytes(request, limit));
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw new AppError('bad_input', 'The request body is not valid UTF-8 text.');
  }
  if (!text.trim()) throw new AppError('bad_input', 'The request needs a JSON body.');
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError('bad_input', 'The request body is not valid JSON.');
  }
  assertCleanInput(value);
  return parseExactly(schema, value);
}

/** A multipart/form-data body, parsed only once it is known to be within the limit. */
export async function readFormBody(request: Request, limit: BodyLimit, field: string): Promise<FormData> {
  const bytes = await readBodyBytes(request, limit);
  try {
    return await new Response(bytes, { headers: { 'content-type': request.headers.get('content-type') ?? '' } }).formData();
  } catch {
    throw new AppError('bad_input', `Send the file as multipart/form-data in a field named “${field}”.`, { field });
  }
}
