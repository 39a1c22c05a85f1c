// The practice a team works as, printed on every page of its treatment schedules: its name (the
// team's own name until one is given) and its logo, a PNG or JPEG up to 1 MB and 2000 px a side,
// stored through the S3 client as an upload of the team.
import { createHash, randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { recordAudit, type AuditActor } from '@/lib/audit/record';
import { AppError, notFound } from '@/lib/errors';
import { getObject, putObject } from '@/lib/storage/object-store';
import { sniffPlanFile } from '@/lib/uploads/sniff';
import { Team, Upload } from '@/models';
import type { practiceNameSchema } from './schemas';

export const MAX_LOGO_BYTES = 1024 * 1024;
export const MAX_LOGO_SIDE_PX = 2000;
const LOGO_TYPES = ['image/png', 'image/jpeg'] as const;

export interface PracticeSettings {
  teamName: string;
  /** '' until one is given: the schedule then carries the team's name. */
  practiceName: string;
  logo: { id: string; fileName: string; contentType: string; widthPx: number | null; heightPx: number | null } | null;
}

async function teamOf(teamId: string): Promise<Team> {
  const team = await Team.findByPk(teamId);
  if (!team) throw notFound('That team');
  return team;
}

export async function getPracticeSettings(teamId: string): Promise<PracticeSettings> {
  const team = await teamOf(teamId);
  const logo = team.logoUploadId ? await Upload.findOne({ where: { id: team.logoUploadId, teamId } }) : null;
  return {
    teamName: team.name, practiceName: team.practiceName ?? '',
    logo: logo && { id: logo.id, fileName: logo.fileName, contentType: logo.contentType, widthPx: logo.widthPx, heightPx: logo.heightPx },
  };
}

export async function setPracticeName(teamId: string, actor: AuditActor, input: z.infer<typeof practiceNameSchema>): Promise<PracticeSettings> {
  const team = await teamOf(teamId);
  const practiceName = input.practiceName.trim();
  await team.update({ practiceName: practiceName || null });
  await recordAudit({ teamId, actor, action: 'team.practice_changed', subject: practiceName ? `Practice name set to “${practiceName}”` : 'Practice name cleared (the team’s name is used)' });
  return getPracticeSettings(teamId);
}

/** Checks the logo by its bytes (never its name) and stores it as the team's logo. */
export async function storePracticeLogo(teamId: string, actor: AuditActor, fileName: string, bytes: Uint8Array): Promise<PracticeSettings> {
  if (bytes.byteLength === 0) throw new AppError('bad_input', 'The logo file is empty.', { field: 'file' });
  if (bytes.byteLength > MAX_LOGO_BYTES) throw new AppError('too_large', 'The logo is over 1 MB. Save it smaller (a logo prints well at 600 px wide).', { field: 'file' });
  const sniffed = await sniffPlanFile(bytes);
  if (!sniffed || !(LOGO_TYPES as readonly string[]).includes(sniffed.contentType)) {
    throw new AppError('bad_input', 'The logo must be a PNG or JPEG image (judged by its content, not its name).', { field: 'file' });
  }
  if ((sniffed.widthPx ?? 0) > MAX_LOGO_SIDE_PX || (sniffed.heightPx ?? 0) > MAX_LOGO_SIDE_PX) {
    throw new AppError('bad_input', `The logo is ${sniffed.widthPx} × ${sniffed.heightPx} px; keep each side at most ${MAX_LOGO_SIDE_PX} px.`, { field: 'file' });
  }
  const team = await teamOf(teamId);
  const storageKey = `teams/${teamId}/logos/${randomUUID()}`;
  await putObject(storageKey, bytes, sniffed.contentType);
  const cleanName = fileName.replace(/[\\/\u0000-\u001f]/g, '_').slice(0, 200) || 'logo';
  const upload = await Upload.create({
    teamId, uploadedById: actor.id, storageKey, fileName: cleanName, contentType: sniffed.contentType,
    bytes: bytes.byteLength, sha256: createHash('sha256').update(bytes).digest('hex'), widthPx: sniffed.widthPx, heightPx: sniffed.heightPx,
  });
  await team.update({ logoUploadId: upload.id });
  await recordAudit({ teamId, actor, action: 'team.practice_changed', subject: `Practice logo set (${cleanName})` });
  return getPracticeSettings(teamId);
}

export async function removePracticeLogo(teamId: string, actor: AuditActor): Promise<PracticeSettings> {
  const team = await teamOf(teamId);
  if (team.logoUploadId) {
    await team.update({ logoUploadId: null });
    await recordAudit({ teamId, actor, action: 'team.practice_changed', subject: 'Practice logo removed' });
  }
  return getPracticeSettings(teamId);
}

/** The name and logo a schedule prints; a logo that cannot be read is left out (and logged), never stops the schedule. */
export async function practiceForSchedule(teamId: string): Promise<{ name: string; logo: { data: Buffer; format: 'png' | 'jpg' } | null }> {
  const team = await teamOf(teamId);
  const name = team.practiceName || team.name;
  if (!team.logoUploadId) return { name, logo: null };
  const upload = await Upload.findOne({ where: { id: team.logoUploadId, teamId } });
  if (!upload) return { name, logo: null };
  try {
    return { name, logo: { data: Buffer.from(await getObject(upload.storageKey)), format: upload.contentType === 'image/png' ? 'png' : 'jpg' } };
  } catch (error) {
    console.warn(`[schedule] practice logo ${upload.id} left out`, error);
    return { name, logo: null };
  }
}
