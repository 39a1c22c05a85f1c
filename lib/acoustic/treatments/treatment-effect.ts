// What a treatment does, measured across the operating envelope: a retune's clearance, a side
// branch's insertion loss at the tone and the side peaks it makes, a lining's loss in each band.
import { DB_PER_NEPER, OCTAVE_BANDS_HZ } from '../constants';
import { responseOf } from '../risk/assess-risks';
import type { RiskFlag, RiskInput } from '../risk/risk-types';
import type { RunAnalysis, RunInput } from '../types';
import { segmentAttenuation } from '../walls/segment-attenuation';
import { clearanceOf } from './retune-search';
import type { Treatment, TreatmentEffect } from './treatment-types';

/** Points across the tone's interval for the insertion loss. */
const INTERVAL_POINTS = 12;
/** Points across the neighbourhood searched for side peaks, and its width either side of the interval. */
const NEIGHBOURHOOD_POINTS = 96;
const NEIGHBOURHOOD_FRACTION = 0.3;

function spread(lowHz: number, highHz: number, points: number): number[] {
  return Array.from({ length: points + 1 }, (_, index) => lowHz + ((highHz - lowHz) * index) / points);
}

/** Insertion loss 10 log(W before / W after) across the interval, and the largest rise nearby. */
function branchEffect(baseline: RunInput, treated: RunInput, [lowHz, highHz]: [number, number]): TreatmentEffect {
  const before = responseOf(baseline);
  const after = responseOf(treated);
  const lossDb = (hz: number) => 10 * Math.log10(before.powerAt(hz) / after.powerAt(hz));
  const losses = spread(lowHz, highHz, INTERVAL_POINTS).map(lossDb);
  let sidePeakDb = -Infinity;
  let sidePeakHz = lowHz;
  for (const hz of spread(lowHz * (1 - NEIGHBOURHOOD_FRACTION), highHz * (1 + NEIGHBOURHOOD_FRACTION), NEIGHBOURHOOD_POINTS)) {
    const riseDb = -lossDb(hz);
    if (riseDb > sidePeakDb) {
      sidePeakDb = riseDb;
      sidePeakHz = hz;
    }
  }
  return { insertionLossDb: [Math.min(...losses), Math.max(...losses)], sidePeakDb, sidePeakHz };
}

/** The lining's own loss over the lined length in each band: the lined segment's attenuation less the bare one's. */
function liningEffect(run: RunInput, treatment: Extract<Treatment, { kind: 'line-segment' }>): TreatmentEffect {
  const segment = run.segments[treatment.segmentIndex];
  const lengthM = Math.min(treatment.lengthM ?? segment.lengthM, segment.lengthM);
  const piece = { ...segment, lengthM };
  const lined = { ...piece, lining: { thicknessM: treatment.thicknessM, ...(treatment.absorption === undefined ? {} : { absorption: treatment.absorption }) } };
  const wallLosses = run.wallLosses !== false;
  const withLining = segmentAttenuation(lined, run.walls, wallLosses).npPerM;
  const without = segmentAttenuation(piece, run.walls, wallLosses).npPerM;
  return { bandLossDb: OCTAVE_BANDS_HZ.map((_, band) => (withLining[band] - without[band]) * DB_PER_NEPER * lengthM) };
}

export function treatmentEffect(input: RiskInput, flag: RiskFlag, treatment: Treatment, treatedRun: RunInput, treatedAnalysis: RunAnalysis): TreatmentEffect {
  const interval = flag.quantity.envelopeHz;
  switch (treatment.kind) {
    case 'retune-length': {
      if (!interval) return {};
      const clearance = clearanceOf(treatedAnalysis.resonances, interval);
      return Number.isFinite(clearance.clearanceHz) ? { clearanceHz: clearance.clearanceHz, clearanceBandwidths: clearance.clearanceBandwidths } : {};
    }
    case 'side-branch-resonator':
      return interval ? branchEffect(input.run, treatedRun, interval) : {};
    case 'line-segment':
      return liningEffect(input.run, treatment);
    case 'change-termination':
      return {};
  }
}
