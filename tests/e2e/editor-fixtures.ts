// Helpers for plan editor browser tests.
import { expect, type Page } from '@playwright/test';
import { openingArea } from '@/components/editor/canvas/opening-area';
import { fitView } from '@/components/editor/canvas/view';
import { emptyDocument, type PlanDocument, type Point } from '@/lib/plan';
import { Project } from '@/models';
import { createPerson, createTeam, signIn } from './fixtures';

export async function acousticianWithProject(label: string) {
  const team = await createTeam(`${label} team`);
  const { email, user } = await createPerson(`${label}-acoustician`, [{ team, role: 'acoustician' }]);
  const project = await Project.create({ teamId: team.id, name: `${label} project`, site: '', createdById: user.id });
  return { team, email, user, project };
}

export async function openNewPlan(page: Page, email: string, projectId: string, planName: string): Promise<string> {
  await signIn(page, email);
  await page.goto(`/projects/${projectId}`);
  await page.getByPlaceholder(/New plan name/).fill(planName);
  await page.getByRole('button', { name: 'Add plan' }).click();
  await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);
  await expect(page.locator('canvas').first()).toBeVisible();
  return page.url().split('/plans/')[1];
}

export async function canvasBox(page: Page) {
  const box = await page.locator('[data-testid="plan-canvas"] canvas, .konvajs-content canvas').first().boundingBox();
  if (!box) throw new Error('the canvas is not on the page');
  return box;
}

// The canvas has taken the size of its area (after the drawer under it opened or closed), so the
// view has been fitted to it again.
export async function waitForCanvasFit(page: Page): Promise<void> {
  const area = page.getByTestId('plan-canvas');
  await expect.poll(async () => {
    const outer = await area.boundingBox();
    const inner = await canvasBox(page);
    return outer !== null && Math.abs(outer.width - inner.width) < 1.5 && Math.abs(outer.height - inner.height) < 1.5;
  }).toBe(true);
}

// Where a plan point is on the screen while the canvas shows a plan without a drawing, as it was
// fitted when the plan opened: the app's own opening area (the drawn runs and rooms, or the whole
// grid for an empty plan) and fitView. Pass the document as it was when the page was loaded.
export async function fittedPlanToScreen(page: Page, point: Point, opened?: { document: PlanDocument; metresPerPixel: number }): Promise<Point> {
  const box = await canvasBox(page);
  const area = openingArea(opened?.document ?? emptyDocument(), opened?.metresPerPixel ?? 0.02, null);
  const view = fitView(area.widthPx, area.heightPx, box.width, box.height, area.x, area.y);
  return { x: box.x + view.offsetX + point.x * view.scale, y: box.y + view.offsetY + point.y * view.scale };
}

// Clicks with Shift held so that grid and angle snapping stay out of the way.
export async function exactClick(page: Page, x: number, y: number): Promise<void> {
  await page.keyboard.down('Shift');
  await page.mouse.click(x, y);
  await page.keyboard.up('Shift');
}

export async function waitForSaved(page: Page): Promise<void> {
  await expect(page.getByTestId('save-status')).toContainText('All changes saved');
}
