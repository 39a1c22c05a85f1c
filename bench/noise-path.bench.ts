// Benchmark of the noise path at the size of one plan: 20 runs with 40 outlets into 10 rooms, every
// outlet's path from its fan to its listener, then each room's outlets summed and rated.
import { aWeightedLevelDb, ncRating, noisePath, nrRating, sumLevelsDb, type NoisePathInput, type PathElement } from '../lib/acoustic';
import { timeMs } from './acoustic.bench';

const RUNS = 20;
const OUTLETS_PER_RUN = 2;
const ROOMS = 10;
const TARGET_MS = 20;

/** An invented plan: run r's fan, main duct and branches; outlet o of the plan serves room o % 10. */
function planPaths(): Array<{ roomIndex: number; input: NoisePathInput }> {
  const paths: Array<{ roomIndex: number; input: NoisePathInput }> = [];
  for (let run = 0; run < RUNS; run++) {
    const main = { shape: 'rect' as const, widthM: 0.5 + 0.05 * (run % 4), heightM: 0.35 };
    const branch = { shape: 'round' as const, diameterM: 0.2 + 0.025 * (run % 3) };
    const soundPowerDb = [88, 86, 83, 80, 77, 73, 68, 62].map((levelDb) => levelDb - (run % 5));
    for (let outlet = 0; outlet < OUTLETS_PER_RUN; outlet++) {
      const elements: PathElement[] = [
        { kind: 'plenum', outletAreaM2: 0.2, surfaceAreaM2: 9, absorption: 0.6, distanceM: 1.2, angleDeg: 45 },
        { kind: 'silencer', insertionLossDb: [4, 7, 13, 20, 24, 22, 17, 13] },
        { kind: 'duct', section: main, lengthM: 6 + run * 0.4, lining: run % 2 === 0 ? { thicknessM: 0.025 } : undefined },
        { kind: 'elbow', section: main, vanes: true },
        { kind: 'duct', section: main, lengthM: 4 + outlet },
        { kind: 'split', branchAreaM2: 0.05, totalAreaM2: 0.05 * (OUTLETS_PER_RUN + 1) },
        { kind: 'duct', section: branch, lengthM: 3 + outlet * 2, wall: { kind: 'rigid' } },
        { kind: 'elbow', section: branch },
        { kind: 'duct', section: branch, lengthM: 1.5 },
        { kind: 'loss', label: 'damper and grille', lossDb: [0, 0, 1, 1, 2, 2, 3, 3] },
        { kind: 'outlet', diameterM: branch.diameterM, mounting: 'flush' },
      ];
      const roomIndex = (run * OUTLETS_PER_RUN + outlet) % ROOMS;
      paths.push({ roomIndex, input: { soundPowerDb, elements, room: { volumeM3: 60 + 25 * roomIndex, distanceM: 2 + 0.3 * roomIndex } } });
    }
  }
  return paths;
}

/** Every path, then each room's total per band and its NC, NR and dB(A). */
function ratePlan(paths: Array<{ roomIndex: number; input: NoisePathInput }>): Array<{ nc: number; nr: number; dba: number }> {
  const byRoom: number[][][] = Array.from({ length: ROOMS }, () => []);
  for (const { roomIndex, input } of paths) byRoom[roomIndex].push(noisePath(input).listenerDb);
  return byRoom.map((spectra) => {
    const totalDb = spectra[0].map((_, band) => sumLevelsDb(spectra.map((spectrum) => spectrum[band])));
    return { nc: ncRating(totalDb), nr: nrRating(totalDb), dba: aWeightedLevelDb(totalDb) };
  });
}

export function runNoisePathBench(): void {
  const paths = planPaths();
  const ratings = ratePlan(paths);
  // Warm the JIT first, as a server that has rated a plan before would be.
  for (let round = 0; round < 20; round++) ratePlan(paths);
  const fastest = { ms: 0 };
  const medianMs = timeMs(() => ratePlan(paths), 51, fastest);
  const loudest = ratings.reduce((worst, rating) => (rating.nc > worst.nc ? rating : worst));
  const elementCount = paths.reduce((sum, path) => sum + path.input.elements.length, 0);
  const rows: Array<[string, string]> = [
    ['plan', `${RUNS} runs, ${paths.length} outlets (${elementCount} elements) into ${ROOMS} rooms; loudest room NC ${loudest.nc}, ${loudest.dba.toFixed(1)} dB(A)`],
    ['all paths and room ratings, median of 51', `${medianMs.toFixed(2)} ms (fastest ${fastest.ms.toFixed(2)} ms; aim under ${TARGET_MS} ms)`],
  ];
  console.log('noise path');
  for (const [label, value] of rows) console.log(`  ${label.padEnd(42)} ${value}`);
}
