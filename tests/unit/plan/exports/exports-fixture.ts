// The demo recital plan's results as the editor holds them (rounded as the results route answers), and
// a CSV parser the project did not write (papaparse) to read the exported files back.
import Papa from 'papaparse';
import { expect } from 'vitest';
import { roundedRunResult } from '@/lib/analysis/round-answer';
import { planLabels } from '@/lib/plan/labels';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { analysePlanRun } from '@/lib/plans/results';

export const demoDocument = () => demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });

export function demoRunResult() {
  const doc = demoDocument();
  return { doc, labels: planLabels(doc), result: roundedRunResult(analysePlanRun(doc, doc.runs[0].id, DEMO_METRES_PER_PIXEL)) };
}

/** Parses CSV text (RFC 4180, CRLF records) into its header and rows of cells, by column name. */
export function readCsv(text: string): { header: string[]; rows: Record<string, string>[] } {
  expect(text.split('\r\n').length, 'records end in CRLF').toBeGreaterThan(1);
  const parsed = Papa.parse<string[]>(text, { header: false });
  expect(parsed.errors).toEqual([]);
  const [header, ...lines] = parsed.data;
  return { header, rows: lines.map((cells) => Object.fromEntries(header.map((name, index) => [name, cells[index]]))) };
}

/** A cell read back as a number: the text must be a plain decimal (dot, no separators, no exponent). */
export function numberCell(text: string | undefined): number {
  expect(text, 'a number cell').toMatch(/^-?\d+(\.\d+)?$/);
  return Number(text);
}
