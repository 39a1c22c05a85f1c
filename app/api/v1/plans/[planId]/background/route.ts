import { auditActorOf } from '@/lib/audit/record';
import { AppError } from '@/lib/errors';
import { json, route } from '@/lib/http/route';
import { getPlan, setPlanBackground } from '@/lib/plans/data';
import { planBackgroundSchema } from '@/lib/plans/schemas';
import { MAX_UPLOAD_BYTES, UPLOAD_TOO_LARGE, requirePlanDrawing, storePlanBackground } from '@/lib/uploads/data';

type Params = { planId: string };

// The file plus room for the multipart framing around it.
const MAX_UPLOAD_BODY_BYTES = MAX_UPLOAD_BYTES + 64 * 1024;

// Upload a plan background: PNG, JPEG or WebP up to 20 MB, a PDF whose first page is used, or an ASCII DXF
// (the answer's upload.dxf then gives the scale its units state, for the editor to take, and its layers).
export const POST = route<Params>({ access: 'plan.edit', maxBodyBytes: MAX_UPLOAD_BODY_BYTES, tooLarge: { message: UPLOAD_TOO_LARGE, field: 'file' } }, async ({ team, actor, params, readForm }) => {
  await getPlan(team!.teamId, params.planId);
  const form = await readForm('file');
  const file = form.get('file');
  if (!(file instanceof File)) throw new AppError('bad_input', 'Choose a file to upload.', { field: 'file' });
  if (file.size > MAX_UPLOAD_BYTES) throw new AppError('too_large', UPLOAD_TOO_LARGE, { field: 'file' });
  const upload = await storePlanBackground(team!.teamId, actor!.user.id, file.name, new Uint8Array(await file.arrayBuffer()));
  await setPlanBackground(team!.teamId, auditActorOf(actor!), params.planId, upload.id);
  return json({ upload }, 201);
});

// Undo an upload: back to the drawing the plan had before (an earlier upload of this team), or to none.
export const PUT = route<Params>({ access: 'plan.edit', maxBodyBytes: 1024 }, async ({ team, actor, params, readJson }) => {
  await getPlan(team!.teamId, params.planId);
  const { uploadId } = await readJson(planBackgroundSchema);
  const upload = uploadId === null ? null : await requirePlanDrawing(team!.teamId, uploadId);
  await setPlanBackground(team!.teamId, auditActorOf(actor!), params.planId, upload?.id ?? null);
  return json({ background: upload });
});

// Back to a blank grid.
export const DELETE = route<Params>({ access: 'plan.edit' }, async ({ team, actor, params }) => {
  await setPlanBackground(team!.teamId, auditActorOf(actor!), params.planId, null);
  return json({ background: null });
});
