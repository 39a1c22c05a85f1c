import { apiDocument } from '@/lib/api-description';
import { json, route } from '@/lib/http/route';

// GET /api/v1/openapi.json: the OpenAPI 3.1 description of every route here, built from the zod
// schemas they parse with (lib/api-description). Public, and the same for everyone.
export const GET = route({ access: 'public' }, async () => json(apiDocument(), 200, { 'cache-control': 'public, max-age=3600' }));
