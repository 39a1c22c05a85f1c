import { expect, test } from '@playwright/test';
import { acousticianWithProject, canvasBox, exactClick, openNewPlan, waitForSaved } from './editor-fixtures';

test('upload a plan, calibrate, draw a three-segment run in mixed units and read its first resonance', async ({ page }) => {
  const { email, project } = await acousticianWithProject('draw');
  await openNewPlan(page, email, project.id, 'Recital room supply');

  // A plan image: any PNG will do; the page itself, photographed.
  const planImage = await page.screenshot();
  await page.locator('#background-file').setInputFiles({ name: 'level-2.png', mimeType: 'image/png', buffer: planImage });
  await expect(page.getByTestId('upload-message')).toContainText('is the plan drawing now');
  // The page refreshes with the drawing (the canvas then fits it): calibrate only once it is shown.
  await expect(page.locator('label[for="background-file"]')).toHaveText('Replace drawing');

  const box = await canvasBox(page);
  const x0 = box.x + 80;
  const y0 = box.y + 80;

  // Scale: two points 500 screen pixels apart are 2 m apart.
  await page.getByRole('button', { name: /^Scale/ }).click();
  await page.mouse.click(x0, y0);
  await page.mouse.click(x0 + 500, y0);
  await page.getByLabel('Real distance').fill('2 m');
  await page.getByRole('button', { name: 'Set scale' }).click();

  // Draw 300 + 200 + 300 = 800 screen pixels: 3.2 m at that scale.
  await page.getByRole('button', { name: /^Draw/ }).click();
  await exactClick(page, x0, y0 + 200);
  await exactClick(page, x0 + 300, y0 + 200);
  await exactClick(page, x0 + 300, y0 + 400);
  await exactClick(page, x0 + 600, y0 + 400);
  await page.keyboard.press('Escape');
  await waitForSaved(page);

  // Sections: Ø 200 mm, typed three ways.
  await page.getByRole('button', { name: /^Select/ }).click();
  const sizes = ['200 mm', '7.874015748 in', '0.2 m'];
  const midpoints = [[x0 + 150, y0 + 200], [x0 + 300, y0 + 300], [x0 + 450, y0 + 400]];
  for (const [index, [x, y]] of midpoints.entries()) {
    await page.mouse.click(x, y);
    const diameter = page.getByLabel('Diameter');
    await diameter.fill(sizes[index]);
    await diameter.press('Enter');
    await expect(page.getByRole('status').filter({ hasText: 'Read as' })).toBeVisible();
  }
  await page.mouse.click(x0 + 550, y0 + 100); // empty plan: nothing selected, the results show
  await waitForSaved(page);

  // The run starts closed (fan end) and ends open, unflanged: the defaults of a new run.
  // Kinsler, Frey et al., Fundamentals of Acoustics, ch. 10: closed–open pipe f1 = c / 4(L + δ);
  // Levine & Schwinger (1948): unflanged end correction δ = 0.6133 a; c = 343.2 m/s at 20 °C (ISO 9613-1).
  const lengthM = 3.2;
  const radiusM = 0.1;
  const expectedHz = 343.2 / (4 * (lengthM + 0.6133 * radiusM));
  const firstRow = page.getByRole('table', { name: 'Resonances' }).locator('tbody tr').first();
  await expect(firstRow).toBeVisible();
  // the panel keeps the last results until the saved version's analysis arrives
  await expect(page.locator('[aria-busy="true"]')).toHaveCount(0);
  await expect.poll(async () => Math.abs(Number.parseFloat(await firstRow.locator('td').nth(1).innerText()) - expectedHz) / expectedHz).toBeLessThan(0.01);
});
