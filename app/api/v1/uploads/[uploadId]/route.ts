import { notFound } from '@/lib/errors';
import { route } from '@/lib/http/route';
import { readUpload } from '@/lib/uploads/data';

type Params = { uploadId: string };

export const GET = route<Params>({ access: 'plan.read' }, async ({ team, params }) => {
  const found = await readUpload(team!.teamId, params.uploadId);
  if (!found) throw notFound('That file');
  return new Response(Buffer.from(found.bytes), {
    headers: {
      'content-type': found.summary.contentType,
      'content-length': String(found.bytes.byteLength),
      'cache-control': 'private, max-age=31536000, immutable',
      'x-content-type-options': 'nosniff',
    },
  });
});
