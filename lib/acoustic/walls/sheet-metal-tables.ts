// Attenuation of sound along straight unlined galvanised sheet-metal ducts, dB per foot, as tabulated
// in the ASHRAE Handbook, HVAC Applications, chapter "Noise and vibration control" (tables of sound
// attenuation in unlined rectangular and in straight round sheet-metal ducts; the rectangular table
// after Reynolds & Bledsoe, Algorithms for HVAC Acoustics, ASHRAE 1991). Every value below is written
// from memory, not checked against a stored copy of the handbook. Bare ducts: the handbook doubles the
// rectangular values for ducts wrapped outside with insulation, which is not applied here.

/**
 * Rectangular ducts, rows by perimeter over area P/A in 1/ft, ascending (the handbook's sizes 72 x 72,
 * 48 x 48, 24 x 24, 12 x 24, 12 x 12 and 6 x 6 in). Columns 63, 125, 250 Hz and the handbook's
 * "> 250 Hz" column, placed here at 500 Hz and held for every band above.
 */
export const RECT_PERIMETER_PER_AREA_PER_FT: readonly number[] = [0.7, 1, 2, 3, 4, 8];
export const RECT_BANDS_HZ: readonly number[] = [63, 125, 250, 500];
export const RECT_DB_PER_FT: ReadonlyArray<readonly number[]> = [
  [0.1, 0.1, 0.05, 0.02], //   72 x 72 in
  [0.15, 0.1, 0.07, 0.02], //  48 x 48 in
  [0.25, 0.2, 0.1, 0.03], //   24 x 24 in
  [0.4, 0.2, 0.1, 0.05], //    12 x 24 in
  [0.35, 0.2, 0.1, 0.06], //   12 x 12 in
  [0.3, 0.2, 0.1, 0.1], //     6 x 6 in
];

/**
 * Round ducts, rows by diameter range in inches (D <= 7, 7 < D <= 15, 15 < D <= 30, 30 < D <= 60); each
 * row is placed at the upper end of its range, where the table applies to the letter. Columns 63 Hz to
 * 4 kHz; the table stops at 4 kHz, so 8 kHz takes the 4 kHz value.
 */
export const ROUND_DIAMETER_IN: readonly number[] = [7, 15, 30, 60];
export const ROUND_BANDS_HZ: readonly number[] = [63, 125, 250, 500, 1000, 2000, 4000];
export const ROUND_DB_PER_FT: ReadonlyArray<readonly number[]> = [
  [0.03, 0.03, 0.05, 0.05, 0.1, 0.1, 0.1], //     D <= 7 in
  [0.03, 0.03, 0.03, 0.05, 0.07, 0.07, 0.07], //  7 < D <= 15 in
  [0.02, 0.02, 0.02, 0.03, 0.05, 0.05, 0.05], //  15 < D <= 30 in
  [0.01, 0.01, 0.01, 0.02, 0.02, 0.02, 0.02], //  30 < D <= 60 in
];
