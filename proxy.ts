// Runs before Next handles a request, for server action calls only (the matcher): those with a
// Next-Action header, and multipart posts to a page, which Next tries as form actions. Next
// decodes their bodies itself and answers 500 to one it cannot decode, so they are checked here
// first (lib/server-actions/check-request.ts). No other request comes through here.
import { NextResponse } from 'next/server';
import { checkActionRequest } from '@/lib/server-actions/check-request';

export async function proxy(request: Request): Promise<Response> {
  const refused = await checkActionRequest(request);
  if (!refused) return NextResponse.next();
  return new NextResponse(refused.message, { status: refused.status, headers: { 'content-type': 'text/plain; charset=utf-8' } });
}

export const config = {
  matcher: [
    { source: '/((?!api/|_next/).*)', has: [{ type: 'header', key: 'next-action' }] },
    { source: '/((?!api/|_next/).*)', has: [{ type: 'header', key: 'content-type', value: 'multipart/form-data.*' }] },
  ],
};
