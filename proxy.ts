// Runs before Next handles a page request (the matcher leaves out the API, which the route
// wrapper covers, and the static files, which next.config.mjs covers):
// - every page gets a fresh script nonce, passed to Next in the request's Content-Security-Policy
//   (Next puts it on its own scripts) and sent back with the security headers
//   (lib/http/security-headers.ts);
// - server action calls (a Next-Action header, or a multipart post, which Next tries as a form
//   action) are checked first (lib/server-actions/check-request.ts): Next decodes their bodies
//   itself and answers 500 to one it cannot decode.
import { NextResponse } from 'next/server';
import { pageContentSecurityPolicy, pageSecurityHeaders } from '@/lib/http/security-headers';
import { checkActionRequest } from '@/lib/server-actions/check-request';

function isActionCall(request: Request): boolean {
  return request.headers.has('next-action') || /^multipart\/form-data/i.test(request.headers.get('content-type') ?? '');
}

function withHeaders(response: NextResponse, headers: Record<string, string>): NextResponse {
  for (const [name, value] of Object.entries(headers)) response.headers.set(name, value);
  return response;
}

export async function proxy(request: Request): Promise<Response> {
  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString('base64');
  const headers = pageSecurityHeaders(nonce);
  if (isActionCall(request)) {
    const refused = await checkActionRequest(request);
    if (refused) {
      return withHeaders(new NextResponse(refused.message, { status: refused.status, headers: { 'content-type': 'text/plain; charset=utf-8' } }), headers);
    }
  }
  const forwarded = new Headers(request.headers);
  forwarded.set('x-nonce', nonce);
  forwarded.set('content-security-policy', pageContentSecurityPolicy(nonce));
  return withHeaders(NextResponse.next({ request: { headers: forwarded } }), headers);
}

export const config = {
  matcher: ['/((?!api/|_next/static/|_next/image/|fonts/|icon\\.svg|favicon\\.ico).*)'],
};
