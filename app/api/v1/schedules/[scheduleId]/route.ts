import { route } from '@/lib/http/route';
import { readSchedule } from '@/lib/schedules/data';

type Params = { scheduleId: string };

// The issued PDF, byte for byte as stored, with its SHA-256 in a header.
export const GET = route<Params>({ access: 'schedule.read' }, async ({ team, params, request }) => {
  const { summary, bytes } = await readSchedule(team!.teamId, params.scheduleId);
  const inline = new URL(request.url).searchParams.get('inline') === '1';
  return new Response(Buffer.from(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-length': String(bytes.byteLength),
      'content-disposition': `${inline ? 'inline' : 'attachment'}; filename="${summary.fileName}"`,
      'x-content-sha256': summary.sha256 ?? '',
      'cache-control': 'private, max-age=31536000, immutable',
    },
  });
});
