import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as uploadBackground, PUT as restoreBackground } from '@/app/api/v1/plans/[planId]/background/route';
import { GET as getUpload } from '@/app/api/v1/uploads/[uploadId]/route';
import { sequelize } from '@/lib/db';
import { createPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { getObject } from '@/lib/storage/object-store';
import { MAX_STORED_SIDE_PX } from '@/lib/uploads/pixel-limits';
import { Plan, Upload } from '@/models';
import { declaredPng, tinyPdf, tinyPng } from '../helpers/files';
import { createTestTeam, type TestTeam } from '../helpers/people';

let team: TestTeam;
let planId: string;
beforeAll(async () => {
  team = await createTestTeam('uploads');
  const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'Uploads project', site: '' });
  planId = (await createPlan(team.team.id, team.members.acoustician.id, project.id, 'Upload plan')).id;
});
afterAll(async () => { await sequelize.close(); });

async function upload(fileName: string, bytes: Uint8Array, type: string) {
  const body = new FormData();
  body.append('file', new File([Buffer.from(bytes)], fileName, { type }));
  const request = new Request(`http://localhost/api/v1/plans/${planId}/background`, { method: 'POST', headers: { cookie: await team.cookieFor('acoustician'), host: 'localhost' }, body });
  const response = await uploadBackground(request, { params: Promise.resolve({ planId }) });
  return { status: response.status, body: (await response.json()) as { upload?: { id: string; contentType: string; widthPx: number; heightPx: number }; error?: { code: string; message: string; field?: string } } };
}

describe('plan backgrounds', () => {
  it('stores a PNG judged by its bytes, re-encoded with the same pixels, and serves the stored bytes back', async () => {
    const png = tinyPng(40, 30);
    const answer = await upload('drawing.dat', png, 'application/octet-stream');
    expect(answer.status).toBe(201);
    expect(answer.body.upload).toMatchObject({ contentType: 'image/png', widthPx: 40, heightPx: 30 });
    const served = await getUpload(new Request(`http://localhost/api/v1/uploads/${answer.body.upload!.id}`, { headers: { cookie: await team.cookieFor('viewer'), host: 'localhost' } }), { params: Promise.resolve({ uploadId: answer.body.upload!.id }) });
    expect(served.status).toBe(200);
    const servedBytes = Buffer.from(await served.arrayBuffer());
    const row = await Upload.findByPk(answer.body.upload!.id);
    expect(createHash('sha256').update(servedBytes).digest('hex')).toBe(row?.sha256);
    const pixels = async (bytes: Uint8Array) => sharp(bytes).raw().toBuffer();
    expect((await pixels(servedBytes)).equals(await pixels(png))).toBe(true);
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(answer.body.upload!.id);
  });

  it('turns the first page of a PDF into the PNG background (poppler pdftoppm)', async () => {
    const answer = await upload('level-2.pdf', tinyPdf(), 'application/pdf');
    expect(answer.status).toBe(201);
    expect(answer.body.upload).toMatchObject({ contentType: 'image/png' });
    expect(answer.body.upload!.widthPx).toBeGreaterThan(100);
  });

  it('refuses a file that is not an image whatever its name says, and changes nothing', async () => {
    const before = await Plan.findByPk(planId);
    const uploadsBefore = await Upload.count({ where: { teamId: team.team.id } });
    const answer = await upload('plan.png', new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg"></svg>'), 'image/png');
    expect(answer.status).toBe(400);
    expect(answer.body.error).toMatchObject({ field: 'file', message: expect.stringContaining('is not a PNG, JPEG, WebP, PDF or DXF file') });
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(before?.backgroundUploadId);
    expect(await Upload.count({ where: { teamId: team.team.id } })).toBe(uploadsBefore);
  });

  it('refuses a 30000 × 30000 PNG by its declared size before decoding it, and changes nothing (ISO/IEC 15948 IHDR)', async () => {
    const before = await Plan.findByPk(planId);
    const uploadsBefore = await Upload.count({ where: { teamId: team.team.id } });
    const bomb = declaredPng(30000, 30000);
    expect(bomb.byteLength).toBeLessThan(1000);
    const answer = await upload('bomb.png', bomb, 'image/png');
    expect(answer.status).toBe(400);
    expect(answer.body.error).toEqual({ code: 'bad_input', field: 'file', message: '“bomb.png” is 30000 × 30000 pixels (900 megapixels); drawings of up to 100 megapixels are accepted. Export the plan at a lower resolution.' });
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(before?.backgroundUploadId);
    expect(await Upload.count({ where: { teamId: team.team.id } })).toBe(uploadsBefore);
  });

  it('refuses a header-only PNG: over the cap by its declared size, or with no image data to decode', async () => {
    const huge = await upload('header.png', declaredPng(30000, 30000, 0), 'image/png');
    expect(huge.status).toBe(400);
    expect(huge.body.error?.message).toContain('is 30000 × 30000 pixels (900 megapixels)');
    const empty = await upload('empty.png', declaredPng(400, 300, 0), 'image/png');
    expect(empty.status).toBe(400);
    expect(empty.body.error).toEqual({ code: 'bad_input', field: 'file', message: 'The image in “empty.png” could not be read: its data is damaged or cut short. Export the plan again and upload that.' });
    const cut = await upload('cut.png', declaredPng(400, 300), 'image/png');
    expect(cut.status).toBe(400);
    expect(cut.body.error?.message).toContain('could not be read');
  });

  it(`stores a drawing wider than ${MAX_STORED_SIDE_PX} px resampled to that, recording the stored pixel size`, async () => {
    const answer = await upload('wide.png', tinyPng(9000, 1500), 'image/png');
    expect(answer.status).toBe(201);
    expect(answer.body.upload).toMatchObject({ contentType: 'image/png', widthPx: MAX_STORED_SIDE_PX, heightPx: 1000 });
    const row = await Upload.findByPk(answer.body.upload!.id);
    const stored = await sharp(await getObject(row!.storageKey)).metadata();
    expect([stored.width, stored.height]).toEqual([MAX_STORED_SIDE_PX, 1000]);
  });

  it(`draws a PDF page of 14400 pt (200 in) at ${MAX_STORED_SIDE_PX} px, not at 110 dpi (22000 px)`, async () => {
    const answer = await upload('site.pdf', tinyPdf(14400, 7200), 'application/pdf');
    expect(answer.status).toBe(201);
    expect(answer.body.upload).toMatchObject({ contentType: 'image/png', widthPx: MAX_STORED_SIDE_PX, heightPx: MAX_STORED_SIDE_PX / 2 });
  });

  it('refuses a file over 20 MB', async () => {
    const big = new Uint8Array(20 * 1024 * 1024 + 1);
    big.set(tinyPng());
    const answer = await upload('huge.png', big, 'image/png');
    expect(answer.status).toBe(413);
    expect(answer.body.error?.message).toContain('over 20 MB');
  });
});

describe('undoing a drawing upload (product behaviour, no outside source)', () => {
  async function restore(uploadId: string | null, role: 'acoustician' | 'viewer' = 'acoustician') {
    const request = new Request(`http://localhost/api/v1/plans/${planId}/background`, {
      method: 'PUT', headers: { cookie: await team.cookieFor(role), host: 'localhost', 'content-type': 'application/json' }, body: JSON.stringify({ uploadId }),
    });
    const response = await restoreBackground(request, { params: Promise.resolve({ planId }) });
    return { status: response.status, body: (await response.json()) as { background?: { id: string } | null; error?: { code: string; field?: string } } };
  }

  it('puts back the earlier drawing, or none; refuses another team\'s upload and a reader', async () => {
    const first = await upload('first.png', tinyPng(20, 10), 'image/png');
    const second = await upload('second.png', tinyPng(30, 10), 'image/png');
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(second.body.upload!.id);
    const back = await restore(first.body.upload!.id);
    expect(back.status).toBe(200);
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(first.body.upload!.id);
    expect((await restore(null)).status).toBe(200);
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBeNull();

    const other = await createTestTeam('uploads-other');
    const foreign = await Upload.create({ teamId: other.team.id, uploadedById: other.members.acoustician.id, storageKey: 'teams/x/plans/y', fileName: 'theirs.png', contentType: 'image/png', bytes: 1, sha256: '0'.repeat(64), widthPx: 10, heightPx: 10 });
    expect(await restore(foreign.id)).toMatchObject({ status: 404, body: { error: { code: 'not_found', field: 'uploadId' } } });
    expect((await restore(first.body.upload!.id, 'viewer')).status).toBe(403);
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBeNull();
  });
});
