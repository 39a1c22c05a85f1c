// Plain words for the values of a plan document, as the change summary shows them.
import type { Lining, Section, Termination, Wall } from '@/lib/plan/document';
import { formatLength, type UnitSystem } from '@/lib/plan/units';

export function sectionWords(section: Section, units: UnitSystem): string {
  return section.shape === 'round'
    ? `round Ø ${formatLength(section.diameterM, units, 'section')}`
    : `rectangular ${formatLength(section.widthM, units, 'section')} × ${formatLength(section.heightM, units, 'section')}`;
}

export function terminationWords(termination: Termination | undefined): string {
  if (!termination) return 'none';
  switch (termination.kind) {
    case 'closed': return 'closed (rigid)';
    case 'open': return termination.flange === 'flanged' ? 'open, flanged' : 'open, unflanged';
    case 'lined': return `lined, absorption ${termination.absorption.toFixed(2)}`;
    case 'anechoic': return 'anechoic (no reflection)';
  }
}

/** Walls in words; absent is the default, sheet metal (or, for a segment, the run's walls). */
export function wallWords(wall: Wall | null | undefined, inherited: string): string {
  if (!wall) return inherited;
  if (wall.kind === 'measured') return `measured ${wall.attenuationDbPerM.map((value) => Number(value.toFixed(2))).join(' · ')} dB/m`;
  return wall.kind === 'rigid' ? 'rigid' : 'sheet metal';
}

export function liningWords(lining: Lining | null | undefined, units: UnitSystem): string {
  if (!lining) return 'none';
  return `${formatLength(lining.thicknessM, units, 'section')}, ${lining.absorption === undefined ? 'fibrous liner by band' : `absorption ${lining.absorption.toFixed(2)}`}`;
}

/** Octave-band levels 63 Hz to 8 kHz on one line: "63 Hz 85 · 125 Hz 83 · … dB". */
export function bandsWords(values: readonly number[] | null | undefined, unit: string): string {
  if (!values || values.length === 0) return 'none';
  const bands = ['63', '125', '250', '500', '1k', '2k', '4k', '8k'];
  return `${values.map((value, index) => `${bands[index] ?? '?'} ${Number(value.toFixed(1))}`).join(' · ')} ${unit}`;
}

/** Any other value, short: for fields the summary has no words of its own for. */
export function valueWords(value: unknown): string {
  if (value === undefined || value === null) return 'none';
  if (typeof value === 'string') return value === '' ? 'blank' : value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  const text = JSON.stringify(value);
  return text.length > 80 ? `${text.slice(0, 79)}…` : text;
}

export function same(a: unknown, b: unknown): boolean {
  return JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}

/** Differences in the fields a summary part does not describe itself, named by the field. */
export function otherFields<T extends object>(before: T, after: T, described: readonly string[]): { field: string; before: string; after: string }[] {
  const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].filter((key) => !described.includes(key));
  return keys
    .filter((key) => !same((before as Record<string, unknown>)[key], (after as Record<string, unknown>)[key]))
    .map((key) => ({ field: key, before: valueWords((before as Record<string, unknown>)[key]), after: valueWords((after as Record<string, unknown>)[key]) }));
}
