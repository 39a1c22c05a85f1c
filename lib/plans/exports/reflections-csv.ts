// A run's reflections as CSV, one row per reflecting place as the results panel lists them: what it
// is, its label on the plan, its distance along the main path (in the reader's units, named in the
// header), then for each octave band below the cut-off |R| of the pressure wave and its phase in degrees.
import type { RunResult } from '@/lib/plans/results';
import { csvNumber, csvText, type CsvCell } from '@/lib/csv/csv-text';
import type { UnitSystem } from '@/lib/plan/units';
import { reflectionKindWords } from '@/lib/plan/reflection-words';
import { bandHeader } from './band-header';
import { lengthColumn } from './length-column';
import { reflectionPlace } from './reflection-place';

/** |R| comes to four significant figures; six decimals keep every one. */
const MAGNITUDE_DECIMALS = 6;
/** Phase arrives to 0.0001 rad, about 0.006°: three decimals of a degree keep it. */
const PHASE_DECIMALS = 3;

const degrees = (radians: number) => (radians * 180) / Math.PI;

/** The bands the file has columns for: those of the first reflection (every reflection has the same). */
export function reflectionBandsHz(result: RunResult): number[] {
  return result.analysis?.reflections[0]?.bands.map((band) => band.hz) ?? [];
}

export function reflectionsCsvHeader(bandsHz: readonly number[], units: UnitSystem): string[] {
  return [
    'Run', 'Where', 'Place on the plan', lengthColumn(units, 'run').header('Distance along the path'),
    ...bandsHz.flatMap((hz) => [bandHeader(hz, 'ratio', '|R|'), bandHeader(hz, 'degrees', 'Phase')]),
  ];
}

export function reflectionsCsv(result: RunResult, nodeLabels: Readonly<Record<string, string>>, units: UnitSystem): string {
  const bandsHz = reflectionBandsHz(result);
  const length = lengthColumn(units, 'run');
  const rows: CsvCell[][] = (result.analysis?.reflections ?? []).map((reflection) => {
    const byHz = new Map(reflection.bands.map((band) => [band.hz, band]));
    return [
      result.name,
      reflectionKindWords(reflection.kind),
      reflectionPlace(result.path, nodeLabels, reflection.atM, reflection.kind),
      length.cell(reflection.atM),
      ...bandsHz.flatMap((hz) => {
        const band = byHz.get(hz);
        return band ? [csvNumber(band.magnitude, MAGNITUDE_DECIMALS), csvNumber(degrees(band.phaseRad), PHASE_DECIMALS)] : [null, null];
      }),
    ];
  });
  return csvText(reflectionsCsvHeader(bandsHz, units), rows);
}
