// The treatment schedule: issued from a revision, stored with its SHA-256, downloaded again
// byte for byte; its text carries the revision's resonance frequencies; a page draws.
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { extractText, getDocumentProxy } from 'unpdf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { setPlanBackground } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { storePlanBackground } from '@/lib/uploads/data';
import { declaredPng, tinyPng } from '../helpers/files';
import { sampleFloorPlan } from '../../helpers/dxf-sample';
import { putObject } from '@/lib/storage/object-store';
import { MAX_PRINTED_SIDE_PX } from '@/lib/uploads/pixel-limits';
import { Upload } from '@/models';
import { getRevisionByNumber } from '@/lib/revisions/data';
import { PRINTED_LOWEST_ORDERS } from '@/lib/schedules/content';
import { call } from '../helpers/routes';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { planWithRuns, submitted } from '../helpers/revisions';
import { previewSchedule, renderAskedSchedule } from '@/lib/schedules/data';
import sharp from 'sharp';
import { GET as list, POST as issue } from '@/app/api/v1/revisions/[revisionId]/schedules/route';
import { GET as download } from '@/app/api/v1/schedules/[scheduleId]/route';

let t: TestTeam;
let revisionId: string;
let planId: string;

beforeAll(async () => {
  t = await createTestTeam('schedule');
  const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Harbour Lane Recital Hall', site: '' });
  planId = await planWithRuns(t, project.id, 2, 'Level 3 supply');
  // A drawing behind the runs, so the plan page draws the stored image too.
  const upload = await storePlanBackground(t.team.id, t.members.acoustician.id, 'level-3.png', tinyPng(4000, 3000));
  await setPlanBackground(t.team.id, { id: t.members.acoustician.id, name: t.members.acoustician.name }, planId, upload.id);
  revisionId = (await submitted(t, planId)).id;
});
afterAll(async () => { await sequelize.close(); });

describe('treatment schedule', () => {
  it('is issued by an acoustician only, and downloads again as the same bytes', async () => {
    const refused = await call(issue, 'POST', '/x', { cookie: await t.cookieFor('engineer'), params: { revisionId } });
    expect(refused.status).toBe(403);
    const issued = await call(issue, 'POST', '/x', { cookie: await t.cookieFor('acoustician'), params: { revisionId } });
    // asked for now, rendered by the job worker: here the job's own work is run in place
    expect(issued.status).toBe(202);
    const asked = (issued.body as { schedule: { id: string; status: string } }).schedule;
    expect(asked.status).toBe('rendering');
    expect(await renderAskedSchedule(t.team.id, asked.id)).toBe('issued');
    const listed = await call(list, 'GET', '/x', { cookie: await t.cookieFor('viewer'), params: { revisionId } });
    const schedule = (listed.body as { schedules: { id: string; sha256: string; status: string }[] }).schedules.find((row) => row.id === asked.id)!;
    expect(schedule.status).toBe('issued');
    const fetchPdf = async () => {
      const response = await download(new Request(`http://localhost/api/v1/schedules/${schedule.id}`, { headers: { host: 'localhost', cookie: await t.cookieFor('viewer') } }), { params: Promise.resolve({ scheduleId: schedule.id }) });
      expect(response.status).toBe(200);
      expect(response.headers.get('content-type')).toBe('application/pdf');
      return new Uint8Array(await response.arrayBuffer());
    };
    const first = await fetchPdf();
    const second = await fetchPdf();
    expect(Buffer.compare(Buffer.from(first), Buffer.from(second))).toBe(0);
    expect(createHash('sha256').update(first).digest('hex')).toBe(schedule.sha256);

    // The text: cover facts and every printed resonance frequency of the revision.
    const pdf = await getDocumentProxy(first.slice());
    const { text, totalPages } = await extractText(pdf, { mergePages: true });
    expect(totalPages).toBeGreaterThanOrEqual(5);
    expect(text).toContain('Treatment schedule');
    expect(text).toContain('Harbour Lane Recital Hall');
    expect(text).toContain('DRAFT');
    expect(text).toContain('No treatments are chosen');
    expect(text).not.toContain('No drawing image is attached');
    expect(text).toContain('fire and smoke');
    const revision = await getRevisionByNumber(t.team.id, planId, 1);
    const frequencies = revision.analysis.flatMap((run) => (run.analysis?.resonances ?? []).slice(0, PRINTED_LOWEST_ORDERS).map((row) => `${row.frequencyHz.toFixed(1)} Hz`));
    expect(frequencies.length).toBeGreaterThan(10);
    for (const frequency of frequencies) expect(text).toContain(frequency);

    // It draws: poppler renders page 2 (the plan) to a PNG with dark pixels on it.
    const dir = mkdtempSync(path.join(tmpdir(), 'schedule-'));
    writeFileSync(path.join(dir, 'schedule.pdf'), first);
    execFileSync('pdftoppm', ['-png', '-r', '40', '-f', '2', '-l', '2', path.join(dir, 'schedule.pdf'), path.join(dir, 'page')]);
    const png = readFileSync(path.join(dir, 'page-2.png'));
    expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
    expect(png.byteLength).toBeGreaterThan(2000);
  });

  it(`prints the 4000 × 3000 px drawing as a copy at most ${MAX_PRINTED_SIDE_PX} px on its longest side`, async () => {
    const { bytes } = await previewSchedule(t.team.id, revisionId);
    // PDF 1.7, ISO 32000-1, 8.9.5: an image XObject's /Width and /Height
    expect(Buffer.from(bytes).toString('latin1')).toMatch(/\/Width 2400\s*\/Height 1800|\/Height 1800[\s\S]{0,200}\/Width 2400|\/Width 2400[\s\S]{0,200}\/Height 1800/);
  });

  it('leaves out, and says so, a drawing stored before drawings were bounded (a 30000 × 30000 PNG)', async () => {
    const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Old Mill Gallery', site: '' });
    const legacyPlanId = await planWithRuns(t, project.id, 1, 'Gallery supply');
    const bomb = declaredPng(30000, 30000);
    const storageKey = `teams/${t.team.id}/plans/legacy-${legacyPlanId}`;
    await putObject(storageKey, bomb, 'image/png');
    const legacy = await Upload.create({
      teamId: t.team.id, uploadedById: t.members.acoustician.id, storageKey, fileName: 'gallery.png', contentType: 'image/png',
      bytes: bomb.byteLength, sha256: createHash('sha256').update(bomb).digest('hex'), widthPx: 30000, heightPx: 30000,
    });
    await setPlanBackground(t.team.id, { id: t.members.acoustician.id, name: t.members.acoustician.name }, legacyPlanId, legacy.id);
    const revision = await submitted(t, legacyPlanId);
    const { bytes } = await previewSchedule(t.team.id, revision.id);
    const { text } = await extractText(await getDocumentProxy(new Uint8Array(bytes)), { mergePages: true });
    expect(text).toContain('Gallery supply');
    expect(text).toContain('could not be read for printing');
  });

  it('draws a WebP drawing too (re-encoded as PNG for the PDF)', async () => {
    const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Quay Street Studios', site: '' });
    const webpPlanId = await planWithRuns(t, project.id, 1, 'Level 1 extract');
    const webp = await sharp({ create: { width: 1600, height: 1200, channels: 3, background: '#c8c8c8' } }).webp().toBuffer();
    const upload = await storePlanBackground(t.team.id, t.members.acoustician.id, 'level-1.webp', new Uint8Array(webp));
    expect(upload.contentType).toBe('image/webp');
    await setPlanBackground(t.team.id, { id: t.members.acoustician.id, name: t.members.acoustician.name }, webpPlanId, upload.id);
    const revision = await submitted(t, webpPlanId);
    const { bytes } = await previewSchedule(t.team.id, revision.id);
    const { text } = await extractText(await getDocumentProxy(new Uint8Array(bytes)), { mergePages: true });
    expect(text).toContain('Level 1 extract');
    expect(text).not.toContain('No drawing image is attached');
    // The embedded image is the drawing at its own size (PDF 1.7, ISO 32000-1, 8.9.5: an image XObject's /Width and /Height).
    expect(Buffer.from(bytes).toString('latin1')).toMatch(/\/Width 1600\s*\/Height 1200|\/Height 1200[\s\S]{0,200}\/Width 1600|\/Width 1600[\s\S]{0,200}\/Height 1200/);
  });
});

describe('treatment schedule with a DXF drawing', () => {
  it('draws the DXF’s layers switched on in the file as lines under the runs, and names them', async () => {
    const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Mill Yard Rehearsal Rooms', site: '' });
    const dxfPlanId = await planWithRuns(t, project.id, 1, 'Level 2 supply');
    const upload = await storePlanBackground(t.team.id, t.members.acoustician.id, 'level-2.dxf', new TextEncoder().encode(sampleFloorPlan('mm')));
    await setPlanBackground(t.team.id, { id: t.members.acoustician.id, name: t.members.acoustician.name }, dxfPlanId, upload.id);
    const revision = await submitted(t, dxfPlanId);
    const { bytes } = await previewSchedule(t.team.id, revision.id);
    const { text } = await extractText(await getDocumentProxy(new Uint8Array(bytes)), { mergePages: true });
    // the column grid is off in the file (a negative colour number, AutoCAD DXF Reference LAYER group 62): not printed
    expect(text.replace(/\s+/g, ' ')).toContain('The drawing is drawn from the DXF file’s layers Doors, Walls.');
    expect(text).not.toContain('No drawing image is attached');
    expect(text).not.toContain('could not be read for printing');
  });
});
