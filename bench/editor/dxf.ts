// The plan editor with a 20,000-entity DXF drawing, in Chromium against a running production build
// (scripts/bench.sh starts one): the upload's answer time, the time from opening the plan to the
// drawing on the canvas, and the main thread's work per frame while panning and while zooming with
// the wheel (aim: under 16 ms a frame).
import { chromium } from '@playwright/test';
import { createUserWithTeam, startSession } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { emptyDocument } from '@/lib/plan';
import { Membership, Plan, Project } from '@/models';
import { manyEntitiesDxf } from '../../tests/helpers/dxf-sample';
import { BENCH_DXF_ENTITIES } from '../dxf.bench';
import { median, percentile } from './stats';
import { mainThreadFrameTimesMs } from './trace';

const BASE_URL = process.env.ANTINODE_BENCH_URL ?? 'http://localhost:3200';
const PAN_STEPS = 120;
const WHEEL_STEPS = 60;
const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run',
  '--disable-frame-rate-limit', '--disable-gpu-vsync'];

const line = (label: string, value: string) => console.log(`  ${label.padEnd(44)} ${value}`);
const summary = (values: number[]) => `${median(values).toFixed(2)} ms (95th percentile ${percentile(values, 0.95).toFixed(2)} ms, ${values.length} frames)`;

async function main(): Promise<void> {
  const stamp = Date.now().toString(36);
  const { user, team } = await createUserWithTeam({ name: 'Bench acoustician', email: `bench-dxf-${stamp}@example.test`, password: 'bench password 1234', teamName: 'Bench DXF' });
  await Membership.update({ role: 'acoustician' }, { where: { userId: user.id, teamId: team.id } });
  const project = await Project.create({ teamId: team.id, name: 'Bench DXF project', site: '', createdById: user.id });
  const plan = await Plan.create({ projectId: project.id, name: 'DXF bench', document: emptyDocument() });
  const cookie = await startSession(user.id, team.id);

  console.log(`\nplan editor with a ${BENCH_DXF_ENTITIES}-entity DXF (Chromium, production build)`);
  const body = new FormData();
  body.append('file', new File([manyEntitiesDxf(BENCH_DXF_ENTITIES)], 'bench.dxf', { type: 'application/dxf' }));
  const uploadStarted = performance.now();
  const uploaded = await fetch(`${BASE_URL}/api/v1/plans/${plan.id}/background`, { method: 'POST', headers: { cookie: `${cookie.name}=${cookie.value}`, origin: BASE_URL }, body });
  if (uploaded.status !== 201) throw new Error(`the upload answered ${uploaded.status}: ${await uploaded.text()}`);
  line('upload answered (parse in the compute pool)', `${(performance.now() - uploadStarted).toFixed(0)} ms`);

  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS });
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  await context.addCookies([{ name: cookie.name, value: cookie.value, url: BASE_URL }]);
  const page = await context.newPage();
  const opened = performance.now();
  await page.goto(`${BASE_URL}/plans/${plan.id}`);
  await page.waitForFunction(() => (window as unknown as { Konva?: { stages: { find(selector: string): unknown[] }[] } }).Konva?.stages.some((stage) => stage.find('.dxf-layer').length > 0));
  line('open → drawing on the canvas', `${(performance.now() - opened).toFixed(0)} ms (includes the page load)`);

  await page.getByRole('button', { name: /^Pan/ }).click();
  const box = (await page.locator('.konvajs-content').boundingBox())!;
  const centre = { x: box.x + box.width / 2, y: box.y + box.height / 2 };

  // Pan: the Pan tool held down and moved a little each step (real input events).
  const panFrames = async () => {
    await page.mouse.move(centre.x, centre.y);
    await page.mouse.down();
    await browser.startTracing(page, { categories: ['devtools.timeline', 'toplevel'] });
    for (let step = 0; step < PAN_STEPS; step += 1) await page.mouse.move(centre.x + 3 * Math.sin(step / 10) * 40, centre.y + step);
    const frames = mainThreadFrameTimesMs(await browser.stopTracing());
    await page.mouse.up();
    return frames;
  };
  const pan = await panFrames();

  // Zoom: the wheel, in and out about the centre.
  await page.mouse.move(centre.x, centre.y);
  await browser.startTracing(page, { categories: ['devtools.timeline', 'toplevel'] });
  for (let step = 0; step < WHEEL_STEPS; step += 1) await page.mouse.wheel(0, step % 20 < 10 ? -120 : 120);
  const zoom = mainThreadFrameTimesMs(await browser.stopTracing());

  // The same pan with every layer switched off: the editor's own cost, for comparison.
  for (const box of await page.getByTestId('drawing-layers').getByRole('checkbox').all()) await box.uncheck();
  await page.waitForFunction(() => (window as unknown as { Konva: { stages: { find(selector: string): unknown[] }[] } }).Konva.stages.every((stage) => stage.find('.dxf-layer').length === 0));
  const bare = await panFrames();
  await browser.close();

  line('pan frame main-thread work, median', summary(pan));
  line('zoom frame main-thread work, median', summary(zoom));
  line('pan frame, every layer switched off', summary(bare));
}

main()
  .then(() => sequelize.close())
  .catch(async (error: unknown) => { console.error(error); await sequelize.close(); process.exit(1); });
