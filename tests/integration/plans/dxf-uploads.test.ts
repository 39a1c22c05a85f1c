import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as uploadBackground } from '@/app/api/v1/plans/[planId]/background/route';
import { GET as getUpload } from '@/app/api/v1/uploads/[uploadId]/route';
import { sequelize } from '@/lib/db';
import { DXF_DRAWING_CONTENT_TYPE, type DxfDrawing } from '@/lib/dxf/drawing';
import { MAX_DXF_ENTITIES } from '@/lib/dxf/limits';
import { createPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { Plan, Upload } from '@/models';
import { sampleDxf, sampleFloorPlan, type SampleEntity } from '../../helpers/dxf-sample';
import { tinyPng } from '../helpers/files';
import { createTestTeam, type TestTeam } from '../helpers/people';

// Product behaviour (no outside source) except where a check names one.
let team: TestTeam;
let planId: string;
beforeAll(async () => {
  team = await createTestTeam('dxf-uploads');
  const project = await createProject(team.team.id, team.members.acoustician.id, { name: 'DXF project', site: '' });
  planId = (await createPlan(team.team.id, team.members.acoustician.id, project.id, 'DXF plan')).id;
});
afterAll(async () => { await sequelize.close(); });

type Answer = { upload?: { id: string; contentType: string; widthPx: number; heightPx: number; dxf?: { metresPerPixel: number | null; unitsName: string | null; layerNames: string[] } }; error?: { code: string; message: string; field?: string } };

async function upload(fileName: string, bytes: Uint8Array | string) {
  const body = new FormData();
  body.append('file', new File([typeof bytes === 'string' ? bytes : Buffer.from(bytes)], fileName, { type: 'application/octet-stream' }));
  const request = new Request(`http://localhost/api/v1/plans/${planId}/background`, { method: 'POST', headers: { cookie: await team.cookieFor('acoustician'), host: 'localhost' }, body });
  const response = await uploadBackground(request, { params: Promise.resolve({ planId }) });
  return { status: response.status, body: (await response.json()) as Answer };
}

/** Uploads a file that must be refused; checks that neither the plan's drawing nor the team's uploads changed. */
async function refused(fileName: string, bytes: Uint8Array | string) {
  const before = (await Plan.findByPk(planId))?.backgroundUploadId;
  const uploadsBefore = await Upload.count({ where: { teamId: team.team.id } });
  const answer = await upload(fileName, bytes);
  expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(before);
  expect(await Upload.count({ where: { teamId: team.team.id } })).toBe(uploadsBefore);
  return answer;
}

describe('DXF plan drawings', () => {
  it('stores a DXF in millimetres as paths per layer, with the scale its units state ($INSUNITS 4, AutoCAD DXF Reference)', async () => {
    const answer = await upload('level-2.dxf', sampleFloorPlan('mm'));
    expect(answer.status).toBe(201);
    expect(answer.body.upload).toMatchObject({ contentType: DXF_DRAWING_CONTENT_TYPE, fileName: 'level-2.dxf' });
    expect(answer.body.upload!.dxf).toMatchObject({ unitsName: 'millimetres', layerNames: ['Column grid', 'Doors', 'Walls'] });
    const { widthPx, heightPx, dxf } = answer.body.upload!;
    // the invented floor's extents are 24 m × 14 m (column grid included)
    expect(widthPx * dxf!.metresPerPixel!).toBeCloseTo(24, 1);
    expect(heightPx * dxf!.metresPerPixel!).toBeCloseTo(14, 1);
    expect((await Plan.findByPk(planId))?.backgroundUploadId).toBe(answer.body.upload!.id);

    const served = await getUpload(new Request(`http://localhost/api/v1/uploads/${answer.body.upload!.id}`, { headers: { cookie: await team.cookieFor('viewer'), host: 'localhost' } }), { params: Promise.resolve({ uploadId: answer.body.upload!.id }) });
    expect(served.headers.get('content-type')).toBe(DXF_DRAWING_CONTENT_TYPE);
    const drawing = (await served.json()) as DxfDrawing;
    expect(drawing.layers.map((layer) => layer.name)).toEqual(['Column grid', 'Doors', 'Walls']);
    expect([drawing.widthPx, drawing.heightPx]).toEqual([widthPx, heightPx]);
  });

  it('lands the same floor in metres at the same true size', async () => {
    const millimetres = await upload('mm.dxf', sampleFloorPlan('mm'));
    const metres = await upload('m.dxf', sampleFloorPlan('m'));
    expect(metres.body.upload!.dxf!.unitsName).toBe('metres');
    expect(metres.body.upload!.widthPx * metres.body.upload!.dxf!.metresPerPixel!).toBe(millimetres.body.upload!.widthPx * millimetres.body.upload!.dxf!.metresPerPixel!);
  });

  it('takes a DXF that states no units, leaving the scale to two points', async () => {
    const answer = await upload('unitless.dxf', sampleFloorPlan('none'));
    expect(answer.status).toBe(201);
    expect(answer.body.upload!.dxf).toMatchObject({ metresPerPixel: null, unitsName: null });
  });

  it('refuses a DWG, saying to save it as DXF, and changes nothing (DWG version string "AC1032", Open Design Specification §2)', async () => {
    const dwg = new Uint8Array(2048);
    dwg.set(new TextEncoder().encode('AC1032'));
    const answer = await refused('level-2.dwg', dwg);
    expect(answer.status).toBe(400);
    expect(answer.body.error).toEqual({ code: 'bad_input', field: 'file', message: '“level-2.dwg” is a DWG file, which the plan cannot read. Save it as DXF from your CAD program (Save As, type DXF) and upload that.' });
  });

  it('refuses a binary DXF, asking for ASCII DXF (sentinel "AutoCAD Binary DXF", AutoCAD DXF Reference)', async () => {
    const answer = await refused('level-2.dxf', new Uint8Array([...new TextEncoder().encode('AutoCAD Binary DXF\r\n'), 0x1a, 0, 1, 2, 3]));
    expect(answer.status).toBe(400);
    expect(answer.body.error?.message).toBe('“level-2.dxf” is a binary DXF. Save it again as ASCII (text) DXF from your CAD program and upload that.');
  });

  it('refuses a file named .dxf that is not DXF', async () => {
    const answer = await refused('rooms.dxf', 'room,width,depth\nRecital room,12,9\n');
    expect(answer.status).toBe(400);
    expect(answer.body.error).toMatchObject({ field: 'file', message: expect.stringContaining('“rooms.dxf” is named as DXF but its content is not DXF text') });
  });

  it('refuses a DXF with nothing drawable in model space, naming what it found', async () => {
    const answer = await refused('notes.dxf', sampleDxf({ units: 'mm', entities: [{ kind: 'text', layer: 'Notes', at: [1, 1], text: 'Riser' }] }));
    expect(answer.status).toBe(400);
    expect(answer.body.error).toMatchObject({ field: 'file', message: expect.stringContaining('“notes.dxf” has no lines, polylines, arcs or circles in model space to draw (only TEXT)') });
  });

  it(`refuses a DXF of more than ${MAX_DXF_ENTITIES} entities with 413, and changes nothing`, async () => {
    const block = { name: 'Hundred', entities: Array.from({ length: 100 }, (_, index): SampleEntity => ({ kind: 'line', layer: '0', from: [index, 0], to: [index, 1] })) };
    const inserts = Array.from({ length: MAX_DXF_ENTITIES / 100 + 1 }, (_, index): SampleEntity => ({ kind: 'insert', layer: 'A', block: 'Hundred', at: [0, index * 2] }));
    const answer = await refused('campus.dxf', sampleDxf({ units: 'mm', blocks: [block], entities: inserts }));
    expect(answer.status).toBe(413);
    expect(answer.body.error).toMatchObject({ code: 'too_large', field: 'file', message: expect.stringContaining('more than 100,000 lines, arcs and other entities') });
  });

  it('still takes an image after a DXF', async () => {
    const answer = await upload('scan.png', tinyPng(40, 30));
    expect(answer.status).toBe(201);
    expect(answer.body.upload).toMatchObject({ contentType: 'image/png', widthPx: 40 });
    expect(answer.body.upload!.dxf).toBeUndefined();
  });
});
