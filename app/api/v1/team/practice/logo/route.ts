import { auditActorOf } from '@/lib/audit/record';
import { AppError } from '@/lib/errors';
import { json, route } from '@/lib/http/route';
import { MAX_LOGO_BYTES, removePracticeLogo, storePracticeLogo } from '@/lib/team/practice';

const TOO_LARGE = 'The logo is over 1 MB. Save it smaller (a logo prints well at 600 px wide).';

// Upload (or replace) the practice's logo for its treatment schedules: PNG or JPEG, up to 1 MB.
export const POST = route({ access: 'members.manage', maxBodyBytes: MAX_LOGO_BYTES + 64 * 1024, tooLarge: { message: TOO_LARGE, field: 'file' } }, async ({ team, actor, readForm }) => {
  const form = await readForm('file');
  const file = form.get('file');
  if (!(file instanceof File)) throw new AppError('bad_input', 'Choose a logo file to upload.', { field: 'file' });
  const practice = await storePracticeLogo(team!.teamId, auditActorOf(actor!), file.name, new Uint8Array(await file.arrayBuffer()));
  return json({ practice }, 201);
});

// Schedules go back to carrying the practice's name alone.
export const DELETE = route({ access: 'members.manage' }, async ({ team, actor }) => {
  return json({ practice: await removePracticeLogo(team!.teamId, auditActorOf(actor!)) });
});
