// `npm run bench`: runs every registered benchmark in turn. Add a new one by appending to BENCHES.
import { runAcousticBench } from './acoustic.bench';
import { runDxfBench } from './dxf.bench';
import { runNoisePathBench } from './noise-path.bench';
import { runRoomBench } from './room.bench';
import { runSearchBench } from './search.bench';

const BENCHES: Array<{ name: string; run: () => void | Promise<void> }> = [
  { name: 'acoustic', run: runAcousticBench },
  { name: 'resonance search', run: runSearchBench },
  { name: 'room', run: runRoomBench },
  { name: 'noise path', run: runNoisePathBench },
  { name: 'DXF drawing', run: runDxfBench },
];

async function main(): Promise<void> {
  for (const bench of BENCHES) {
    await bench.run();
    console.log('');
  }
}

void main();
