import { createToken, createTokenSchema, listTokens } from '@/lib/auth/api-tokens';
import { json, route } from '@/lib/http/route';

export const dynamic = 'force-dynamic';

/** The person's API tokens (never the tokens themselves). */
export const GET = route({ access: 'signed-in', sessionOnly: true }, async ({ actor }) => json({ tokens: await listTokens(actor!.user.id) }));

/** A new token: the answer holds it once; only its hash is kept. */
export const POST = route({ access: 'signed-in', sessionOnly: true, maxBodyBytes: 4 * 1024 }, async ({ actor, readJson }) => {
  const input = await readJson(createTokenSchema);
  const { token, record } = await createToken(actor!, input);
  return json({ token, record }, 201);
});
