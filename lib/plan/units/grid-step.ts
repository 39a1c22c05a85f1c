// The drawing grid's step in the person's units: a round 0.5 m in SI, a round 1 ft in imperial
// (a metric step shown in feet would read "1 ft 7 3/4 in"). Common practice, no source.
import type { UnitSystem } from './length';

const GRID_STEP_M: Readonly<Record<UnitSystem, number>> = { si: 0.5, imperial: 0.3048 };
const GRID_STEP_WORDS: Readonly<Record<UnitSystem, string>> = { si: '0.5 m', imperial: '1 ft' };

export function gridStepM(system: UnitSystem): number {
  return GRID_STEP_M[system];
}

export function gridStepWords(system: UnitSystem): string {
  return GRID_STEP_WORDS[system];
}
