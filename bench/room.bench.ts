// Benchmark of the room analysis and of one treatment search (a retune of the bench run for a fan tone).
import { analyzeRoom, analyzeRun, assessRisks, evaluateTreatment, type RoomInput } from '../lib/acoustic';
import { benchRun, timeMs } from './acoustic.bench';

const bands = (absorption: number): number[] => Array.from({ length: 8 }, () => absorption);

/** An invented 20 x 15 x 8 m hall. */
const hall: RoomInput = {
  box: { lengthM: 20, widthM: 15, heightM: 8 },
  surfaces: { floor: bands(0.1), ceiling: bands(0.5), wallXMin: bands(0.2), wallXMax: bands(0.2), wallYMin: bands(0.15), wallYMax: bands(0.15) },
  criterionNc: 25,
  outlet: { xM: 3, yM: 0.3, zM: 7.7 },
  listener: { xM: 12, yM: 8, zM: 1.2 },
};

export function runRoomBench(): void {
  const options = { maxModeHz: 300, imageOrder: 2 };
  const room = analyzeRoom(hall, options);
  const roomFastest = { ms: 0 };
  const roomMs = timeMs(() => analyzeRoom(hall, options), 11, roomFastest);

  // A fan tone 0.2 % above a mid-band resonance of the 200-segment run (rigid walls: sharp resonances), retuned by the length search.
  const run = { ...benchRun(), walls: { kind: 'rigid' as const } };
  const analysis = analyzeRun(run);
  const toneHz = analysis.resonances[Math.floor(analysis.resonances.length / 2)].frequencyHz * 1.002;
  const blades = 10;
  const input = { run, fan: { blades, rpm: (toneHz * 60) / blades, harmonics: 1 }, options: {} };
  const flags = assessRisks(input, analysis);
  const rows: Array<[string, string]> = [
    ['room', `20 x 15 x 8 m: ${room.modes.length} modes to 300 Hz, ${room.images.length} arrivals to order 2, Schroeder ${room.schroederHz.toFixed(0)} Hz`],
    ['analyzeRoom, median of 11 runs', `${roomMs.toFixed(2)} ms (fastest ${roomFastest.ms.toFixed(2)} ms)`],
  ];
  const flag = flags.find((candidate) => candidate.kind === 'resonance-near-tone');
  if (flag) {
    const startMs = performance.now();
    const result = evaluateTreatment(input, flag, { kind: 'retune-length' });
    const searchMs = performance.now() - startMs;
    rows.push(['retune search for one tone flag', `${searchMs.toFixed(0)} ms (${result.notes.join('; ')}; clears: ${result.clears})`]);
  } else {
    rows.push(['retune search for one tone flag', 'no flag raised']);
  }
  console.log('room analysis and treatment search');
  for (const [label, value] of rows) console.log(`  ${label.padEnd(42)} ${value}`);
}
