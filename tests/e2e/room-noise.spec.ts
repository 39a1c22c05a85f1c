// A room fed by two outlets and heard at two seats, from an acoustician's steps: the path of each outlet
// and the level at each listener, the room correction switched from furnished to bare, the fan's speed
// range, and its spectrum imported from a CSV file (a bad file refused with the row and column, a good
// one taken). Product behaviour; the sums are checked in tests/unit/plan/noise-path and
// tests/integration/plans/room-noise-api.test.ts.
import { expect, test, type Page } from '@playwright/test';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { Plan } from '@/models';
import { acousticianWithProject, fittedPlanToScreen, waitForSaved } from './editor-fixtures';
import { signIn } from './fixtures';

async function openRoom(page: Page): Promise<void> {
  const drawer = page.getByRole('region', { name: 'Rooms and risks' });
  await drawer.getByRole('tab', { name: /^Rooms/ }).click();
  await drawer.getByRole('button', { name: 'Open Recital room' }).click();
}

test('two outlets at two listeners, the room correction, the fan speed range and a CSV spectrum', async ({ page }, testInfo) => {
  const { email, user, project } = await acousticianWithProject('room-noise');
  const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
  const plan = await Plan.create({ projectId: project.id, name: 'Recital supply', document, metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: user.id });
  await signIn(page, email);
  await page.goto(`/plans/${plan.id}`);

  // Each listener's ratings in the panel; both outlets' paths and both listeners' tables on the sheet.
  await openRoom(page);
  const panel = page.getByTestId('room-panel');
  await expect(panel.getByTestId('listener-summary')).toHaveCount(2);
  await expect(panel.getByTestId('noise-summary')).toContainText('2 outlets (Outlet A3 end, Outlet A5 end)');
  await expect(panel.getByTestId('noise-summary')).toContainText(/63 Hz band lies below the room's Schroeder frequency/);
  await panel.getByLabel('Listener', { exact: true }).selectOption({ label: 'L2' });
  await expect(panel.getByRole('heading', { name: 'Spectrum against the criterion at L2' })).toBeVisible();
  await panel.getByRole('button', { name: 'Noise path tables…' }).click();
  const sheet = page.getByTestId('noise-sheet');
  const noise = sheet.getByTestId('noise-path');
  await expect(noise.getByTestId('outlet-path')).toHaveCount(2);
  await expect(noise.getByTestId('outlet-path').first()).toContainText('Outlet A3 end');
  await expect(noise.getByTestId('outlet-path').nth(1)).toContainText('Outlet A5 end');
  await expect(noise).toContainText('2 outlets, each from its own fan, summed by energy at each listener.');
  await expect(noise.getByTestId('path-ratings').nth(1)).toContainText(/^At L2: NC \d+ · NR [\d.]+ · [\d.]+ dB\(A\)/);
  await expect(noise.getByTestId('path-listener').nth(1)).toContainText('Level at L2, energy sum of the outlets');
  await page.screenshot({ path: testInfo.outputPath('two-outlets-two-listeners.png') });
  // Pointing at a duct of the path shows where it lies on the plan.
  const highlights = () => page.evaluate(() => (window as unknown as { Konva: { stages: { find(selector: string): unknown[] }[] } }).Konva.stages.flatMap((stage) => stage.find('.place-highlight')).length);
  expect(await highlights()).toBe(0);
  await noise.getByTestId('path-step').filter({ hasText: /^Duct/ }).first().hover();
  await expect.poll(highlights).toBe(1);
  await sheet.getByRole('heading', { name: /Noise path tables/ }).hover();
  await expect.poll(highlights).toBe(0);
  const levelAtL2 = async () => Number(await noise.getByTestId('path-listener').nth(1).locator('td').nth(3).innerText());
  const furnishedL2 = await levelAtL2();

  // A bare room: the room equation with its own surfaces, and the numbers follow.
  await panel.getByTestId('room-correction').getByLabel(/^Bare/).check();
  await waitForSaved(page);
  await expect(noise).toContainText('Room correction: room equation, bare room.');
  await expect.poll(levelAtL2).not.toBe(furnishedL2);
  await panel.getByRole('button', { name: 'Close', exact: true }).click();
  await expect(sheet).toHaveCount(0);

  // The run: its fan's speed range, and a spectrum from CSV.
  const corridor = await fittedPlanToScreen(page, { x: 320, y: 380 }, { document, metresPerPixel: DEMO_METRES_PER_PIXEL });
  await page.mouse.click(corridor.x, corridor.y);
  await expect(page.getByTestId('segment-label')).toHaveText('A2');
  const fan = page.getByTestId('fan-noise');
  await fan.getByLabel(/Highest speed/).fill('660');
  await fan.getByLabel(/Highest speed/).press('Enter');
  await waitForSaved(page);
  await expect(fan).toContainText('The noise path is worked at 660 rpm: +1.9 dB on the sound power given at 605 rpm');
  const file = fan.getByLabel(/Import the fan's sound power from CSV/);
  await file.setInputFiles({ name: 'fan-bad.csv', mimeType: 'text/csv', buffer: Buffer.from('Band,Lw\n63,80\n125,8x\n250,76\n500,72\n1000,68\n2000,64\n4000,60\n8000,54\n') });
  await expect(fan.getByTestId('fan-csv-report')).toContainText('Row 3, column 2: "8x" is not a number of decibels for the 125 Hz band.');
  await expect(page.getByLabel(/Fan sound power into this run/)).toHaveValue('84, 82, 79, 75, 71, 67, 62, 56');
  await file.setInputFiles({ name: 'fan.csv', mimeType: 'text/csv', buffer: Buffer.from('Hz;31.5;63;125;250;500;1k;2k;4k;8k\nLw;85;80;79;76;72;68;64;60;54\n') });
  await expect(fan.getByTestId('fan-csv-report')).toContainText('31.5 Hz left out');
  await expect(page.getByLabel(/Fan sound power into this run/)).toHaveValue('80, 79, 76, 72, 68, 64, 60, 54');
  await waitForSaved(page);
  await page.screenshot({ path: testInfo.outputPath('fan-csv.png') });

  // The path now starts from the imported spectrum at the top speed.
  await page.keyboard.press('Escape');
  await openRoom(page);
  await page.getByTestId('room-panel').getByRole('button', { name: 'Noise path tables…' }).click();
  await expect(page.getByTestId('outlet-path').first()).toContainText('Fan at 660 rpm, the top of its range');
});
