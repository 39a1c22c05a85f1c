// Benchmark of reading a DXF plan drawing: an invented 20,000-entity plan in millimetres, parsed by
// dxf-parser and normalised into the plan's paths per layer (what the upload does in the compute pool).
import DxfParser from 'dxf-parser';
import { normaliseDxf } from '../lib/dxf/normalise';
import { manyEntitiesDxf } from '../tests/helpers/dxf-sample';
import { timeMs } from './acoustic.bench';

export const BENCH_DXF_ENTITIES = 20_000;

export function runDxfBench(): void {
  const text = manyEntitiesDxf(BENCH_DXF_ENTITIES);
  const drawing = normaliseDxf(text, 'bench.dxf');
  const fastestParse = { ms: 0 };
  const parseMs = timeMs(() => new DxfParser().parseSync(text), 7, fastestParse);
  const fastestWhole = { ms: 0 };
  const wholeMs = timeMs(() => normaliseDxf(text, 'bench.dxf'), 7, fastestWhole);
  const points = drawing.layers.reduce((sum, layer) => sum + layer.paths.reduce((inLayer, path) => inLayer + path.length / 2, 0), 0);
  const rows: Array<[string, string]> = [
    ['DXF file', `${drawing.entityCount} entities on ${drawing.layers.length} layers, ${(text.length / 1e6).toFixed(2)} MB of text`],
    ['stored drawing', `${points} points, ${(JSON.stringify(drawing).length / 1e6).toFixed(2)} MB of JSON, ${drawing.widthPx} × ${drawing.heightPx} px at ${drawing.metresPerPixel! * 1000} mm/px`],
    ['dxf-parser parse, median of 7', `${parseMs.toFixed(1)} ms (fastest ${fastestParse.ms.toFixed(1)} ms)`],
    ['parse + normalise (the upload), median of 7', `${wholeMs.toFixed(1)} ms (fastest ${fastestWhole.ms.toFixed(1)} ms; aim under 1000 ms)`],
  ];
  console.log('DXF drawing');
  for (const [label, value] of rows) console.log(`  ${label.padEnd(44)} ${value}`);
}
