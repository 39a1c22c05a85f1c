// Treatment schedules of a team's revisions: preview (rendered, not kept), issue (rendered and
// stored through the S3 client with its SHA-256), list, and read back the issued bytes.
import { createHash, randomUUID } from 'node:crypto';
import { recordActivity, type ActivityActor } from '@/lib/activity/record';
import { recordAudit } from '@/lib/audit/record';
import { AppError, notFound } from '@/lib/errors';
import { getRevisionById } from '@/lib/revisions/data';
import { schedulePath } from '@/lib/revisions/links';
import { isAcceptedForIssue } from '@/lib/revisions/states';
import type { RevisionView } from '@/lib/revisions/types';
import { listDecisions } from '@/lib/reviews/data';
import { getObject, putObject } from '@/lib/storage/object-store';
import { printImage } from '@/lib/uploads/print-image';
import { assertId } from '@/lib/ids';
import { Schedule, Upload } from '@/models';
import { scheduleContent, type ScheduleFigure } from './content';
import { renderSchedulePdf } from './render';

export interface ScheduleSummary { id: string; revisionId: string; sha256: string; bytes: number; issuedByName: string; issuedAt: string; fileName: string }

function fileNameOf(revision: { planName: string; number: number }): string {
  const plain = revision.planName.replace(/[^\w .-]+/g, '').trim().replace(/\s+/g, '-') || 'plan';
  return `treatment-schedule-${plain}-r${revision.number}.pdf`;
}

function toSummary(row: Schedule, revision: { planName: string; number: number }): ScheduleSummary {
  return { id: row.id, revisionId: row.revisionId, sha256: row.sha256, bytes: row.bytes, issuedByName: row.issuedByName, issuedAt: row.createdAt.toISOString(), fileName: fileNameOf(revision) };
}

async function planImage(revision: RevisionView): Promise<ScheduleFigure['image']> {
  if (!revision.background) return null;
  const upload = await Upload.findOne({ where: { id: revision.background.id, teamId: revision.teamId } });
  if (!upload) return null;
  try {
    return await printImage(await getObject(upload.storageKey), upload.contentType);
  } catch (error) {
    // A drawing stored before uploads were bounded may be over the pixel cap: the plan prints on a blank sheet and says so.
    console.warn(`[schedule] drawing ${upload.id} left out of the print`, error);
    return null;
  }
}

export async function renderRevisionSchedule(revision: RevisionView, issuedBy: string | null, at: Date): Promise<Buffer> {
  const decisions = await listDecisions(revision.teamId, revision.id);
  const content = scheduleContent({ revision, decisions, image: await planImage(revision), issuedBy, date: at });
  return renderSchedulePdf(content, at);
}

export async function previewSchedule(teamId: string, revisionId: string): Promise<{ bytes: Buffer; fileName: string }> {
  const revision = await getRevisionById(teamId, revisionId);
  return { bytes: await renderRevisionSchedule(revision, null, new Date()), fileName: fileNameOf(revision) };
}

export async function issueSchedule(teamId: string, actor: ActivityActor, revisionId: string): Promise<ScheduleSummary> {
  const revision = await getRevisionById(teamId, revisionId);
  const at = new Date();
  const bytes = await renderRevisionSchedule(revision, actor.name, at);
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const storageKey = `teams/${teamId}/schedules/${revision.id}/${randomUUID()}.pdf`;
  await putObject(storageKey, bytes, 'application/pdf');
  const row = await Schedule.create({ teamId, revisionId: revision.id, storageKey, sha256, bytes: bytes.byteLength, issuedById: actor.id, issuedByName: actor.name, createdAt: at });
  const summary = `Treatment schedule issued for revision ${revision.number}${isAcceptedForIssue(revision.state) ? '' : ' (draft, not accepted)'}`;
  await recordActivity({ teamId, planId: revision.planId, actor, kind: 'schedule.issued', summary, link: schedulePath(revision.planId, revision.number) });
  await recordAudit({ teamId, actor, action: 'schedule.issued', subject: `${revision.project.name}, ${revision.planName}: ${summary} (SHA-256 ${sha256.slice(0, 12)}…)` });
  return toSummary(row, revision);
}

export async function listSchedules(teamId: string, revisionId: string): Promise<ScheduleSummary[]> {
  const revision = await getRevisionById(teamId, revisionId);
  const rows = await Schedule.findAll({ where: { teamId, revisionId }, order: [['createdAt', 'DESC']] });
  return rows.map((row) => toSummary(row, revision));
}

// The issued bytes, checked against the SHA-256 recorded when they were issued.
export async function readSchedule(teamId: string, scheduleId: string): Promise<{ summary: ScheduleSummary; bytes: Uint8Array }> {
  assertId(scheduleId, 'That schedule');
  const row = await Schedule.findOne({ where: { id: scheduleId, teamId } });
  if (!row) throw notFound('That schedule');
  const revision = await getRevisionById(teamId, row.revisionId);
  const bytes = await getObject(row.storageKey);
  if (createHash('sha256').update(bytes).digest('hex') !== row.sha256) {
    throw new AppError('internal', 'The stored schedule does not match its checksum. Issue it again and tell your team admin.');
  }
  return { summary: toSummary(row, revision), bytes };
}
