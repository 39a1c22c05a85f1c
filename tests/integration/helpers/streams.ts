// Request bodies sent the way a hostile client can: in chunks, with no Content-Length, each
// counting how much of it the server pulled.
export interface CountedBody { body: ReadableStream<Uint8Array>; pulled: () => number }

// `totalBytes` of `fill` bytes in chunks of `chunkBytes`, produced only when pulled.
export function endlessBody(totalBytes: number, chunkBytes: number, fill = 0x20): CountedBody {
  const chunk = new Uint8Array(chunkBytes).fill(fill);
  let pulledBytes = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (pulledBytes >= totalBytes) {
        controller.close();
        return;
      }
      pulledBytes += chunk.byteLength;
      controller.enqueue(chunk);
    },
  }, { highWaterMark: 0 });
  return { body, pulled: () => pulledBytes };
}

// The given bytes, in chunks of `chunkBytes`.
export function chunkedBody(bytes: Uint8Array, chunkBytes: number): CountedBody {
  let offset = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (offset >= bytes.byteLength) {
        controller.close();
        return;
      }
      controller.enqueue(bytes.slice(offset, offset + chunkBytes));
      offset += chunkBytes;
    },
  }, { highWaterMark: 0 });
  return { body, pulled: () => Math.min(offset, bytes.byteLength) };
}

// A POST whose body is the stream, with no Content-Length (fetch sends it chunked).
export function streamedRequest(url: string, body: ReadableStream<Uint8Array>, headers: Record<string, string> = {}): Request {
  return new Request(url, { method: 'POST', headers: { host: 'localhost', ...headers }, body, duplex: 'half' } as RequestInit);
}
