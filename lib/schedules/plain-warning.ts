// A room's noise warnings in the schedule's words: a path element the engine names by its place in
// the path ("Outlet A3 end: elements[2]: …") is named by its row of that outlet's table instead
// ("Outlet A3 end: Duct: A2, 8.00 m, lined 50 mm: …").
import type { NoiseTables } from '@/lib/plans/noise-path/path-tables';

export function plainWarning(warning: string, tables: Pick<NoiseTables, 'outlets'>): string {
  const outlet = tables.outlets.find((candidate) => warning.startsWith(`${candidate.label}: `));
  const steps = outlet?.rows.filter((row) => row.role === 'step') ?? [];
  return warning.replace(/elements\[(\d+)\]/g, (whole, index: string) => {
    const row = steps[Number(index)];
    return row ? row.label.replace(/ \(loss\)$/, '') : 'an element of the path';
  });
}
