// A small library of common room finishes with random-incidence absorption coefficients in the
// octave bands 63 Hz to 8 kHz. Each entry says where its numbers come from.
import type { SurfaceName } from './room-types';

export interface Finish {
  readonly id: string;
  readonly name: string;
  /** 8 values, 63 Hz to 8 kHz. */
  readonly absorption: readonly number[];
  /** Where the numbers come from, in plain words. */
  readonly source: string;
}

/**
 * The 125 Hz to 4 kHz values are written from memory: they are typical of the coefficients printed in
 * general architectural-acoustics textbook tables, not copied from one table, and should be checked
 * against the product's own test data. Those tables stop at 125 Hz and 4 kHz; the 63 Hz and 8 kHz
 * values repeat the nearest band (product rule), which is a guess.
 */
const FROM_MEMORY = 'Typical values for this kind of finish, not one product’s: check them against the maker’s published data. 63 Hz and 8 kHz repeat the nearest band.';

/** Builds the 8 bands from the six printed ones by repeating the end bands. */
const bands = (hz125: number, hz250: number, hz500: number, hz1k: number, hz2k: number, hz4k: number): readonly number[] =>
  [hz125, hz125, hz250, hz500, hz1k, hz2k, hz4k, hz4k];

export const FINISHES: readonly Finish[] = [
  { id: 'concrete-sealed', name: 'Concrete, sealed or painted', absorption: bands(0.01, 0.01, 0.02, 0.02, 0.02, 0.02), source: FROM_MEMORY },
  { id: 'plaster-on-masonry', name: 'Plaster on masonry', absorption: bands(0.01, 0.02, 0.02, 0.03, 0.04, 0.05), source: FROM_MEMORY },
  { id: 'plasterboard-on-studs', name: 'Plasterboard (12.5 mm) on studs', absorption: bands(0.29, 0.1, 0.05, 0.04, 0.07, 0.09), source: FROM_MEMORY },
  { id: 'timber-floor-on-joists', name: 'Timber floor on joists', absorption: bands(0.15, 0.11, 0.1, 0.07, 0.06, 0.07), source: FROM_MEMORY },
  { id: 'carpet-on-concrete', name: 'Heavy carpet on concrete', absorption: bands(0.02, 0.06, 0.14, 0.37, 0.6, 0.65), source: FROM_MEMORY },
  { id: 'timber-panelling', name: 'Timber panelling on battens, air gap', absorption: bands(0.28, 0.22, 0.17, 0.09, 0.1, 0.11), source: FROM_MEMORY },
  { id: 'glazing-large-pane', name: 'Glazing, large heavy panes', absorption: bands(0.18, 0.06, 0.04, 0.03, 0.02, 0.02), source: FROM_MEMORY },
  { id: 'curtain-heavy-draped', name: 'Heavy curtain, draped', absorption: bands(0.14, 0.35, 0.55, 0.72, 0.7, 0.65), source: FROM_MEMORY },
  { id: 'mineral-tile-suspended', name: 'Mineral-fibre ceiling tiles, suspended', absorption: bands(0.45, 0.55, 0.6, 0.75, 0.8, 0.75), source: FROM_MEMORY },
];

export function findFinish(finishId: string | null): Finish | undefined {
  return finishId === null ? undefined : FINISHES.find((finish) => finish.id === finishId);
}

/** The finishes a new room starts with: plaster walls, timber floor, suspended tile ceiling (product choice). */
export const DEFAULT_FINISH_IDS: Readonly<Record<SurfaceName, string>> = {
  floor: 'timber-floor-on-joists',
  ceiling: 'mineral-tile-suspended',
  wallXMin: 'plaster-on-masonry',
  wallXMax: 'plaster-on-masonry',
  wallYMin: 'plaster-on-masonry',
  wallYMax: 'plaster-on-masonry',
};
