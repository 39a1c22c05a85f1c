// The treatment schedule's speed: a revision of 20 runs rendered to PDF (content and render),
// a few times after one warm-up. Figures only; no timed tests.
import { writeFileSync } from 'node:fs';
import { scheduleContent } from '@/lib/schedules/content';
import { renderSchedulePdf } from '@/lib/schedules/render';
import { benchRevision } from './plan';

const RUNS = Number(process.env.SCHEDULE_BENCH_RUNS ?? 20);
const REPEATS = 5;

async function main(): Promise<void> {
  const revision = benchRevision(RUNS);
  const resonances = revision.analysis.reduce((sum, run) => sum + (run.analysis?.resonances.length ?? 0), 0);
  const render = async () => renderSchedulePdf(scheduleContent({ revision, decisions: [], image: null, issuedBy: 'Bench', date: new Date(), practice: { name: 'Bench practice', logo: null }, history: [] }), new Date());
  const first = Date.now();
  const warm = await render();
  const firstMs = Date.now() - first;
  const times: number[] = [];
  for (let index = 0; index < REPEATS; index += 1) {
    const start = Date.now();
    await render();
    times.push(Date.now() - start);
  }
  times.sort((a, b) => a - b);
  if (process.env.SCHEDULE_BENCH_OUT) writeFileSync(process.env.SCHEDULE_BENCH_OUT, warm);
  console.log(`Treatment schedule PDF, ${RUNS} runs (${resonances} resonances), ${(warm.byteLength / 1024).toFixed(0)} KB`);
  console.log(`  first render (fonts loaded): ${firstMs} ms`);
  console.log(`  median of ${REPEATS}: ${times[Math.floor(REPEATS / 2)]} ms, slowest ${times[REPEATS - 1]} ms (aim: under 5000 ms)`);
}

main().catch((error: unknown) => { console.error(error); process.exit(1); });
