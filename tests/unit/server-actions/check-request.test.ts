// The check the proxy makes of a server action call before Next decodes it. Statuses from
// RFC 9110: 400 Bad Request (§15.5.1), 403 Forbidden (§15.5.4), 413 Content Too Large (§15.5.14).
import { describe, expect, it } from 'vitest';
import { checkActionRequest, MAX_ACTION_BODY_BYTES } from '@/lib/server-actions/check-request';

function actionCall(body: BodyInit, headers: Record<string, string> = {}): Request {
  return new Request('http://localhost:3000/sign-in', {
    method: 'POST', headers: { host: 'localhost:3000', 'next-action': '40b0aac2f233d30b4c56447da9050ab14b0baa1166', 'content-type': 'text/plain;charset=UTF-8', ...headers }, body, duplex: 'half',
  } as RequestInit);
}

describe('checkActionRequest', () => {
  it('lets a plain call through, from the same site or from no browser at all', async () => {
    expect(await checkActionRequest(actionCall('[{"email":"a@b.test","password":"x"}]'))).toBeNull();
    expect(await checkActionRequest(actionCall('["$undefined"]', { origin: 'http://localhost:3000' }))).toBeNull();
  });

  it('leaves requests other than POST to Next, which runs actions on POST only', async () => {
    expect(await checkActionRequest(new Request('http://localhost:3000/sign-in', { headers: { 'next-action': 'x' } }))).toBeNull();
  });

  it('refuses a call from another site with 403', async () => {
    expect(await checkActionRequest(actionCall('[1]', { origin: 'https://elsewhere.example' }))).toMatchObject({ status: 403 });
  });

  it('refuses a body that is not text/plain JSON, or not UTF-8, or not JSON, with 400', async () => {
    expect(await checkActionRequest(actionCall('--x--', { 'content-type': 'multipart/form-data; boundary=x' }))).toMatchObject({ status: 400 });
    expect(await checkActionRequest(actionCall('[1]', { 'content-type': 'application/json' }))).toMatchObject({ status: 400 });
    expect(await checkActionRequest(actionCall(new Uint8Array([0x5b, 0xc3, 0x28, 0x5d])))).toMatchObject({ status: 400, message: expect.stringContaining('not UTF-8 JSON') });
    expect(await checkActionRequest(actionCall('garbage{{'))).toMatchObject({ status: 400 });
    expect(await checkActionRequest(actionCall(''))).toMatchObject({ status: 400 });
    expect(await checkActionRequest(actionCall('["$Q5"]'))).toMatchObject({ status: 400, message: expect.stringContaining('$Q5') });
  });

  it('refuses a chunked body over the limit with 413 after reading little more than the limit', async () => {
    const chunk = new Uint8Array(4096).fill(0x20);
    let pulled = 0;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) { pulled += chunk.byteLength; controller.enqueue(chunk); }, // never ends
    }, { highWaterMark: 0 });
    expect(await checkActionRequest(actionCall(body))).toMatchObject({ status: 413 });
    expect(pulled).toBeLessThanOrEqual(MAX_ACTION_BODY_BYTES + 2 * chunk.byteLength);
  });
});
