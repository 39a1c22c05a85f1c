import { route } from '@/lib/http/route';
import { previewSchedule } from '@/lib/schedules/data';

type Params = { revisionId: string };

// The schedule as it would be issued now, rendered on the fly and not kept.
export const GET = route<Params>({ access: 'schedule.read' }, async ({ team, params }) => {
  const { bytes, fileName } = await previewSchedule(team!.teamId, params.revisionId);
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-length': String(bytes.byteLength),
      'content-disposition': `inline; filename="preview-${fileName}"`,
      'cache-control': 'private, no-store',
    },
  });
});
