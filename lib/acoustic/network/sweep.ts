// Frequency sweep of the transfer-matrix chain: the admittance seen from the start end looking into the run.
import type { RunInput } from '../types';
import { validateRun } from '../validate-run';
import { OP_SEGMENT, compileNetwork, type CompileOptions } from './compile';
import { NetworkEvaluator } from './evaluator';

/** A compiled run ready for repeated sweeps (compile once, sweep many times). */
export interface AdmittanceSweeper {
  segmentCount: number;
  /** Segment ops the chain runs per frequency (fewer than segmentCount when uniform stretches are merged). */
  chainLength: number;
  /** Writes Re and Im of U/p at the start end (U into the run), interleaved, for each real frequency. */
  sweep(frequenciesHz: Float64Array, out: Float64Array): void;
}

export function createAdmittanceSweeper(input: RunInput, options: CompileOptions = {}): AdmittanceSweeper {
  validateRun(input);
  const evaluator = new NetworkEvaluator(compileNetwork(input, options));
  const program = evaluator.network.program;
  let chainLength = 0;
  for (let op = 0; op < program.length; op += 2) if (program[op] === OP_SEGMENT) chainLength++;
  const programLength = evaluator.network.program.length;
  return {
    segmentCount: evaluator.network.segmentLengthM.length,
    chainLength,
    sweep(frequenciesHz: Float64Array, out: Float64Array): void {
      for (let index = 0; index < frequenciesHz.length; index++) {
        const slot = evaluator.run(0, programLength, frequenciesHz[index], 0, false);
        const pRe = evaluator.state(slot, 0), pIm = evaluator.state(slot, 1);
        const uRe = evaluator.state(slot, 2), uIm = evaluator.state(slot, 3);
        const norm = pRe * pRe + pIm * pIm;
        out[2 * index] = (uRe * pRe + uIm * pIm) / norm;
        out[2 * index + 1] = (uIm * pRe - uRe * pIm) / norm;
      }
    },
  };
}

/** Start-end admittance U/p (m³/(s·Pa)) at each frequency, as [re, im] interleaved. */
export function startAdmittanceSweep(input: RunInput, frequenciesHz: number[]): Float64Array {
  const out = new Float64Array(2 * frequenciesHz.length);
  createAdmittanceSweeper(input).sweep(Float64Array.from(frequenciesHz), out);
  return out;
}
