import { expect, test } from '@playwright/test';
import type { PlanDocument, Point } from '@/lib/plan';
import { Plan } from '@/models';
import { ROOM_PLAN_METRES_PER_PIXEL, roomPlanDocument } from '../unit/plan/room-plan-fixture';
import { acousticianWithProject, fittedPlanToScreen } from './editor-fixtures';
import { createPerson, signIn } from './fixtures';

const READ_ONLY = 'Your role can read this plan but not change it.';
// Plan points clear of the run, inside and outside the fixture's room (x 50–650 px, y 250–650 px).
const EMPTY_POINTS: Point[] = [{ x: 700, y: 300 }, { x: 720, y: 550 }];
const IN_ROOM: Point = { x: 450, y: 500 };

test('a viewer pressing the drawing keys and clicking the plan changes nothing and is told why', async ({ page }) => {
  const { team, user, project } = await acousticianWithProject('read-only-keys');
  const { email } = await createPerson('read-only-viewer', [{ team, role: 'viewer' }]);
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL, updatedById: user.id });
  const versionBefore = plan.version;
  const opened = { document: roomPlanDocument(), metresPerPixel: ROOM_PLAN_METRES_PER_PIXEL };
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  await expect(drawer.getByTestId('risk-row').first()).toBeVisible();
  await expect(page.getByText('Read only', { exact: true })).toBeVisible();

  // Only the tools that change nothing are offered; the others stay off when their keys are pressed.
  const tools = page.getByRole('toolbar', { name: 'Drawing tools' });
  await expect(tools.getByRole('button')).toHaveText([/^Select/, /^Pan/]);
  const pan = tools.getByRole('button', { name: /^Pan/ });
  await expect(pan).toHaveAttribute('aria-pressed', 'true');
  const notice = page.getByRole('alert').filter({ hasText: READ_ONLY });
  for (const key of ['r', 'k', 'd', 's', 't', 'Delete', 'Control+z', 'Control+Shift+z']) {
    await page.keyboard.press(key);
    await expect(notice, `after ${key}`).toBeVisible();
    await expect(pan).toHaveAttribute('aria-pressed', 'true');
    for (const point of EMPTY_POINTS) {
      const at = await fittedPlanToScreen(page, point, opened);
      await page.mouse.click(at.x, at.y);
    }
    await notice.getByRole('button', { name: 'Dismiss' }).click();
    await expect(notice).toHaveCount(0);
  }

  // The clicks have all been handled: with the select tool a click on the room opens it, read only.
  await page.keyboard.press('v');
  await expect(tools.getByRole('button', { name: /^Select/ })).toHaveAttribute('aria-pressed', 'true');
  const room = await fittedPlanToScreen(page, IN_ROOM, opened);
  await page.mouse.click(room.x, room.y);
  await expect(page.getByTestId('room-panel').getByLabel('Name')).toBeDisabled();

  // Nothing was drawn, no scale was asked for, and the screen does not wait for a save that never comes.
  await expect(page.getByRole('dialog', { name: 'Set the scale' })).toHaveCount(0);
  await expect(drawer.getByRole('tab', { name: /^Rooms/ })).toHaveText('Rooms (1)');
  await expect(page.getByText(/updating…/)).toHaveCount(0);
  const answer = await page.request.get(`/api/v1/plans/${plan.id}`);
  expect(answer.status()).toBe(200);
  const served = (await answer.json()) as { plan: { version: number; document: PlanDocument } };
  expect(served.plan.version).toBe(versionBefore);
  expect(served.plan.document).toEqual(roomPlanDocument());
});
