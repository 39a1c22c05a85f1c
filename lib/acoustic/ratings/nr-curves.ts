// Noise rating (NR) curves, octave bands 63 Hz to 8 kHz: L = a + b·NR. ISO R 1996 (1971), after Kosten &
// van Os (1962); the coefficients are those of the project's check-values sheet, written there from memory.
export const NR_COEFFICIENTS: ReadonlyArray<{ a: number; b: number }> = [
  { a: 35.5, b: 0.79 },
  { a: 22.0, b: 0.87 },
  { a: 12.0, b: 0.93 },
  { a: 4.8, b: 0.974 },
  { a: 0, b: 1.0 },
  { a: -3.5, b: 1.015 },
  { a: -6.1, b: 1.025 },
  { a: -8.0, b: 1.03 },
];
