// The practice on a team's treatment schedules: its name and a PNG or JPEG logo (judged by its bytes,
// at most 1 MB and 2000 px a side) set on the team page, stored through the S3 client, and printed at
// the head of every page of a schedule issued from the database, with the plan's revision history and
// the reviewer's overall note.
import sharp from 'sharp';
import { extractText, getDocumentProxy } from 'unpdf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DELETE as removeLogo, POST as uploadLogo } from '@/app/api/v1/team/practice/logo/route';
import { sequelize } from '@/lib/db';
import { createProject } from '@/lib/projects/data';
import { finishReview } from '@/lib/reviews/data';
import { previewSchedule } from '@/lib/schedules/data';
import { getPracticeSettings, MAX_LOGO_BYTES, MAX_LOGO_SIDE_PX, setPracticeName } from '@/lib/team/practice';
import { Team } from '@/models';
import { declaredPng, tinyPng } from '../helpers/files';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { recitalPlan, submitted } from '../helpers/revisions';
import { call } from '../helpers/routes';

let t: TestTeam;
beforeAll(async () => { t = await createTestTeam('practice'); });
afterAll(async () => { await sequelize.close(); });

async function upload(fileName: string, bytes: Uint8Array, role: 'admin' | 'acoustician' = 'admin') {
  const body = new FormData();
  body.append('file', new File([Buffer.from(bytes)], fileName, { type: 'application/octet-stream' }));
  const request = new Request('http://localhost/api/v1/team/practice/logo', { method: 'POST', headers: { cookie: await t.cookieFor(role), host: 'localhost' }, body });
  const response = await uploadLogo(request, { params: Promise.resolve({}) });
  return { status: response.status, body: (await response.json()) as { practice?: { logo: { contentType: string; widthPx: number } | null }; error?: { message: string; field?: string } } };
}

describe('the practice on treatment schedules', () => {
  it('takes a PNG or a JPEG logo judged by its bytes, and refuses other types, oversized images and other roles', async () => {
    const png = await upload('logo.dat', tinyPng(300, 80));
    expect(png.status).toBe(201);
    expect(png.body.practice?.logo).toMatchObject({ contentType: 'image/png', widthPx: 300 });
    const jpeg = await upload('logo.png', new Uint8Array(await sharp({ create: { width: 240, height: 60, channels: 3, background: '#2d6a96' } }).jpeg().toBuffer()));
    expect(jpeg.body.practice?.logo).toMatchObject({ contentType: 'image/jpeg', widthPx: 240 });
    const webp = await upload('logo.jpg', new Uint8Array(await sharp({ create: { width: 40, height: 10, channels: 3, background: '#000' } }).webp().toBuffer()));
    expect(webp.status).toBe(400);
    expect(webp.body.error).toMatchObject({ field: 'file', message: expect.stringContaining('PNG or JPEG') });
    const wide = await upload('wide.png', declaredPng(MAX_LOGO_SIDE_PX + 1, 10));
    expect(wide.status).toBe(400);
    expect(wide.body.error?.message).toContain(`${MAX_LOGO_SIDE_PX + 1} × 10 px`);
    const heavy = await upload('heavy.png', new Uint8Array(MAX_LOGO_BYTES + 10));
    expect(heavy.status).toBe(413);
    expect((await upload('logo.png', tinyPng(10, 10), 'acoustician')).status).toBe(403);
    // the JPEG is still the logo after every refusal
    expect((await getPracticeSettings(t.team.id)).logo?.contentType).toBe('image/jpeg');
  });

  it('falls back to the team name when the practice name is cleared, and the logo can be removed', async () => {
    const admin = { id: t.members.admin.id, name: t.members.admin.name };
    expect((await setPracticeName(t.team.id, admin, { practiceName: '  ' })).practiceName).toBe('');
    const removed = await call(removeLogo, 'DELETE', '/api/v1/team/practice/logo', { cookie: await t.cookieFor('admin') });
    expect(removed.status).toBe(200);
    expect((await Team.findByPk(t.team.id))?.logoUploadId).toBeNull();
  });

  it('prints the practice name and logo on every page of a schedule issued from the database, with the revision history', async () => {
    const admin = { id: t.members.admin.id, name: t.members.admin.name };
    await setPracticeName(t.team.id, admin, { practiceName: 'Quillfield Sound Partnership' });
    expect((await upload('logo.png', tinyPng(300, 80))).status).toBe(201);
    const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Saltmarsh Library', site: '' });
    const planId = await recitalPlan(t, project.id, 'Reading room supply');
    const first = await submitted(t, planId);
    const engineer = { id: t.members.engineer.id, name: t.members.engineer.name };
    await finishReview(t.team.id, engineer, first.id, { outcome: 'revise_resubmit', note: 'Line the long corridor duct and show the effect at L2.' });
    const second = await submitted(t, planId);
    const { bytes } = await previewSchedule(t.team.id, second.id);
    const { text: pages } = await extractText(await getDocumentProxy(new Uint8Array(bytes)), { mergePages: false });
    pages.forEach((page, index) => {
      expect(page, `page ${index + 1}`).toContain('Quillfield Sound Partnership');
      expect(page, `page ${index + 1}`).toMatch(/SL-RRS-[0-9A-F]{4}-TS · revision 2/);
      expect(page, `page ${index + 1}`).toContain('Status: Draft, not accepted in review');
      expect(page, `page ${index + 1}`).toContain(`Page ${index + 1} of ${pages.length}`);
    });
    // words as read, whatever line a table cell broke them onto
    const all = pages.join('\n').replace(/\s+/g, ' ');
    expect(all).toContain('Revise and resubmit');
    expect(all).toContain('Line the long corridor duct and show the effect at L2.');
    expect(all).toContain('Waiting for review');
    // the logo is embedded: an image XObject of its own size (PDF 1.7, ISO 32000-1, 8.9.5)
    expect(Buffer.from(bytes).toString('latin1')).toMatch(/\/Width 300\s*\/Height 80|\/Height 80[\s\S]{0,200}\/Width 300|\/Width 300[\s\S]{0,200}\/Height 80/);
  });
});
