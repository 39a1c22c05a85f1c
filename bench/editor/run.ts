// Editor benchmarks in Chromium against a running production build (scripts/bench.sh starts
// one): the median frame time while dragging a vertex among 1,000 segments, the time from saving
// a 200-segment run to having its updated results, and how fast the demo plan's risk and treatment
// lists open.
import { chromium } from '@playwright/test';
import { createUserWithTeam, startSession } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { Plan, Project } from '@/models';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { median, percentile } from './stats';
import { mainThreadFrameTimesMs } from './trace';
import { manySegments, teedRun } from './plans';

const BASE_URL = process.env.ANTINODE_BENCH_URL ?? 'http://localhost:3200';
const DRAG_FRAMES = 240;
const SAVE_ROUNDS = 15;
const RISK_ROUNDS = 5;
const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run',
  // Frames as fast as the work allows, so a frame's length is the work it holds, not the display's 60 Hz.
  '--disable-frame-rate-limit', '--disable-gpu-vsync'];

// Page scripts are plain strings: they run in the browser, untouched by this file's compiler.
const IDLE_FRAMES_SCRIPT = `new Promise((resolve) => {
  const times = [];
  const frame = () => { times.push(performance.now()); if (times.length > 60) resolve(times.slice(1).map((t, i) => t - times[i])); else requestAnimationFrame(frame); };
  requestAnimationFrame(frame);
})`;

// One mouse move per frame while a vertex is held; each frame's length is returned.
function dragFramesScript(count: number, x: number, y: number): string {
  return `new Promise((resolve) => {
    const content = document.querySelector('.konvajs-content');
    const times = [];
    let step = 0;
    const frame = () => {
      times.push(performance.now());
      if (step >= ${count}) { resolve(times.slice(2).map((t, i) => t - times[i + 1])); return; }
      content.dispatchEvent(new MouseEvent('mousemove', { clientX: ${x} + step, clientY: ${y} + 40 * Math.sin(step / 15), bubbles: true, buttons: 1 }));
      step += 1;
      requestAnimationFrame(frame);
    };
    requestAnimationFrame(frame);
  })`;
}

const line = (label: string, value: string) => console.log(`  ${label.padEnd(44)} ${value}`);

async function main(): Promise<void> {
  const stamp = Date.now().toString(36);
  const { user, team } = await createUserWithTeam({ name: 'Bench acoustician', email: `bench-${stamp}@example.test`, password: 'bench password 1234', teamName: 'Bench' });
  await (await import('@/models')).Membership.update({ role: 'acoustician' }, { where: { userId: user.id, teamId: team.id } });
  const project = await Project.create({ teamId: team.id, name: 'Bench project', site: '', createdById: user.id });
  const dragDoc = manySegments(20, 50);
  const dragPlan = await Plan.create({ projectId: project.id, name: 'Drag bench', document: dragDoc });
  const savePlan = await Plan.create({ projectId: project.id, name: 'Save bench', document: teedRun() });
  const cookie = await startSession(user.id, team.id);
  const cookieHeader = `${cookie.name}=${cookie.value}`;

  console.log('\nplan editor (Chromium, production build)');
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS });
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  await context.addCookies([{ name: cookie.name, value: cookie.value, url: BASE_URL }]);
  const page = await context.newPage();
  await page.goto(`${BASE_URL}/plans/${dragPlan.id}`);
  const canvas = page.locator('.konvajs-content canvas').first();
  await canvas.waitFor();
  await page.getByRole('button', { name: /^Select/ }).click();
  const box = (await page.locator('.konvajs-content').boundingBox())!;
  const centre = { x: box.x + box.width / 2, y: box.y + box.height / 2 };

  // Idle frames first, to show the frame rate is not capped.
  const idle = (await page.evaluate(IDLE_FRAMES_SCRIPT)) as number[];

  await page.mouse.move(centre.x, centre.y);
  await page.mouse.down();
  await page.mouse.move(centre.x + 2, centre.y + 2);
  await browser.startTracing(page, { categories: ['devtools.timeline', 'toplevel'] });
  const frames = (await page.evaluate(dragFramesScript(DRAG_FRAMES, centre.x + 2, centre.y + 2))) as number[];
  const work = mainThreadFrameTimesMs(await browser.stopTracing());
  await page.mouse.up();
  line('segments on the canvas', String(dragDoc.segments.length));
  line('idle frame, median', `${median(idle).toFixed(2)} ms`);
  line(`drag frame interval, median of ${frames.length}`, `${median(frames).toFixed(2)} ms (95th percentile ${percentile(frames, 0.95).toFixed(2)} ms)`);
  line(`drag frame main-thread work, median of ${work.length}`, `${median(work).toFixed(2)} ms (95th percentile ${percentile(work, 0.95).toFixed(2)} ms)`);
  await browser.close();

  // Save → updated results, as the editor does it: PUT the document, then GET the results.
  const headers = { cookie: cookieHeader, 'content-type': 'application/json' };
  const planDocument = savePlan.document;
  let version = savePlan.version;
  const rounds: number[] = [];
  let resonances = 0;
  for (let round = 0; round <= SAVE_ROUNDS; round += 1) {
    const started = performance.now();
    const saved = await fetch(`${BASE_URL}/api/v1/plans/${savePlan.id}/document`, { method: 'PUT', headers, body: JSON.stringify({ version, metresPerPixel: 0.01 + round * 1e-6, document: planDocument }) });
    if (!saved.ok) throw new Error(`save answered ${saved.status}: ${await saved.text()}`);
    version = ((await saved.json()) as { version: number }).version;
    const results = await fetch(`${BASE_URL}/api/v1/plans/${savePlan.id}/results`, { headers });
    const body = (await results.json()) as { runs: { analysis: { resonances: unknown[] } | null; problem: string | null }[] };
    if (!body.runs[0]?.analysis) throw new Error(`no analysis: ${body.runs[0]?.problem}`);
    resonances = body.runs[0].analysis.resonances.length;
    if (round > 0) rounds.push(performance.now() - started); // the first round warms the server
  }
  line('run saved', `${teedRun().segments.length} segments (200 on the path, 10 two-segment branches)`);
  line('resonances in the results', String(resonances));
  line(`save → results, median of ${rounds.length}`, `${median(rounds).toFixed(1)} ms (95th percentile ${percentile(rounds, 0.95).toFixed(1)} ms)`);

  await riskListTimes(project.id, user.id, cookie);
}

/** On the demo plan, in the browser: risk list shown after opening the plan, treatment list after a click, and a chosen treatment's standing after "Add to plan". */
async function riskListTimes(projectId: string, userId: string, cookie: { name: string; value: string }): Promise<void> {
  const opens: number[] = [];
  const risksRequests: number[] = [];
  const treatmentLists: number[] = [];
  const standings: number[] = [];
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: CHROMIUM_ARGS });
  for (let round = 0; round < RISK_ROUNDS; round += 1) {
    const plan = await Plan.create({ projectId, name: `Demo ${round}`, document: demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high }), metresPerPixel: DEMO_METRES_PER_PIXEL, updatedById: userId });
    const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
    await context.addCookies([{ name: cookie.name, value: cookie.value, url: BASE_URL }]);
    const page = await context.newPage();
    await page.goto(`${BASE_URL}/plans/${plan.id}`);
    const drawer = page.getByRole('region', { name: 'Rooms and risks' });
    // the list itself: from the editor asking for the plan's risks to its rows on screen
    const answered = page.waitForResponse((response) => response.url().endsWith(`/api/v1/plans/${plan.id}/risks`));
    const started = performance.now();
    await page.reload();
    const timing = (await answered).request().timing();
    await drawer.getByTestId('risk-row').first().waitFor();
    opens.push(performance.now() - started);
    risksRequests.push(timing.responseEnd);
    const flag = drawer.getByTestId('risk-row').first();
    const clicked = performance.now();
    await flag.getByRole('button', { name: /^Treatments for/ }).click();
    await drawer.getByTestId('treatment-option').first().waitFor();
    treatmentLists.push(performance.now() - clicked);
    const added = performance.now();
    await drawer.getByTestId('treatment-option').first().getByRole('button', { name: 'Add to plan' }).click();
    await drawer.getByTestId('treatment-standing').filter({ hasNotText: 'Checking' }).first().waitFor();
    standings.push(performance.now() - added);
    await context.close();
  }
  await browser.close();
  line(`demo plan: the risk list's request, median of ${risksRequests.length}`, `${median(risksRequests).toFixed(0)} ms (max ${Math.max(...risksRequests).toFixed(0)} ms)`);
  line(`demo plan: reload → risk rows shown, median of ${opens.length}`, `${median(opens).toFixed(0)} ms (max ${Math.max(...opens).toFixed(0)} ms; includes the page load)`);
  line(`demo plan: click → treatment options shown, median of ${treatmentLists.length}`, `${median(treatmentLists).toFixed(0)} ms (max ${Math.max(...treatmentLists).toFixed(0)} ms)`);
  line(`demo plan: Add to plan → its standing shown, median of ${standings.length}`, `${median(standings).toFixed(0)} ms (max ${Math.max(...standings).toFixed(0)} ms; autosave waits 0.5 s)`);
}

main()
  .then(() => sequelize.close())
  .catch(async (error: unknown) => { console.error(error); await sequelize.close(); process.exit(1); });
