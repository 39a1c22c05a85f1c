// A run's resonances as CSV, one row per resonance as the results panel lists them: order, frequency,
// Q, bandwidth, whether it is broad, the fan tone its band meets, and the run's end corrections (the
// panel's summary) on every row so a sorted sheet keeps them. Lengths in the reader's units, named in
// the header.
import type { RunResult } from '@/lib/plans/results';
import { csvNumber, csvText, type CsvCell } from '@/lib/csv/csv-text';
import type { UnitSystem } from '@/lib/plan/units';
import { lengthColumn } from './length-column';

/** Frequencies to 0.001 Hz, the answer's precision (lib/analysis/answer-precision.ts). */
const FREQUENCY_DECIMALS = 3;
/** Q and bandwidth come to four significant figures; six decimals keep every one of them. */
const RATIO_DECIMALS = 6;

/** What the panel's last column says: "broad", "clear" or "meets". */
export function fanToneWord(broadband: boolean, toneHz: number | null): 'broad' | 'clear' | 'meets' {
  return broadband ? 'broad' : toneHz === null ? 'clear' : 'meets';
}

export function resonancesCsvHeader(units: UnitSystem): string[] {
  const length = lengthColumn(units, 'run');
  return [
    'Run', 'Order', 'Frequency (Hz)', 'Q', 'Bandwidth (Hz)', 'Fan tone (broad, clear or meets)', 'Fan tone met (Hz)',
    length.header('End correction at the start'), length.header('End correction at the end'),
  ];
}

export function resonancesCsv(result: RunResult, units: UnitSystem): string {
  const analysis = result.analysis;
  const length = lengthColumn(units, 'run');
  const rows: CsvCell[][] = (analysis?.resonances ?? []).map((resonance) => {
    const toneHz = resonance.broadband ? null : result.nearFanTone[resonance.order] ?? null;
    return [
      result.name,
      resonance.order,
      csvNumber(resonance.frequencyHz, FREQUENCY_DECIMALS),
      resonance.q === null ? null : csvNumber(resonance.q, RATIO_DECIMALS),
      resonance.bandwidthHz === null ? null : csvNumber(resonance.bandwidthHz, RATIO_DECIMALS),
      fanToneWord(resonance.broadband, toneHz),
      toneHz === null ? null : csvNumber(toneHz, FREQUENCY_DECIMALS),
      length.cell(analysis!.endCorrectionM.start),
      length.cell(analysis!.endCorrectionM.end),
    ];
  });
  return csvText(resonancesCsvHeader(units), rows);
}
