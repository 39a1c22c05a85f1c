import { expect, test, type Page } from '@playwright/test';
import { normaliseDxf } from '@/lib/dxf/normalise';
import { formatLength } from '@/lib/plan/units';
import { Plan } from '@/models';
import { sampleDxf, sampleFloorPlan } from '../helpers/dxf-sample';
import { acousticianWithProject, openNewPlan, waitForSaved } from './editor-fixtures';

interface KonvaShape { getAttr(name: string): unknown }
interface KonvaStage { find(selector: string): KonvaShape[] }

/** The DXF layers the canvas draws, by name (each is one konva Shape named "dxf-layer"). */
async function drawnLayers(page: Page): Promise<string[]> {
  return page.evaluate(() => (window as unknown as { Konva: { stages: KonvaStage[] } }).Konva.stages
    .flatMap((stage) => stage.find('.dxf-layer')).map((shape) => String(shape.getAttr('layerName'))).sort());
}

test('a DXF in millimetres is drawn at its true size with no calibration, and its layers switch on and off', async ({ page }) => {
  const { email, project } = await acousticianWithProject('dxf');
  const planId = await openNewPlan(page, email, project.id, 'Level 2 (DXF)');
  const text = sampleFloorPlan('mm');
  // What the file says, read by the same normaliser the server uses: $INSUNITS 4 = millimetres (AutoCAD DXF Reference).
  const expected = normaliseDxf(text, 'level-2.dxf');

  await page.locator('#background-file').setInputFiles({ name: 'level-2.dxf', mimeType: 'application/dxf', buffer: Buffer.from(text) });
  await expect(page.getByTestId('upload-message')).toContainText('at true size: the file is in millimetres, so the scale is set from it');
  await expect(page.getByTestId('plan-scale')).toContainText(`Scale 1 px = ${formatLength(expected.metresPerPixel!, 'si', 'section')}`);
  await waitForSaved(page);
  const saved = await Plan.findByPk(planId);
  expect(saved!.metresPerPixel).toBe(expected.metresPerPixel);
  // The invented floor is 24 m wide (its column grid included): the plan's drawing is that wide at the plan's scale.
  const upload = await page.evaluate(async (id) => (await fetch(`/api/v1/uploads/${id}`)).json() as Promise<{ widthPx: number }>, saved!.backgroundUploadId);
  expect(upload.widthPx * saved!.metresPerPixel).toBeCloseTo(24, 1);

  // The column grid is off in the file: listed, not drawn.
  const layers = page.getByTestId('drawing-layers');
  await expect(layers).toContainText('Drawing layers (2 of 3 shown)');
  await expect(layers.getByRole('checkbox', { name: 'Column grid' })).not.toBeChecked();
  await expect.poll(() => drawnLayers(page)).toEqual(['Doors', 'Walls']);
  // kept with the test results, to look at
  await page.screenshot({ path: test.info().outputPath('dxf-plan.png') });

  await layers.getByRole('checkbox', { name: 'Doors' }).uncheck();
  await expect.poll(() => drawnLayers(page)).toEqual(['Walls']);
  await layers.getByRole('checkbox', { name: 'Column grid' }).check();
  await expect.poll(() => drawnLayers(page)).toEqual(['Column grid', 'Walls']);

  // The choice is kept for this plan in this browser.
  await page.reload();
  await expect(page.getByTestId('drawing-layers')).toContainText('Drawing layers (2 of 3 shown)');
  await expect.poll(() => drawnLayers(page)).toEqual(['Column grid', 'Walls']);
});

test('a DXF that states no units asks for the scale; a DWG and a DXF with nothing to draw are refused with what to do', async ({ page }) => {
  const { email, project } = await acousticianWithProject('dxf-refusals');
  const planId = await openNewPlan(page, email, project.id, 'Level 3 (DXF)');
  const before = (await Plan.findByPk(planId))!.metresPerPixel;

  const dwg = Buffer.alloc(1024);
  dwg.write('AC1032');
  await page.locator('#background-file').setInputFiles({ name: 'level-3.dwg', mimeType: 'application/octet-stream', buffer: dwg });
  await expect(page.getByTestId('upload-message')).toContainText('“level-3.dwg” is a DWG file, which the plan cannot read. Save it as DXF');

  await page.locator('#background-file').setInputFiles({ name: 'notes.dxf', mimeType: 'application/dxf', buffer: Buffer.from(sampleDxf({ units: 'mm', entities: [{ kind: 'text', layer: 'Notes', at: [0, 0], text: 'Riser' }] })) });
  await expect(page.getByTestId('upload-message')).toContainText('has no lines, polylines, arcs or circles in model space to draw (only TEXT)');
  expect((await Plan.findByPk(planId))!.backgroundUploadId).toBeNull();

  await page.locator('#background-file').setInputFiles({ name: 'unitless.dxf', mimeType: 'application/dxf', buffer: Buffer.from(sampleFloorPlan('none')) });
  await expect(page.getByTestId('upload-message')).toContainText('It states no units: set the scale from two points (K).');
  await expect(page.getByTestId('drawing-layers')).toContainText('The file states no units');
  await expect.poll(() => drawnLayers(page)).toEqual(['Doors', 'Walls']);
  expect((await Plan.findByPk(planId))!.metresPerPixel).toBe(before);
});
