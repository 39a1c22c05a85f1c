// Bundles the compute pool's worker (lib/compute/worker.ts) into .compute/worker.mjs and the job
// worker process (lib/jobs/worker-main.ts) into .compute/jobs-worker.mjs: ES modules with the
// project's own code inlined and npm packages left to node_modules. Run before the app
// starts or the integration tests run (scripts/lib.sh, tests/integration/global-setup.ts).
import path from 'node:path';
import { buildSync } from 'esbuild';

function bundle(root: string, entry: string, outfile: string): void {
  buildSync({
    entryPoints: [entry],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    tsconfig: path.join(root, 'tsconfig.json'),
    jsx: 'automatic',
    logLevel: 'warning',
  });
}

export function buildComputeWorker(root = path.resolve(__dirname, '..')): string {
  const outfile = path.join(root, '.compute', 'worker.mjs');
  bundle(root, path.join(root, 'lib', 'compute', 'worker.ts'), outfile);
  return outfile;
}

export function buildJobsWorker(root = path.resolve(__dirname, '..')): string {
  const outfile = path.join(root, '.compute', 'jobs-worker.mjs');
  bundle(root, path.join(root, 'lib', 'jobs', 'worker-main.ts'), outfile);
  return outfile;
}

if (typeof require !== 'undefined' && require.main === module) {
  for (const outfile of [buildComputeWorker(), buildJobsWorker()]) console.log(`written: ${path.relative(process.cwd(), outfile)}`);
}
