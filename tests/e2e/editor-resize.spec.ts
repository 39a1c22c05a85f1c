import { expect, test, type Page } from '@playwright/test';
import { Plan } from '@/models';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../unit/plan/room-plan-fixture';
import { acousticianWithProject, canvasBox, fittedPlanToScreen } from './editor-fixtures';
import { signIn } from './fixtures';

// The fixture's fan end, plan px.
const FAN = { x: 100, y: 200 };

async function areaSize(page: Page) {
  const box = await page.getByTestId('plan-canvas').boundingBox();
  if (!box) throw new Error('the canvas area is not on the page');
  return { width: Math.floor(box.width), height: Math.floor(box.height) };
}

async function expectCanvasFillsArea(page: Page): Promise<void> {
  await expect.poll(async () => {
    const canvas = await canvasBox(page);
    return { width: canvas.width, height: canvas.height };
  }).toEqual(await areaSize(page));
}

// The fan end is found where a fresh fit of the current canvas puts it.
async function expectFanWhereFitted(page: Page): Promise<void> {
  await page.keyboard.press('Escape');
  await expect(page.getByText('Start end (fan side)')).toHaveCount(0);
  const fan = await fittedPlanToScreen(page, FAN, { document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL });
  await page.mouse.click(fan.x, fan.y);
  await expect(page.getByText('Start end (fan side)')).toBeVisible();
}

test('the canvas follows the window size and refits the plan when it has not been panned or zoomed', async ({ page }, testInfo) => {
  const { email, user, project } = await acousticianWithProject('canvas-resize');
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  await expect(page.getByRole('region', { name: 'Rooms and risks' }).getByTestId('risk-row').first()).toBeVisible();

  await expectCanvasFillsArea(page);
  const wide = await canvasBox(page);
  await expectFanWhereFitted(page);
  await page.screenshot({ path: testInfo.outputPath('canvas-1440x900.png') });

  await page.setViewportSize({ width: 1024, height: 768 });
  await expectCanvasFillsArea(page);
  const narrow = await canvasBox(page);
  // A window 416 px narrower: the canvas loses all of it (the tool strip and side panel keep their width).
  expect(wide.width - narrow.width).toBe(416);
  expect(narrow.height).toBeLessThan(wide.height);
  await expectFanWhereFitted(page);
  await page.screenshot({ path: testInfo.outputPath('canvas-1024x768.png') });

  await page.setViewportSize({ width: 1440, height: 900 });
  await expectCanvasFillsArea(page);
  expect(await canvasBox(page)).toEqual(wide);
  await expectFanWhereFitted(page);
});
