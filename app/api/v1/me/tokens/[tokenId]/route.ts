import { revokeToken } from '@/lib/auth/api-tokens';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

/** Revokes one of the person's tokens: every later use gets a 401 that says so. */
export const DELETE = route<{ tokenId: string }>({ access: 'signed-in', sessionOnly: true }, async ({ actor, params }) => json({ record: await revokeToken(actor!, params.tokenId) }));
