// Sizes outside what ducts and their linings are made in: a warning beside the field, never a
// refusal (a typed "5" read as 5 m where 5 in was meant is the usual cause).
import { formatLength, type UnitSystem } from './length';

export type LengthUse = 'duct-size' | 'lining';

interface MadeRange {
  readonly minM: number;
  readonly maxM: number;
  readonly what: string;
}

// Common practice, no source: round and rectangular duct is made from about 50 mm (2 in) up to
// about 2.5 m (100 in) a side; duct liner boards and blankets from about 6 mm (1/4 in) to 100 mm (4 in).
const MADE_RANGES: Readonly<Record<LengthUse, MadeRange>> = {
  'duct-size': { minM: 0.05, maxM: 2.5, what: 'ducts are usually made' },
  lining: { minM: 0.006, maxM: 0.1, what: 'duct linings are usually made' },
};

/** A warning in words when the length is outside what is usually made, else null. */
export function plausibilityWarning(valueM: number, use: LengthUse, system: UnitSystem): string | null {
  const range = MADE_RANGES[use];
  if (!(valueM > 0) || (valueM >= range.minM && valueM <= range.maxM)) return null;
  const size = (metres: number) => formatLength(metres, system, 'section');
  const side = valueM > range.maxM ? 'larger' : 'smaller';
  return `${size(valueM)} is ${side} than ${range.what} (about ${size(range.minM)} to ${size(range.maxM)}); check the number and its unit. Kept as typed.`;
}
