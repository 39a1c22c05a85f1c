import { AppError } from '@/lib/errors';
import { json, route } from '@/lib/http/route';
import { getPlan, setPlanBackground } from '@/lib/plans/data';
import { MAX_UPLOAD_BYTES, storePlanBackground } from '@/lib/uploads/data';

type Params = { planId: string };

// Upload a plan background: PNG, JPEG or WebP up to 20 MB, or a PDF whose first page is used.
export const POST = route<Params>({ access: 'plan.edit' }, async ({ team, actor, params, request }) => {
  await getPlan(team!.teamId, params.planId);
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > MAX_UPLOAD_BYTES + 64 * 1024) throw new AppError('too_large', 'The file is over 20 MB. Export the plan at a lower resolution.', { field: 'file' });
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    throw new AppError('bad_input', 'Send the file as multipart/form-data in a field named “file”.', { field: 'file' });
  }
  const file = form.get('file');
  if (!(file instanceof File)) throw new AppError('bad_input', 'Choose a file to upload.', { field: 'file' });
  if (file.size > MAX_UPLOAD_BYTES) throw new AppError('too_large', 'The file is over 20 MB. Export the plan at a lower resolution.', { field: 'file' });
  const upload = await storePlanBackground(team!.teamId, actor!.user.id, file.name, new Uint8Array(await file.arrayBuffer()));
  await setPlanBackground(team!.teamId, params.planId, upload.id);
  return json({ upload }, 201);
});

// Back to a blank grid.
export const DELETE = route<Params>({ access: 'plan.edit' }, async ({ team, params }) => {
  await setPlanBackground(team!.teamId, params.planId, null);
  return json({ background: null });
});
