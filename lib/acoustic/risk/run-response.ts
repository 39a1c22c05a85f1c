// How much the run's standing waves raise what a fan sends through it at one frequency, against the
// run's smooth response.
//
// A fan at the start end sends a wave s into the run. With Rs the start end's reflection and Gamma the
// reflection looking into the run (everything downstream folded in), the wave leaving the fan is
// s / (1 - Rs Gamma), and the power the run takes in (to its outlets and its walls) per unit of the
// fan's own is
//   W(f) = (1 - |Gamma|^2) / |1 - Rs Gamma|^2
// (the multiple-reflection sum of a source between two reflectors; Kinsler & Frey, Fundamentals of
// Acoustics, ch. 10, and Munjal, Acoustics of Ducts and Mufflers, ch. 2, source–load coupling).
// Its peaks are the run's resonances as the fan drives them; a damped run's peaks are low and broad.
// The smooth response is the energy mean of W over a window at least two mode spacings c / (2 L) and
// one third of an octave wide: what the run passes with its standing waves averaged out (product rule).
// The gain at f is 10 log10(W(f) / smooth); its largest value over a frequency interval is what a tone
// sweeping that interval (the operating envelope) can meet.
import { compileNetwork } from '../network/compile';
import { NetworkEvaluator } from '../network/evaluator';
import type { Resonance, RunInput } from '../types';

/** Points across the averaging window. */
const WINDOW_POINTS = 48;
/** Points across an interval's peak search, besides its ends and the resonances inside it. */
const INTERVAL_POINTS = 24;
/** Half the window: a sixth of an octave each side at least (one third of an octave in all). */
const THIRD_OCTAVE_HALF_RATIO = Math.pow(2, 1 / 6);

export interface PeakGain {
  /** The largest gain over the interval, dB (negative: the run passes less than its smooth response there). */
  gainDb: number;
  /** Where it is, Hz. */
  atHz: number;
}

export class RunResponse {
  private readonly evaluator: NetworkEvaluator;
  private readonly modeSpacingHz: number;
  readonly speedOfSoundMps: number;

  constructor(run: RunInput) {
    const network = compileNetwork(run);
    this.evaluator = new NetworkEvaluator(network);
    this.speedOfSoundMps = network.speedOfSoundMps;
    this.modeSpacingHz = network.speedOfSoundMps / (2 * network.totalLengthM);
  }

  /** W(f): power taken in per unit of the fan's own (see above). */
  powerAt(frequencyHz: number): number {
    const evaluator = this.evaluator;
    evaluator.startReflections(frequencyHz);
    const gammaRe = evaluator.inputReflectionRe, gammaIm = evaluator.inputReflectionIm;
    const rsRe = evaluator.startReflectionRe, rsIm = evaluator.startReflectionIm;
    const loopRe = 1 - (rsRe * gammaRe - rsIm * gammaIm);
    const loopIm = -(rsRe * gammaIm + rsIm * gammaRe);
    const taken = Math.max(0, 1 - (gammaRe * gammaRe + gammaIm * gammaIm));
    return taken / (loopRe * loopRe + loopIm * loopIm);
  }

  /** The energy mean of W over the window around [lowHz, highHz] (see above). */
  smoothAround(lowHz: number, highHz: number): number {
    const centreHz = Math.sqrt(lowHz * highHz);
    const halfHz = Math.max(this.modeSpacingHz, centreHz * (THIRD_OCTAVE_HALF_RATIO - 1));
    const fromHz = Math.max(lowHz - halfHz, lowHz / 2);
    const toHz = highHz + halfHz;
    let sum = 0;
    for (let point = 0; point < WINDOW_POINTS; point++) sum += this.powerAt(fromHz + ((point + 0.5) * (toHz - fromHz)) / WINDOW_POINTS);
    return sum / WINDOW_POINTS;
  }

  /** The largest gain over [lowHz, highHz]: at its ends, across it, and at every resonance inside it. */
  peakGain(lowHz: number, highHz: number, resonances: readonly Resonance[]): PeakGain {
    const smooth = this.smoothAround(lowHz, highHz);
    const candidatesHz = [lowHz, highHz];
    for (let point = 1; point < INTERVAL_POINTS; point++) candidatesHz.push(lowHz + (point * (highHz - lowHz)) / INTERVAL_POINTS);
    for (const resonance of resonances) if (resonance.frequencyHz >= lowHz && resonance.frequencyHz <= highHz) candidatesHz.push(resonance.frequencyHz);
    let best = { power: -Infinity, atHz: lowHz };
    for (const hz of candidatesHz) {
      const power = this.powerAt(hz);
      if (power > best.power) best = { power, atHz: hz };
    }
    return { gainDb: 10 * Math.log10(best.power / smooth), atHz: best.atHz };
  }
}
