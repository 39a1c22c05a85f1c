import { expect, test, type Page } from '@playwright/test';
import type { PlanDocument, Point } from '@/lib/plan';
import { Plan } from '@/models';
import { acousticianWithProject, fittedPlanToScreen, openNewPlan, waitForCanvasFit, waitForSaved } from './editor-fixtures';

// A new plan is 10 mm per pixel with a 0.5 m (50 px) grid; every point below is on that grid, so
// clicks and drops land on it exactly. The run goes from FAN to END; the room spans (1300, 900) to
// (1900, 1400) px, 6 m × 5 m, with END 2 m along and 1 m across it.
const FAN: Point = { x: 1000, y: 1000 };
const END: Point = { x: 1500, y: 1000 };
const ROOM_FROM: Point = { x: 1300, y: 900 };
const ROOM_TO: Point = { x: 1900, y: 1400 };
const INSIDE: Point = { x: 1700, y: 1200 };
const OUTSIDE: Point = { x: 2100, y: 1200 };

async function clickOnPlan(page: Page, point: Point): Promise<void> {
  const at = await fittedPlanToScreen(page, point);
  await page.mouse.click(at.x, at.y);
}

async function dragOnPlan(page: Page, from: Point, to: Point): Promise<void> {
  const start = await fittedPlanToScreen(page, from);
  const end = await fittedPlanToScreen(page, to);
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  await page.mouse.move(end.x, end.y, { steps: 8 });
  await page.mouse.up();
}

async function saved(planId: string): Promise<{ end: Point; outlet: { xM: number; yM: number } }> {
  const document = (await Plan.findByPk(planId))?.document as PlanDocument;
  const run = document.runs[0];
  const node = document.nodes.find((candidate) => candidate.id === document.rooms[0].outlet.nodeId && candidate.id !== run.startNodeId);
  if (!node) throw new Error('the room is not fed from the run end');
  return { end: { x: node.x, y: node.y }, outlet: { xM: document.rooms[0].outlet.xM, yM: document.rooms[0].outlet.yM } };
}

test('the outlet of a room goes where the duct end feeding it goes, and back with undo', async ({ page }, testInfo) => {
  const { email, project } = await acousticianWithProject('outlet-link');
  const planId = await openNewPlan(page, email, project.id, 'Meeting room 3 supply');
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  await drawer.getByRole('button', { name: 'Show' }).click();
  await waitForCanvasFit(page);

  // A run from the fan to its open end, then a room around that end.
  await expect(page.getByRole('button', { name: /^Draw/ })).toHaveAttribute('aria-pressed', 'true');
  await clickOnPlan(page, FAN);
  await clickOnPlan(page, END);
  await page.keyboard.press('Escape');
  await waitForSaved(page);
  await page.keyboard.press('r');
  await expect(page.getByRole('button', { name: /^Room/ })).toHaveAttribute('aria-pressed', 'true');
  await clickOnPlan(page, ROOM_FROM);
  await clickOnPlan(page, ROOM_TO);
  const roomPanel = page.getByTestId('room-panel');
  await expect(roomPanel.getByLabel('Length', { exact: true })).toHaveValue('6.00 m');

  // Fed from the run's end: the outlet goes to it.
  await roomPanel.getByLabel('Fed from').selectOption({ label: 'A1 end (Run 1)' });
  await waitForSaved(page);
  await expect(roomPanel.getByTestId('outlet-link')).toHaveAttribute('data-link', 'at-end');
  await expect(roomPanel.getByLabel('Outlet x')).toHaveValue('2.00 m');
  await expect(roomPanel.getByLabel('Outlet y')).toHaveValue('1.00 m');
  expect(await saved(planId)).toEqual({ end: END, outlet: { xM: expect.closeTo(2, 9), yM: expect.closeTo(1, 9) } });

  // Drag the end further into the room: the outlet moves with it.
  await page.getByRole('button', { name: /^Select/ }).click();
  await dragOnPlan(page, END, INSIDE);
  await waitForSaved(page);
  expect(await saved(planId)).toEqual({ end: INSIDE, outlet: { xM: expect.closeTo(4, 9), yM: expect.closeTo(3, 9) } });
  await drawer.getByRole('tab', { name: /^Rooms/ }).click();
  await drawer.getByRole('button', { name: 'Open Room 1' }).click();
  await expect(roomPanel.getByLabel('Outlet x')).toHaveValue('4.00 m');
  await expect(roomPanel.getByLabel('Outlet y')).toHaveValue('3.00 m');
  await page.screenshot({ path: testInfo.outputPath('outlet-at-end.png') });

  // Drag it out through the far wall: the outlet stays on that wall, and the panel says where the end is.
  await dragOnPlan(page, INSIDE, OUTSIDE);
  await waitForSaved(page);
  expect(await saved(planId)).toEqual({ end: OUTSIDE, outlet: { xM: expect.closeTo(6, 9), yM: expect.closeTo(3, 9) } });
  await drawer.getByRole('button', { name: 'Open Room 1' }).click();
  await expect(roomPanel.getByTestId('outlet-link')).toContainText('The duct end is outside the room (2.00 m beyond its wall)');
  await page.screenshot({ path: testInfo.outputPath('outlet-end-outside.png') });

  // Undo: end and outlet come back together, one step each.
  await page.getByRole('button', { name: 'Undo' }).click();
  await waitForSaved(page);
  expect(await saved(planId)).toEqual({ end: INSIDE, outlet: { xM: expect.closeTo(4, 9), yM: expect.closeTo(3, 9) } });
  await expect(roomPanel.getByLabel('Outlet x')).toHaveValue('4.00 m');
  await expect(roomPanel.getByTestId('outlet-link')).toHaveAttribute('data-link', 'at-end');

  // The other way round: placing the outlet in the form takes the end there (3 m along: x = 1600 px).
  const outletX = roomPanel.getByLabel('Outlet x');
  await outletX.fill('3 m');
  await outletX.press('Enter');
  await waitForSaved(page);
  expect(await saved(planId)).toEqual({ end: { x: expect.closeTo(1600, 6), y: expect.closeTo(INSIDE.y, 6) }, outlet: { xM: 3, yM: expect.closeTo(3, 9) } });
  await page.getByRole('button', { name: 'Undo' }).click();
  await waitForSaved(page);
  expect(await saved(planId)).toEqual({ end: INSIDE, outlet: { xM: expect.closeTo(4, 9), yM: expect.closeTo(3, 9) } });
});
