// Insertion loss of duct elbows, dB, by the product of band centre frequency f (kHz) and the width of
// the elbow in the plane of the bend w (inches), as tabulated in the ASHRAE Handbook, HVAC Applications,
// chapter "Noise and vibration control" (square elbows without and with turning vanes, unlined and lined;
// radiused elbows). Every value below is written from memory, not checked against a stored copy. The
// handbook's lined values assume lining ahead of and after the elbow for at least two duct widths.

/** A row applies from its fw (kHz·in) up to the next row's; below the first row's fw the loss is 0 dB. */
export interface ElbowRow {
  fromFwKhzIn: number;
  unlinedDb: number;
  linedDb: number;
}

/** Square (mitred) elbows without turning vanes. */
export const SQUARE_ELBOW_ROWS: readonly ElbowRow[] = [
  { fromFwKhzIn: 1.9, unlinedDb: 1, linedDb: 1 },
  { fromFwKhzIn: 3.8, unlinedDb: 5, linedDb: 6 },
  { fromFwKhzIn: 7.5, unlinedDb: 8, linedDb: 11 },
  { fromFwKhzIn: 15, unlinedDb: 4, linedDb: 10 },
  { fromFwKhzIn: 30, unlinedDb: 3, linedDb: 10 },
];

/** Square elbows with turning vanes. */
export const VANED_ELBOW_ROWS: readonly ElbowRow[] = [
  { fromFwKhzIn: 1.9, unlinedDb: 1, linedDb: 1 },
  { fromFwKhzIn: 3.8, unlinedDb: 4, linedDb: 4 },
  { fromFwKhzIn: 7.5, unlinedDb: 6, linedDb: 7 },
  { fromFwKhzIn: 15, unlinedDb: 4, linedDb: 7 },
];

/**
 * Radiused elbows. The handbook gives them unlined only; a lined radiused elbow is credited with the
 * unlined values here (an underestimate, the safe side).
 */
export const RADIUSED_ELBOW_ROWS: readonly ElbowRow[] = [
  { fromFwKhzIn: 1.9, unlinedDb: 1, linedDb: 1 },
  { fromFwKhzIn: 3.8, unlinedDb: 2, linedDb: 2 },
  { fromFwKhzIn: 7.5, unlinedDb: 3, linedDb: 3 },
];
