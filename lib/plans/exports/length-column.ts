// A length column of an exported table in the reader's units: its header names the unit ("(m)",
// "(ft)"; sections "(mm)", "(in)") and its cells are decimal numbers in it. SI inside, converted here at
// the edge. Places along a run to 0.1 mm (the answer's precision), sections to 0.01 mm, each unit's
// decimals at least as fine.
import { FOOT_M, INCH_M } from '@/lib/acoustic';
import { csvNumber } from '@/lib/csv/csv-text';
import type { LengthKind, UnitSystem } from '@/lib/plan/units';

interface LengthUnitColumn {
  readonly unit: string;
  readonly metres: number;
  readonly decimals: number;
}

const COLUMNS: Readonly<Record<UnitSystem, Readonly<Record<LengthKind, LengthUnitColumn>>>> = {
  si: { run: { unit: 'm', metres: 1, decimals: 4 }, section: { unit: 'mm', metres: 0.001, decimals: 2 } },
  imperial: { run: { unit: 'ft', metres: FOOT_M, decimals: 4 }, section: { unit: 'in', metres: INCH_M, decimals: 3 } },
};

export interface LengthColumn {
  /** "Distance along the path (ft)". */
  header: (name: string) => string;
  /** A length in metres as a number in the column's unit. */
  cell: (valueM: number) => number;
  /** The column's unit, "m" or "ft" ("mm" or "in" for sections). */
  unit: string;
}

export function lengthColumn(system: UnitSystem, kind: LengthKind): LengthColumn {
  const { unit, metres, decimals } = COLUMNS[system][kind];
  return { unit, header: (name) => `${name} (${unit})`, cell: (valueM) => csvNumber(valueM / metres, decimals) };
}
