// Bundles the compute pool's worker (lib/compute/worker.ts) into .compute/worker.mjs: one ES module
// with the project's own code inlined and npm packages left to node_modules. Run before the app
// starts or the integration tests run (scripts/lib.sh, tests/integration/global-setup.ts).
import path from 'node:path';
import { buildSync } from 'esbuild';

export function buildComputeWorker(root = path.resolve(__dirname, '..')): string {
  const outfile = path.join(root, '.compute', 'worker.mjs');
  buildSync({
    entryPoints: [path.join(root, 'lib', 'compute', 'worker.ts')],
    outfile,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    tsconfig: path.join(root, 'tsconfig.json'),
    logLevel: 'warning',
  });
  return outfile;
}

if (typeof require !== 'undefined' && require.main === module) {
  const outfile = buildComputeWorker();
  console.log(`compute worker written to ${path.relative(process.cwd(), outfile)}`);
}
