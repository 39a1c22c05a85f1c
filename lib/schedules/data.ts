// Treatment schedules of a team's revisions: preview (rendered, not kept), issue (asked for now,
// rendered and stored through the S3 client with its SHA-256 by the job worker), list, and read
// back the issued bytes.
import { createHash } from 'node:crypto';
import { recordActivity, type ActivityActor } from '@/lib/activity/record';
import { recordAudit } from '@/lib/audit/record';
import { AppError, notFound } from '@/lib/errors';
import { getRevisionById, listRevisions } from '@/lib/revisions/data';
import { schedulePath } from '@/lib/revisions/links';
import { isAcceptedForIssue } from '@/lib/revisions/states';
import type { RevisionView } from '@/lib/revisions/types';
import { listDecisions } from '@/lib/reviews/data';
import { getObject, putObject } from '@/lib/storage/object-store';
import { practiceForSchedule } from '@/lib/team/practice';
import { printImage } from '@/lib/uploads/print-image';
import { assertId } from '@/lib/ids';
import { sendJob } from '@/lib/jobs/queue';
import { Schedule, Upload } from '@/models';
import type { ScheduleStatus } from '@/models/schedule';
import { scheduleContent, type ScheduleDrawing } from './content';
import { drawingPaths } from './drawing-paths';
import { renderSchedulePdf } from './render';
import { isDxfDrawingType, type DxfDrawing } from '@/lib/dxf/drawing';

export interface ScheduleSummary {
  id: string; revisionId: string; status: ScheduleStatus;
  /** Why rendering failed, and what to do (failed only). */
  failure: string | null;
  sha256: string | null; bytes: number | null; issuedByName: string;
  /** When it was asked for (the date it carries). */
  askedAt: string;
  /** When its file was stored (issued only). */
  issuedAt: string | null;
  fileName: string;
}

function fileNameOf(revision: { planName: string; number: number }): string {
  const plain = revision.planName.replace(/[^\w .-]+/g, '').trim().replace(/\s+/g, '-') || 'plan';
  return `treatment-schedule-${plain}-r${revision.number}.pdf`;
}

function toSummary(row: Schedule, revision: { planName: string; number: number }): ScheduleSummary {
  return {
    id: row.id, revisionId: row.revisionId, status: row.status, failure: row.failure ?? null, sha256: row.sha256 ?? null, bytes: row.bytes ?? null,
    issuedByName: row.issuedByName, askedAt: row.createdAt.toISOString(), issuedAt: row.issuedAt?.toISOString() ?? null, fileName: fileNameOf(revision),
  };
}

async function planImage(revision: RevisionView): Promise<ScheduleDrawing | null> {
  if (!revision.background) return null;
  const upload = await Upload.findOne({ where: { id: revision.background.id, teamId: revision.teamId } });
  if (!upload) return null;
  try {
    if (isDxfDrawingType(upload.contentType)) return drawingPaths(JSON.parse(new TextDecoder().decode(await getObject(upload.storageKey))) as DxfDrawing);
    return await printImage(await getObject(upload.storageKey), upload.contentType);
  } catch (error) {
    // A drawing stored before uploads were bounded may be over the pixel cap: the plan prints on a blank sheet and says so.
    console.warn(`[schedule] drawing ${upload.id} left out of the print`, error);
    return null;
  }
}

export async function renderRevisionSchedule(revision: RevisionView, issuedBy: string | null, at: Date): Promise<Buffer> {
  const [decisions, image, practice, history] = await Promise.all([
    listDecisions(revision.teamId, revision.id), planImage(revision), practiceForSchedule(revision.teamId), listRevisions(revision.teamId, revision.planId),
  ]);
  const content = scheduleContent({ revision, decisions, image, issuedBy, date: at, practice, history });
  return renderSchedulePdf(content, at);
}

export async function previewSchedule(teamId: string, revisionId: string): Promise<{ bytes: Buffer; fileName: string }> {
  const revision = await getRevisionById(teamId, revisionId);
  return { bytes: await renderRevisionSchedule(revision, null, new Date()), fileName: fileNameOf(revision) };
}

/** Asks for the revision's schedule: recorded now as rendering, rendered and stored by the render-schedule job. */
export async function issueSchedule(teamId: string, actor: ActivityActor, revisionId: string): Promise<ScheduleSummary> {
  const revision = await getRevisionById(teamId, revisionId);
  const row = await Schedule.create({ teamId, revisionId: revision.id, status: 'rendering', issuedById: actor.id, issuedByName: actor.name, createdAt: new Date() });
  try {
    await sendJob('render-schedule', { scheduleId: row.id, teamId }, { key: row.id });
  } catch (error) {
    await row.update({ status: 'failed', failure: 'The schedule could not be queued for rendering (the job queue did not answer). Issue it again in a minute; if it fails again, tell your team admin.' });
    console.error(`[schedules] schedule ${row.id} not queued:`, error);
  }
  return toSummary(row, revision);
}

/**
 * Renders and stores one asked-for schedule (the render-schedule job). Idempotent: a schedule
 * already issued is left as it is, the file's key is the schedule's own, and the activity entry is
 * written only by the run that marks it issued, so a job run twice issues it once.
 */
export async function renderAskedSchedule(teamId: string, scheduleId: string): Promise<'issued' | 'already issued' | 'gone'> {
  const row = await Schedule.findOne({ where: { id: scheduleId, teamId } });
  if (!row) return 'gone';
  if (row.status === 'issued') return 'already issued';
  const revision = await getRevisionById(teamId, row.revisionId);
  const at = row.createdAt;
  const bytes = await renderRevisionSchedule(revision, row.issuedByName, at);
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const storageKey = `teams/${teamId}/schedules/${revision.id}/${row.id}.pdf`;
  await putObject(storageKey, bytes, 'application/pdf');
  const [marked] = await Schedule.update(
    { status: 'issued', failure: null, storageKey, sha256, bytes: bytes.byteLength, issuedAt: new Date() },
    { where: { id: row.id, status: ['rendering', 'failed'] } },
  );
  if (marked === 0) return 'already issued';
  const actor = { id: row.issuedById ?? null, name: row.issuedByName };
  const summary = `Treatment schedule issued for revision ${revision.number}${isAcceptedForIssue(revision.state) ? '' : ' (draft, not accepted)'}`;
  await recordActivity({ teamId, planId: revision.planId, actor, kind: 'schedule.issued', summary, link: schedulePath(revision.planId, revision.number) });
  await recordAudit({ teamId, actor: actor.id ? { id: actor.id, name: actor.name } : null, action: 'schedule.issued', subject: `${revision.project.name}, ${revision.planName}: ${summary} (SHA-256 ${sha256.slice(0, 12)}…)` });
  return 'issued';
}

/** Marks an asked-for schedule failed, with what to do (after the job's last try). */
export async function failAskedSchedule(teamId: string, scheduleId: string, reason: string): Promise<void> {
  await Schedule.update(
    { status: 'failed', failure: `The schedule could not be rendered (${reason}). Issue it again; if it fails again, tell your team admin.` },
    { where: { id: scheduleId, teamId, status: 'rendering' } },
  );
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
  if (row.status !== 'issued' || !row.storageKey) {
    throw new AppError('conflict', row.status === 'failed' ? (row.failure ?? 'This schedule could not be rendered. Issue it again.') : 'This schedule is still being rendered; it can be downloaded when it is issued.');
  }
  const bytes = await getObject(row.storageKey);
  if (createHash('sha256').update(bytes).digest('hex') !== row.sha256) {
    throw new AppError('internal', 'The stored schedule does not match its checksum. Issue it again and tell your team admin.');
  }
  return { summary: toSummary(row, revision), bytes };
}
