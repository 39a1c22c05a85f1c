// Full analysis of one duct run: resonances, reflections, echoes and warnings.
import { DEFAULT_MAX_HZ, DEFAULT_MIN_HZ } from './constants';
import { buildScatteringGraph } from './echoes/scattering-graph';
import { echoTrain } from './echoes/echo-train';
import { compileNetwork } from './network/compile';
import { NetworkEvaluator } from './network/evaluator';
import { discontinuityReflections } from './reflections';
import { modeShape } from './resonances/mode-shape';
import { attachLazyEnvelope } from './resonances/lazy-envelope';
import { findNaturalFrequencies } from './resonances/natural-frequencies';
import { broadbandFlags, broadbandRangesHz } from './resonances/broadband';
import { flankingWarnings, resonanceListAssumption, runAssumptions } from './run-assumptions';
import { lowestCutoffHz } from './run-cutoff';
import type { Resonance, RunAnalysis, RunInput } from './types';
import { validateRun } from './validate-run';

const DEFAULT_MAX_ECHOES = 40;
const DEFAULT_ECHO_THRESHOLD = 1e-3;
const MAX_ECHO_WAVEFRONTS = 200000;
/** The search's first guess of the mode spacing is at most this fraction of the analysed range, however sparse the modes. */
const MAX_SPACING_OF_RANGE = 1 / 8;
/**
 * Modes are numbered from the run's lowest natural frequency even when minHz leaves some out: the
 * search starts at this fraction of the mean mode spacing (the lowest mode of a closed–open duct is
 * half a spacing) when that is below minHz, and only the modes from minHz up are reported.
 */
const ORDER_SEARCH_FLOOR_SPACINGS = 0.1;
/** Modes whose damping is below this fraction of their frequency count as undamped (Q null). */
const UNDAMPED_FRACTION = 1e-9;

const formatHz = (hz: number): string => `${hz.toFixed(1)} Hz`;

export function analyzeRun(input: RunInput): RunAnalysis {
  validateRun(input);
  const network = compileNetwork(input);
  const evaluator = new NetworkEvaluator(network);
  const speedOfSoundMps = network.speedOfSoundMps;
  const runCutoffHz = lowestCutoffHz(input.segments, speedOfSoundMps);
  const minHz = input.minHz ?? DEFAULT_MIN_HZ;
  const maxHz = input.maxHz ?? Math.min(DEFAULT_MAX_HZ, runCutoffHz);
  const warnings: string[] = flankingWarnings(network);
  if (maxHz > runCutoffHz) {
    warnings.push(
      `maxHz (${formatHz(maxHz)}) is above the plane-wave cut-off (${formatHz(runCutoffHz)}): ` +
        'higher-order modes propagate there and the plane-wave model is not valid',
    );
  }
  let resonances: Resonance[] = [];
  const assumptions = runAssumptions(input);
  if (maxHz > minHz) {
    const endCorrectionsM = network.terminations.reduce((sum, termination) => sum + termination.lowFrequencyEndCorrectionM, 0);
    const modeSpacingHz = speedOfSoundMps / (2 * (network.totalLengthM + endCorrectionsM));
    const searchFromHz = Math.min(minHz, ORDER_SEARCH_FLOOR_SPACINGS * modeSpacingHz);
    const spacingHz = Math.min(modeSpacingHz, MAX_SPACING_OF_RANGE * (maxHz - searchFromHz));
    const zeros = findNaturalFrequencies(evaluator, { minHz: searchFromHz, maxHz, modeSpacingHz: spacingHz });
    assumptions.push(resonanceListAssumption(network));
    const hiddenBelow = zeros.filter((zero) => zero.frequencyHz < minHz).length;
    resonances = zeros.slice(hiddenBelow).map((zero, index) => {
      const damped = zero.dampingHz > UNDAMPED_FRACTION * zero.frequencyHz;
      const shape = modeShape(evaluator, zero.frequencyHz);
      return attachLazyEnvelope({
        order: hiddenBelow + index + 1,
        frequencyHz: zero.frequencyHz,
        // Q = fr / (2 fi) and the -3 dB bandwidth 2 fi of a single pole at fr + j fi (Kinsler & Frey, ch. 1, damped oscillator)
        q: damped ? zero.frequencyHz / (2 * zero.dampingHz) : null,
        bandwidthHz: damped ? 2 * zero.dampingHz : null,
        antinodesM: shape.antinodesM,
        nodesM: shape.nodesM,
        dampingHz: zero.dampingHz,
        broadband: false,
      }, evaluator);
    });
    const broadband = broadbandFlags(resonances);
    resonances.forEach((resonance, index) => {
      resonance.broadband = broadband[index];
    });
  } else {
    warnings.push(`no frequency range to analyse: maxHz (${formatHz(maxHz)}) is not above minHz (${formatHz(minHz)})`);
  }
  const echoes = echoTrain(buildScatteringGraph(input), {
    maxEchoes: input.maxEchoes ?? DEFAULT_MAX_ECHOES,
    threshold: input.echoThreshold ?? DEFAULT_ECHO_THRESHOLD,
    maxWavefronts: MAX_ECHO_WAVEFRONTS,
  });
  return {
    speedOfSoundMps,
    lengthM: network.mainLengthM,
    cutoffHz: runCutoffHz,
    endCorrectionM: {
      start: network.terminations[network.startTermination].lowFrequencyEndCorrectionM,
      end: network.terminations[network.endTermination].lowFrequencyEndCorrectionM,
    },
    reflections: discontinuityReflections(evaluator, runCutoffHz),
    resonances,
    echoes,
    warnings,
    assumptions,
    broadbandRangesHz: broadbandRangesHz(resonances, resonances.map((resonance) => resonance.broadband)),
    minHz,
    maxHz,
  };
}
