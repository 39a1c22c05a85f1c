// The editor, its results, a room's results and the risk drawer at 1440 × 900 and 1024 × 768 on the
// demo recital plan (invented): nothing overlaps or is cut off (layout-check.ts), the plan header
// keeps to one row, and the screenshots are kept for a person to look at. The risk drawer is resized
// by its edge and keeps its size after a reload.
import { expect, test, type Page } from '@playwright/test';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { Plan } from '@/models';
import { acousticianWithProject, waitForCanvasFit } from './editor-fixtures';
import { signIn } from './fixtures';
import { expectCleanLayout } from './layout-check';

const SIZES = [{ width: 1440, height: 900 }, { width: 1024, height: 768 }];
/** One row of controls: the header is no taller than a button and its padding, px. */
const ONE_ROW_PX = 56;

async function settled(page: Page): Promise<void> {
  await expect(page.getByRole('region', { name: 'Rooms and risks' }).getByTestId('risk-row').first()).toBeVisible();
  await expect(page.getByRole('table', { name: 'Resonances' })).toBeVisible();
  await expect(page.locator('[aria-busy="true"]')).toHaveCount(0);
  await waitForCanvasFit(page);
}

for (const size of SIZES) {
  test(`editor, results, room and risk drawer at ${size.width} × ${size.height}: nothing overlapping or cut off`, async ({ page }, testInfo) => {
    await page.setViewportSize(size);
    const { email, user, project } = await acousticianWithProject(`screens-${size.width}`);
    const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    const plan = await Plan.create({ projectId: project.id, name: 'Level 1 recital supply', document, metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: user.id });
    await signIn(page, email);
    await page.goto(`/plans/${plan.id}`);
    await settled(page);

    const header = page.getByTestId('plan-header');
    expect((await header.boundingBox())!.height).toBeLessThanOrEqual(ONE_ROW_PX);
    await expectCleanLayout(page);
    await page.screenshot({ path: testInfo.outputPath(`editor-results-${size.width}.png`) });

    // The results panel scrolled to the echo chart.
    await page.getByRole('region', { name: 'Echo chart' }).scrollIntoViewIfNeeded();
    await expectCleanLayout(page);
    await page.screenshot({ path: testInfo.outputPath(`editor-echo-${size.width}.png`) });

    // The risk drawer made taller by its edge; it keeps the size after a reload.
    const body = page.getByTestId('drawer-body');
    const before = (await body.boundingBox())!.height;
    const edge = (await page.getByTestId('drawer-resize').boundingBox())!;
    await page.mouse.move(edge.x + edge.width / 2, edge.y + edge.height / 2);
    await page.mouse.down();
    await page.mouse.move(edge.x + edge.width / 2, edge.y + edge.height / 2 - 150, { steps: 6 });
    await page.mouse.up();
    await expect.poll(async () => (await body.boundingBox())!.height).toBeGreaterThan(before + 100);
    const resized = (await body.boundingBox())!.height;
    await page.reload();
    await settled(page);
    await expect.poll(async () => Math.round((await page.getByTestId('drawer-body').boundingBox())!.height)).toBe(Math.round(resized));
    await expectCleanLayout(page);
    await page.screenshot({ path: testInfo.outputPath(`editor-risk-drawer-${size.width}.png`) });

    // The room's results: mode chart on its logarithmic axis, finishes.
    await page.getByRole('tab', { name: /^Rooms/ }).click();
    await page.getByRole('button', { name: 'Open Recital room' }).click();
    await expect(page.getByTestId('mode-chart-tick').first()).toBeVisible();
    await page.getByTestId('mode-chart-tick').first().scrollIntoViewIfNeeded();
    await expectCleanLayout(page);
    await page.screenshot({ path: testInfo.outputPath(`editor-room-${size.width}.png`) });

    // Submit for review opens a dialog; the header keeps its height.
    await page.getByRole('button', { name: 'Submit for review' }).click();
    const dialog = page.getByRole('dialog', { name: 'Submit for review' });
    await expect(dialog).toBeVisible();
    expect((await header.boundingBox())!.height).toBeLessThanOrEqual(ONE_ROW_PX);
    await expectCleanLayout(page, dialog);
    await page.screenshot({ path: testInfo.outputPath(`editor-submit-${size.width}.png`) });
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await expect(dialog).toHaveCount(0);
  });
}
