import { expect, test } from '@playwright/test';
import { emptyDocument, initialEditorState, performCommand } from '@/lib/plan';
import { Plan } from '@/models';
import { signIn } from './fixtures';
import { acousticianWithProject } from './editor-fixtures';

test('a non-image upload, an oversized file and a bad CSV row each get a clear message and change nothing', async ({ page }) => {
  const { email, project } = await acousticianWithProject('bad-input');
  const document = performCommand('draw-segment', emptyDocument(), initialEditorState(), { from: { point: { x: 1500, y: 1500 } }, to: { point: { x: 2500, y: 1500 } } }).doc;
  const plan = await Plan.create({ projectId: project.id, name: 'Careful plan', document });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  await expect(page.locator('canvas').first()).toBeVisible();

  // Named like a PNG, but it is text.
  await page.locator('#background-file').setInputFiles({ name: 'plan.png', mimeType: 'image/png', buffer: Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>') });
  await expect(page.getByTestId('upload-message')).toContainText('is not a PNG, JPEG, WebP, PDF or DXF file');

  // A real PNG signature padded past 20 MB.
  const big = Buffer.alloc(21 * 1024 * 1024);
  Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]).copy(big);
  await page.locator('#background-file').setInputFiles({ name: 'huge.png', mimeType: 'image/png', buffer: big });
  await expect(page.getByTestId('upload-message')).toContainText('over 20 MB');
  await expect(page.getByText('Upload drawing')).toBeVisible();

  // A schedule whose second data row has a diameter that is not a number.
  const csv = 'order,from_m,length_m,shape,diameter_mm,width_mm,height_mm,lining_thickness_mm,lining_absorption,segment_id\n1,0,10,round,12x,,,,,\n';
  await page.locator('#schedule-file').setInputFiles({ name: 'schedule.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
  const alert = page.getByTestId('schedule-csv').getByRole('alert');
  await expect(alert).toContainText('Nothing was imported.');
  await expect(alert).toContainText('Row 2');
  await expect(alert).toContainText('diameter_mm');

  await expect(page.getByTestId('save-status')).toContainText('All changes saved · version 1');
  await plan.reload();
  expect(plan.version).toBe(1);
  expect(plan.backgroundUploadId).toBeNull();
});
