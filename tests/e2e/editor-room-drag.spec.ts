import { expect, test, type Page } from '@playwright/test';
import type { PlanDocument, Point } from '@/lib/plan';
import { Plan } from '@/models';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../unit/plan/room-plan-fixture';
import { acousticianWithProject, fittedPlanToScreen, waitForSaved } from './editor-fixtures';
import { createPerson, signIn } from './fixtures';

// The fixture's room: corner (50, 250) plan px, 12 m × 8 m at 20 mm per pixel, so 600 × 400 px.
// A point inside it, clear of the run, and the same point 250 px right and 150 px down: the
// corner lands on (300, 400), on the 0.5 m (25 px) grid. OLD_ONLY is inside the room before the
// move and outside it after.
const INSIDE: Point = { x: 450, y: 500 };
const DRAGGED: Point = { x: 700, y: 650 };
const OLD_ONLY: Point = { x: 150, y: 600 };
const opened = { document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL };

async function dragOnPlan(page: Page, from: Point, to: Point): Promise<void> {
  const start = await fittedPlanToScreen(page, from, opened);
  const end = await fittedPlanToScreen(page, to, opened);
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  await page.mouse.move(end.x, end.y, { steps: 8 });
  await page.mouse.up();
}

async function savedRoomCorner(planId: string): Promise<Point> {
  const saved = await Plan.findByPk(planId);
  const room = (saved?.document as ReturnType<typeof roomPlanDocument>).rooms[0];
  return { x: room.x, y: room.y };
}

// The risk list has arrived, so the drawer under the canvas has its height and the canvas its fit.
async function waitForSettledCanvas(page: Page): Promise<void> {
  await expect(page.getByRole('region', { name: 'Rooms and risks' }).getByTestId('risk-row').first()).toBeVisible();
}

test('a room dragged with the select tool moves onto the grid, undoes in one step, and stays moved after reload', async ({ page }, testInfo) => {
  const { email, user, project } = await acousticianWithProject('room-drag');
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  await waitForSettledCanvas(page);
  await expect(page.getByRole('button', { name: /^Select/ })).toHaveAttribute('aria-pressed', 'true');

  await dragOnPlan(page, INSIDE, DRAGGED);
  await waitForSaved(page);
  expect(await savedRoomCorner(plan.id)).toEqual({ x: 300, y: 400 });
  // Pressing on the room opened it; its form follows the move (300 px and 400 px at 20 mm per pixel).
  const roomPanel = page.getByTestId('room-panel');
  await expect(roomPanel.getByLabel("Corner from the plan's left")).toHaveValue('6.00 m');
  await expect(roomPanel.getByLabel("Corner from the plan's top")).toHaveValue('8.00 m');
  await page.screenshot({ path: testInfo.outputPath('room-dragged.png') });

  await page.getByRole('button', { name: 'Undo' }).click();
  await waitForSaved(page);
  expect(await savedRoomCorner(plan.id)).toEqual({ x: 50, y: 250 });
  await page.getByRole('button', { name: 'Redo' }).click();
  await waitForSaved(page);
  expect(await savedRoomCorner(plan.id)).toEqual({ x: 300, y: 400 });

  // After a reload the room is drawn where it was dropped: the old spot is empty plan.
  await page.reload();
  await waitForSettledCanvas(page);
  const reopened = { document: (await Plan.findByPk(plan.id))?.document as PlanDocument, metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL };
  const oldSpot = await fittedPlanToScreen(page, OLD_ONLY, reopened);
  await page.mouse.click(oldSpot.x, oldSpot.y);
  await expect(roomPanel).toHaveCount(0);
  const newSpot = await fittedPlanToScreen(page, DRAGGED, reopened);
  await page.mouse.click(newSpot.x, newSpot.y);
  await expect(roomPanel.getByLabel("Corner from the plan's left")).toHaveValue('6.00 m');
});

test('a viewer can open a room but dragging it moves nothing', async ({ page }) => {
  const { team, user, project } = await acousticianWithProject('room-drag-viewer');
  const { email } = await createPerson('room-drag-viewer', [{ team, role: 'viewer' }]);
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  await waitForSettledCanvas(page);
  await page.getByRole('button', { name: /^Select/ }).click();

  await dragOnPlan(page, INSIDE, DRAGGED);
  const roomPanel = page.getByTestId('room-panel');
  await expect(roomPanel.getByLabel("Corner from the plan's left")).toHaveValue('1.00 m');
  await expect(roomPanel.getByLabel("Corner from the plan's top")).toHaveValue('5.00 m');
  await expect(page.getByText('Read only', { exact: true })).toBeVisible();
  expect(await savedRoomCorner(plan.id)).toEqual({ x: 50, y: 250 });
});
