// The noise path from the drawing, from an acoustician's steps: the fan's sound power typed into the
// run, the path table and the spectrum against the criterion in the room, a silencer from the
// maker's data put in after a segment, and the margin and flags following it; a viewer reads the same
// table without controls. (Product behaviour; the path's arithmetic is checked against the published
// formulas in tests/unit/plan/noise-path.)
import { expect, test, type Page } from '@playwright/test';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import type { PlanDocument } from '@/lib/plan';
import { Plan } from '@/models';
import { acousticianWithProject, fittedPlanToScreen, waitForSaved } from './editor-fixtures';
import { createPerson, signIn } from './fixtures';

function planWithoutFanPower(): PlanDocument {
  const doc = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
  return { ...doc, runs: doc.runs.map((run) => ({ ...run, fanSoundPowerDb: null })) };
}

async function openRoom(page: Page): Promise<void> {
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  await drawer.getByRole('tab', { name: /^Rooms/ }).click();
  await drawer.getByRole('button', { name: 'Open Recital room' }).click();
}

/** The room's noise path tables, on their sheet over the canvas. */
async function openTables(page: Page): Promise<void> {
  await page.getByTestId('room-panel').getByRole('button', { name: 'Noise path tables…' }).click();
  await expect(page.getByTestId('noise-sheet')).toBeVisible();
}

async function closeRoom(page: Page): Promise<void> {
  await page.getByTestId('room-panel').getByRole('button', { name: 'Close', exact: true }).click();
}

/** The margins at the first listener (L1). */
async function margins(page: Page): Promise<number[]> {
  const cells = await page.getByTestId('path-margin').first().locator('td').allInnerTexts();
  return cells.map((text) => Number(text.replace('−', '-'))); // displayed with a true minus sign
}

test('fan spectrum in, path table and spectrum out; a silencer raises the margin and clears a level flag; a viewer reads it', async ({ page, browser }, testInfo) => {
  const { email, user, project, team } = await acousticianWithProject('noise-path');
  const document = planWithoutFanPower();
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document, metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);

  // Without the fan's sound power the room says what is missing.
  await openRoom(page);
  await expect(page.getByTestId('noise-path-missing')).toContainText("give its fan's sound power");
  await closeRoom(page);

  // Select the corridor segment; the run panel takes the fan's sound power.
  const corridor = await fittedPlanToScreen(page, { x: 320, y: 380 }, { document, metresPerPixel: DEMO_METRES_PER_PIXEL });
  await page.mouse.click(corridor.x, corridor.y);
  await expect(page.getByTestId('segment-label')).toHaveText('A2');
  const fanPower = page.getByLabel(/Fan sound power into this run/);
  await fanPower.fill('84, 82, 79, 75, 71, 67, 62, 56');
  await fanPower.press('Enter');
  await waitForSaved(page);

  // A silencer after the corridor segment, from the maker's data.
  await page.getByLabel('Its name').fill('Rectangular silencer, 1.5 m');
  await page.getByLabel(/Loss by octave band/).fill('6, 11, 19, 28, 34, 33, 27, 19');
  await page.getByRole('button', { name: 'Put it in' }).click();
  await expect(page.getByTestId('insert-row')).toHaveCount(1);
  await waitForSaved(page);
  await page.keyboard.press('Escape');

  // The room: the path table with the silencer in it, ratings, and the spectrum against the criterion.
  await openRoom(page);
  await expect(page.getByRole('img', { name: /^Spectrum against NC 20: predicted NC \d+/ })).toBeVisible();
  await openTables(page);
  const path = page.getByTestId('noise-path');
  await expect(path).toBeVisible();
  // the corridor feeds both of the room's outlets, so the silencer sits in both paths
  await expect(path.getByTestId('outlet-path')).toHaveCount(2);
  await expect(path.getByTestId('path-step').filter({ hasText: 'Silencer' })).toHaveCount(2);
  await expect(page.getByTestId('path-ratings').first()).toContainText(/NC \d+ · NR [\d.]+ · [\d.]+ dB\(A\)/);
  const withSilencer = await margins(page);
  await path.scrollIntoViewIfNeeded();
  await page.screenshot({ path: testInfo.outputPath('path-with-silencer.png') });

  // Take the silencer out again: every margin falls by what the silencer gave, and more bands are flagged.
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  await drawer.getByRole('tab', { name: /^Risks/ }).click();
  const flaggedWith = await drawer.locator('[data-testid="risk-row"][data-subject^="band:"]').count();
  await closeRoom(page);
  await page.mouse.click(corridor.x, corridor.y);
  await page.getByTestId('insert-row').getByRole('button', { name: 'Remove' }).click();
  await waitForSaved(page);
  await page.keyboard.press('Escape');
  await openRoom(page);
  await openTables(page);
  await expect.poll(async () => (await margins(page))[3]).toBeLessThan(withSilencer[3] - 20);
  await drawer.getByRole('tab', { name: /^Risks/ }).click();
  await expect.poll(() => drawer.locator('[data-testid="risk-row"][data-subject^="band:"]').count()).toBeGreaterThan(flaggedWith);

  // A viewer of the same team reads the same table, without the controls that change it.
  const { email: viewerEmail } = await createPerson('noise-path-viewer', [{ team, role: 'viewer' }]);
  const viewerContext = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const viewerPage = await viewerContext.newPage();
  await signIn(viewerPage, viewerEmail);
  await viewerPage.goto(`/plans/${plan.id}`);
  await openRoom(viewerPage);
  await openTables(viewerPage);
  await expect(viewerPage.getByTestId('noise-path')).toBeVisible();
  expect(await margins(viewerPage)).toEqual(await margins(page));
  await expect(viewerPage.getByText('Read only', { exact: true })).toBeVisible();
  await expect(viewerPage.getByRole('button', { name: 'Put it in' })).toHaveCount(0);
  await viewerContext.close();
});
