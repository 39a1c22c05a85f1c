// Noise criterion (NC) curves, octave bands 63 Hz to 8 kHz, dB: ANSI S12.2 (2008), Table 1
// (as also tabulated in the python-acoustics criterion tables).
export const NC_CURVES: ReadonlyArray<{ rating: number; levelsDb: readonly number[] }> = [
  { rating: 15, levelsDb: [47, 36, 29, 22, 17, 14, 12, 11] },
  { rating: 20, levelsDb: [51, 40, 33, 26, 22, 19, 17, 16] },
  { rating: 25, levelsDb: [54, 44, 37, 31, 27, 24, 22, 21] },
  { rating: 30, levelsDb: [57, 48, 41, 35, 31, 29, 28, 27] },
  { rating: 35, levelsDb: [60, 52, 45, 40, 36, 34, 33, 32] },
  { rating: 40, levelsDb: [64, 56, 50, 45, 41, 39, 38, 37] },
  { rating: 45, levelsDb: [67, 60, 54, 49, 46, 44, 43, 42] },
  { rating: 50, levelsDb: [71, 64, 58, 54, 51, 49, 48, 47] },
  { rating: 55, levelsDb: [74, 67, 62, 58, 56, 54, 53, 52] },
  { rating: 60, levelsDb: [77, 71, 67, 63, 61, 59, 58, 57] },
  { rating: 65, levelsDb: [80, 75, 71, 68, 66, 64, 63, 62] },
  { rating: 70, levelsDb: [83, 79, 75, 72, 71, 70, 69, 68] },
];
