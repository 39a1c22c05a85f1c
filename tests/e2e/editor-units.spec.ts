// Lengths as a person types them: grouped digits, a bare number in the field's unit (shown in the
// field), a warning (not a refusal) for a size ducts are not made in, and the imperial round trip:
// 600 mm shown as 23.622 in (600 / 25.4 = 23.6220…; 1 in = 25.4 mm exactly, NIST SP 811 appendix B),
// retyped, is 600 mm to the exact millimetre in the saved plan. Air temperature and the speed of
// sound follow imperial; the grid steps a round 1 ft. The scale dialog reads a bare number in m,
// starts the grid at the scale line's first point, and undo takes the new scale back.
import { expect, test, type Page } from '@playwright/test';
import type { PlanDocument } from '@/lib/plan';
import { Plan } from '@/models';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../unit/plan/room-plan-fixture';
import { acousticianWithProject, canvasBox, fittedPlanToScreen, waitForSaved } from './editor-fixtures';
import { signIn } from './fixtures';

const opened = { document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL };

async function savedDocument(planId: string): Promise<{ document: PlanDocument; metresPerPixel: number }> {
  const saved = await Plan.findByPk(planId);
  return { document: saved?.document as PlanDocument, metresPerPixel: Number(saved?.metresPerPixel) };
}

/** Selects the round drop (the fixture's segment from (250, 200) to (250, 300) plan px). */
async function selectDrop(page: Page): Promise<void> {
  const at = await fittedPlanToScreen(page, { x: 250, y: 260 }, opened);
  await page.mouse.click(at.x, at.y);
  await expect(page.getByLabel('Diameter')).toBeVisible();
}

async function typeDiameter(page: Page, text: string): Promise<void> {
  const diameter = page.getByLabel('Diameter');
  await diameter.fill(text);
  await diameter.press('Enter');
}

async function chooseUnits(page: Page, label: 'SI' | 'Imperial'): Promise<void> {
  await page.getByRole('group', { name: 'Units shown' }).getByRole('button', { name: label }).click();
  await expect(page.getByRole('group', { name: 'Units shown' }).getByRole('button', { name: label })).toHaveAttribute('aria-pressed', 'true');
}

test('length fields: grouped digits, a bare number in the field\'s unit, a warning for an unmade size, and the imperial round trip to the exact millimetre', async ({ page }) => {
  const { email, user, project } = await acousticianWithProject('units');
  const plan = await Plan.create({ projectId: project.id, name: 'Units', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  await page.getByRole('button', { name: /^Select/ }).click();
  await selectDrop(page);
  const diameter = page.getByLabel('Diameter');
  await expect(diameter).toHaveValue('315 mm');

  // A bare number: the field shows the unit it will be read in, and reads it so.
  await diameter.fill('250');
  await expect(page.getByTestId('unit-hint')).toHaveText('mm');
  await diameter.press('Enter');
  await expect(page.getByRole('status').filter({ hasText: 'Read as 250 mm' })).toBeVisible();
  await expect(diameter).toHaveValue('250 mm');

  // Digits grouped with a thin space: read, taken, and warned about (ducts are not made 5 m across).
  await typeDiameter(page, '5\u2009000 mm');
  await expect(diameter).toHaveValue('5000 mm');
  await expect(page.getByRole('alert').filter({ hasText: 'larger than ducts are usually made' })).toBeVisible();
  await waitForSaved(page);
  expect((await savedDocument(plan.id)).document.segments.find((segment) => segment.id === 'drop')?.section).toEqual({ shape: 'round', diameterM: 5 });

  // The imperial round trip.
  await typeDiameter(page, '600 mm');
  await expect(diameter).toHaveValue('600 mm');
  await waitForSaved(page);
  await chooseUnits(page, 'Imperial');
  await selectDrop(page);
  await expect(diameter).toHaveValue('23.622 in');
  await diameter.fill('23.622 in');
  await diameter.press('Enter');
  await expect(diameter).toHaveValue('23.622 in');
  // A value typed differently but reading the same: still kept as it was.
  await typeDiameter(page, '23.622"');
  await expect(diameter).toHaveValue('23.622 in');
  await waitForSaved(page);
  expect((await savedDocument(plan.id)).document.segments.find((segment) => segment.id === 'drop')?.section).toEqual({ shape: 'round', diameterM: 0.6 });
  await chooseUnits(page, 'SI');
  await selectDrop(page);
  await expect(diameter).toHaveValue('600 mm');
});

test('imperial air temperature, speed of sound and grid; the scale dialog reads a bare number, starts the grid at its first point and is undone in one step', async ({ page }) => {
  const { email, user, project } = await acousticianWithProject('units-scale');
  const plan = await Plan.create({ projectId: project.id, name: 'Units scale', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  await chooseUnits(page, 'Imperial');

  // 18 °C = 64.4 °F (× 1.8 + 32); 20 °C typed in °C is kept as 20 °C and shown as 68.0 °F.
  const temperature = page.getByLabel('Air temperature');
  await expect(temperature).toHaveValue('64.4 °F');
  await temperature.fill('20 °C');
  await temperature.press('Enter');
  await expect(temperature).toHaveValue('68.0 °F');
  // Escape leaves the field, so the next key chooses a tool
  await temperature.press('Escape');
  await waitForSaved(page);
  expect((await savedDocument(plan.id)).document.runs[0].temperatureC).toBe(20);
  // c = 343.2 m/s at 20 °C (ISO 9613-1) is 1126.0 ft/s (÷ 0.3048).
  await expect(page.locator('dl[aria-label="Run summary"]')).toContainText('ft/s');
  await expect(page.getByTestId('plan-scale')).toContainText('grid 1 ft');

  // The scale from two clicks and a bare "12" (read in ft here: 12 ft = 3.6576 m).
  await page.keyboard.press('k');
  await expect(page.getByTestId('active-tool')).toContainText('Scale (K)');
  const box = await canvasBox(page);
  const first = { x: box.x + 100, y: box.y + 120 };
  await page.mouse.click(first.x, first.y);
  await page.mouse.move(first.x + 200, first.y, { steps: 4 });
  await page.mouse.click(first.x + 200, first.y);
  await page.getByLabel('Real distance').fill('12');
  await expect(page.getByRole('dialog').getByTestId('unit-hint')).toHaveText('ft');
  await page.getByRole('button', { name: 'Set scale' }).click();
  await expect(page.getByTestId('plan-scale')).toContainText('from its origin');
  await waitForSaved(page);
  const scaled = await savedDocument(plan.id);
  expect(scaled.metresPerPixel).not.toBe(ROOM_PLAN_METRES_PER_PIXEL);
  expect(scaled.document.gridOrigin).toBeDefined();
  // 12 ft over the clicked distance: the plan distance is 200 screen px over the view's scale.
  const distancePx = 200 / ((await fittedPlanToScreen(page, { x: 1, y: 0 }, opened)).x - (await fittedPlanToScreen(page, { x: 0, y: 0 }, opened)).x);
  expect(Math.abs(scaled.metresPerPixel * distancePx - 3.6576) / 3.6576).toBeLessThan(0.01);

  await page.getByRole('button', { name: 'Undo' }).click();
  await waitForSaved(page);
  const undone = await savedDocument(plan.id);
  expect(undone.metresPerPixel).toBe(ROOM_PLAN_METRES_PER_PIXEL);
  expect(undone.document.gridOrigin).toBeUndefined();
  await expect(page.getByTestId('plan-scale')).not.toContainText('from its origin');
});

test('tool keys work with focus on a side-panel control, and Escape leaves a text field', async ({ page }) => {
  const { email, user, project } = await acousticianWithProject('units-keys');
  const plan = await Plan.create({ projectId: project.id, name: 'Keys', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  await page.getByRole('button', { name: /^Select/ }).click();
  await selectDrop(page);
  // a button in the side panel has the focus: "d" still chooses the draw tool
  await page.getByRole('button', { name: 'Renumber segments' }).focus();
  await page.keyboard.press('d');
  await expect(page.getByTestId('active-tool')).toContainText('Draw (D)');
  await page.keyboard.press('v');
  await selectDrop(page);
  // Escape leaves a text field; then "t" chooses the tee tool
  const diameter = page.getByLabel('Diameter');
  await diameter.focus();
  await page.keyboard.press('Escape');
  await expect(diameter).not.toBeFocused();
  await page.keyboard.press('t');
  await expect(page.getByTestId('active-tool')).toContainText('Tee (T)');
  await expect(page.getByRole('button', { name: /^Tee/ })).toHaveAttribute('aria-pressed', 'true');
  await expect(diameter).toHaveValue('315 mm');
});
