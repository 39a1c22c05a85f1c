// Time-domain reflection train seen from the start end (method of characteristics on a
// scattering lattice, after Goupillaud (1961), Geophysics 26, 754, generalised to junctions of several ducts).
//
// A unit pressure pulse leaves the start end. Wavefronts are processed in order of arrival time;
// at a node joining ducts of areas S_i (plus a termination, as an equivalent admittance area S_T),
// pressure continuity and conservation of volume velocity give, for a wave arriving on duct i,
//   reflected = 2 S_i / sum(S) - 1,   transmitted into each other duct = 2 S_i / sum(S)
// (Kinsler & Frey, Fundamentals of Acoustics, ch. 10; two ducts: R = (S1 - S2)/(S1 + S2)).
// Coefficients are the real low-frequency limits (closed +1, open -1 with its reflection delayed by
// 2 delta / c, lined sqrt(1 - alpha), anechoic 0). Frequency-dependent wall losses are left out;
// lining attenuates by Sabine's rate. Each arrival at the start end is recorded, then reflects there.
import type { Echo } from '../types';
import { ArrivalQueue, pathText, type PathStep } from './arrival-queue';
import type { ScatteringGraph } from './scattering-graph';

export interface EchoOptions {
  maxEchoes: number;
  threshold: number;
  /** Bound on the wavefronts processed, so a lossless lattice always stops. */
  maxWavefronts: number;
}

export function echoTrain(graph: ScatteringGraph, options: EchoOptions): Echo[] {
  const echoes: Echo[] = [];
  if (options.maxEchoes <= 0) return echoes;
  const queue = new ArrivalQueue();
  const first = graph.edges[graph.nodes[0].edges[0]];
  queue.push({
    timeS: first.lengthM / graph.speedOfSoundMps,
    node: first.nodes[1],
    fromEdge: graph.nodes[0].edges[0],
    amplitude: first.transmission,
    path: null,
  });
  let processed = 0;
  while (queue.size > 0 && processed < options.maxWavefronts) {
    const wave = queue.pop();
    if (wave === undefined) break;
    processed++;
    const node = graph.nodes[wave.node];
    if (wave.node === 0) {
      echoes.push({ delayS: wave.timeS, amplitude: wave.amplitude, path: pathText(wave.path) });
      if (echoes.length >= options.maxEchoes) break;
    }
    let totalArea = node.terminationArea;
    for (const edge of node.edges) totalArea += graph.edges[edge].areaM2;
    const incomingArea = graph.edges[wave.fromEdge].areaM2;
    const transmitted = Number.isFinite(totalArea) ? (2 * incomingArea) / totalArea : 0;
    for (const edgeIndex of node.edges) {
      const isReflection = edgeIndex === wave.fromEdge;
      const coefficient = isReflection ? transmitted - 1 : transmitted;
      const edge = graph.edges[edgeIndex];
      const amplitude = wave.amplitude * coefficient * edge.transmission;
      if (!(Math.abs(amplitude) >= options.threshold)) continue;
      const path: PathStep | null = isReflection ? { label: node.label, previous: wave.path } : wave.path;
      queue.push({
        timeS: wave.timeS + edge.lengthM / graph.speedOfSoundMps + (isReflection ? node.reflectionDelayS : 0),
        node: edge.nodes[0] === wave.node ? edge.nodes[1] : edge.nodes[0],
        fromEdge: edgeIndex,
        amplitude,
        path,
      });
    }
  }
  return echoes;
}
