import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { MAX_RUN_SEGMENTS } from '@/lib/acoustic';
import { applySchedule, MAX_SCHEDULE_CSV_CHARS, parseScheduleCsv, performCommand, scheduleToCsv, SCHEDULE_COLUMNS, type PlanDocument } from '@/lib/plan';
import { drawChain } from './fixtures';

const METRES_PER_PIXEL = 0.01;

function linedChain() {
  const chain = drawChain([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 250 }]);
  const [first, second] = chain.doc.segments.map((segment) => segment.id);
  let result = performCommand('set-section', chain.doc, chain.state, { segmentIds: [second], section: { shape: 'rect', widthM: 0.5, heightM: 0.3 } });
  result = performCommand('set-lining', result.doc, result.state, { segmentIds: [first], lining: { thicknessM: 0.025, absorption: 0.65 } });
  return { doc: result.doc, runId: result.doc.runs[0].id };
}

const HEADER = SCHEDULE_COLUMNS.join(',');

describe('schedule CSV export', () => {
  it('lists the main path in order with distances from the start, numbers as numbers', () => {
    const { doc, runId } = linedChain();
    const csv = scheduleToCsv(doc, runId, METRES_PER_PIXEL);
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe(HEADER);
    expect(lines[1]).toBe(`1,0,1,round,250,,,25,0.65,${doc.segments[0].id},A1`);
    expect(lines[2]).toBe(`2,1,2.5,rect,,500,300,,,${doc.segments[1].id},A2`);
  });

  it('neutralises text cells a spreadsheet would read as a formula', () => {
    const { doc, runId } = linedChain();
    const hostile: PlanDocument = { ...doc, segments: doc.segments.map((segment, index) => (index === 0 ? { ...segment, id: '=HYPERLINK("x")' } : segment)), runs: doc.runs };
    const csv = scheduleToCsv(hostile, runId, METRES_PER_PIXEL);
    const cells = Papa.parse<string[]>(csv).data[1];
    expect(cells[9]).toBe(`'=HYPERLINK("x")`);
    expect(cells[1]).toBe('0');
  });
});

describe('schedule CSV import', () => {
  it('round-trips: export, parse and apply leave the document as it was', () => {
    const { doc, runId } = linedChain();
    const parsed = parseScheduleCsv(scheduleToCsv(doc, runId, METRES_PER_PIXEL));
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const applied = applySchedule(doc, runId, parsed.rows, METRES_PER_PIXEL);
    expect(applied.ok && applied.doc.segments).toEqual(doc.segments.map((segment) => ({ ...segment, lining: segment.lining ?? null, lengthOverrideM: null })));
  });

  it('applies new sections, linings and lengths in path order', () => {
    const { doc, runId } = linedChain();
    const csv = [HEADER, '1,,1,rect,,400,200,,,', '2,,7.5,round,315,,,50,0.9,'].join('\n');
    const parsed = parseScheduleCsv(csv);
    if (!parsed.ok) throw new Error(parsed.errors.map((error) => error.message).join('; '));
    const applied = applySchedule(doc, runId, parsed.rows, METRES_PER_PIXEL);
    if (!applied.ok) throw new Error(applied.message);
    expect(applied.doc.segments.map(({ section, lining, lengthOverrideM }) => ({ section, lining, lengthOverrideM }))).toEqual([
      { section: { shape: 'rect', widthM: 0.4, heightM: 0.2 }, lining: null, lengthOverrideM: null },
      { section: { shape: 'round', diameterM: 0.315 }, lining: { thicknessM: 0.05, absorption: 0.9 }, lengthOverrideM: 7.5 },
    ]);
  });

  it('reports each bad row by its spreadsheet row number and column', () => {
    const csv = [HEADER, '1,,1,round,12x,,,,,', '', '2,,-2,oval,,,,,,', '3,,1,rect,,400,,25,,'].join('\n');
    const parsed = parseScheduleCsv(csv);
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.errors.map((error) => error.message)).toEqual([
      'Row 2, diameter_mm: "12x" is not a number.',
      'Row 4, length_m: -2 must be more than 0 m.',
      'Row 4, shape: "oval" must be round or rect.',
      'Row 5, height_mm: is empty; a number is needed.',
      'Row 5, lining_absorption: a lining needs both its thickness and its absorption.',
    ]);
  });

  it('refuses a missing column, a section under 10 mm and an absorption above 1', () => {
    const noShape = parseScheduleCsv('order,length_m\n1,2');
    expect(noShape.ok ? [] : noShape.errors.map((error) => error.column)).toEqual(['shape', 'diameter_mm', 'width_mm', 'height_mm', 'lining_thickness_mm', 'lining_absorption']);
    const small = parseScheduleCsv([HEADER, '1,,1,round,5,,,20,1.5,'].join('\n'));
    expect(small.ok ? [] : small.errors.map((error) => error.message)).toEqual([
      'Row 2, diameter_mm: 5 must be between 10 mm and 10000 mm.',
      'Row 2, lining_absorption: 1.5 must be between 0 and 1.',
    ]);
  });

  it('refuses a length over one segment’s limit, more rows than a run holds, and an oversized file (limits: product rules, no source)', () => {
    const long = parseScheduleCsv([HEADER, '1,,500,round,250,,,,,', '2,,600,round,250,,,,,', '3,,1,round,250,,,1001,0.5,'].join('\n'));
    expect(long.ok ? [] : long.errors.map((error) => error.message)).toEqual([
      'Row 3, length_m: 600 must be at most 500 m.',
      'Row 4, lining_thickness_mm: 1001 must be between 0 and 1000 mm.',
    ]);
    const rows = Array.from({ length: MAX_RUN_SEGMENTS + 1 }, (_, index) => `${index + 1},,1,round,250,,,,,`);
    const many = parseScheduleCsv([HEADER, ...rows].join('\n'));
    expect(many.ok ? [] : many.errors.map((error) => error.message)).toEqual([`The file has ${MAX_RUN_SEGMENTS + 1} segment rows; a run holds at most ${MAX_RUN_SEGMENTS} segments.`]);
    const huge = parseScheduleCsv(HEADER + '\n' + ' '.repeat(MAX_SCHEDULE_CSV_CHARS));
    expect(huge.ok ? [] : huge.errors.map((error) => error.message)).toEqual([`The file is over ${MAX_SCHEDULE_CSV_CHARS} characters; a run's schedule (at most ${MAX_RUN_SEGMENTS} segments) is far smaller.`]);
  });

  it('a row count that differs from the path changes nothing and says why', () => {
    const { doc, runId } = linedChain();
    const parsed = parseScheduleCsv([HEADER, '1,,1,round,250,,,,,'].join('\n'));
    if (!parsed.ok) throw new Error('expected a valid file');
    expect(applySchedule(doc, runId, parsed.rows, METRES_PER_PIXEL)).toEqual({ ok: false, message: "The file has 1 segment rows but the run's path has 2 segments; nothing was changed." });
  });
});
