import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as uploadBackground } from '@/app/api/v1/plans/[planId]/background/route';
import { GET as getUpload } from '@/app/api/v1/uploads/[uploadId]/route';
import { sequelize } from '@/lib/db';
import { createPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { Plan, Upload } from '@/models';
import { tinyPdf, tinyPng } from '../helpers/files';
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
  return { status: response.status, body: (await response.json()) as { upload?: { id: string; contentType: string; widthPx: number }; error?: { message: string; field?: string } } };
}

describe('plan backgrounds', () => {
  it('stores a PNG judged by its bytes and serves the same bytes back', async () => {
    const png = tinyPng(40, 30);
    const answer = await upload('drawing.dat', png, 'application/octet-stream');
    expect(answer.status).toBe(201);
    expect(answer.body.upload).toMatchObject({ contentType: 'image/png', widthPx: 40 });
    const served = await getUpload(new Request(`http://localhost/api/v1/uploads/${answer.body.upload!.id}`, { headers: { cookie: await team.cookieFor('viewer'), host: 'localhost' } }), { params: Promise.resolve({ uploadId: answer.body.upload!.id }) });
    expect(served.status).toBe(200);
    expect(Buffer.from(await served.arrayBuffer()).equals(Buffer.from(png))).toBe(true);
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
    expect(answer.body.error).toMatchObject({ field: 'file', message: expect.stringContaining('is not a PNG, JPEG, WebP or PDF') });
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(before?.backgroundUploadId);
    expect(await Upload.count({ where: { teamId: team.team.id } })).toBe(uploadsBefore);
  });

  it('refuses a file over 20 MB', async () => {
    const big = new Uint8Array(20 * 1024 * 1024 + 1);
    big.set(tinyPng());
    const answer = await upload('huge.png', big, 'image/png');
    expect(answer.status).toBe(413);
    expect(answer.body.error?.message).toContain('over 20 MB');
  });
});
