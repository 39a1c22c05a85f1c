// A run's segment schedule (its main path, start to end) as CSV, and back.
// Written by csvText (lib/csv): text cells a spreadsheet would read as a formula get a leading single quote; numbers stay numbers.
// Rows are numbered as a spreadsheet shows them: the header is row 1.
import Papa from 'papaparse';
import { nodePositions, type Lining, type PlanDocument, type Section } from './document';
import { PlanError } from './errors';
import { segmentLengthM } from './geometry/length';
import { buildRunTree, mainPathOf, type ChildLink } from './run-tree';
import { MAX_SEGMENT_LENGTH_M, MIN_SECTION_M } from './schema';
import { MAX_LINING_THICKNESS_M, MAX_RUN_SEGMENTS, MAX_SECTION_DIMENSION_M } from '@/lib/acoustic';
import { planLabels } from './labels/names';
import { csvText } from '@/lib/csv/csv-text';

export const SCHEDULE_COLUMNS = ['order', 'from_m', 'length_m', 'shape', 'diameter_mm', 'width_mm', 'height_mm', 'lining_thickness_mm', 'lining_absorption', 'segment_id', 'segment'] as const;
export type ScheduleColumn = (typeof SCHEDULE_COLUMNS)[number];
const REQUIRED_COLUMNS: readonly ScheduleColumn[] = ['order', 'length_m', 'shape', 'diameter_mm', 'width_mm', 'height_mm', 'lining_thickness_mm', 'lining_absorption'];

export interface ScheduleRow {
  readonly order: number;
  /** null: use the drawn length. */
  readonly lengthM: number | null;
  readonly section: Section;
  readonly lining: Lining | null;
  readonly segmentId: string | null;
}

export interface ScheduleError {
  readonly row: number;
  readonly column: string;
  readonly message: string;
}

/** Lengths in metres to 0.1 mm, sizes in millimetres to 0.01 mm. */
const roundTo = (value: number, decimals: number) => Number(value.toFixed(decimals));

export function scheduleToCsv(doc: PlanDocument, runId: string, metresPerPixel: number): string {
  const tree = buildRunTree(doc, runId, metresPerPixel, ['missing-termination']);
  const { pieces, links } = mainPathOf(tree);
  const labels = planLabels(doc);
  const data = links.map((link, index) => {
    const { section, lining } = link.segment;
    return [
      index + 1,
      roundTo(pieces[index].startM, 4),
      roundTo(link.lengthM, 4),
      section.shape,
      section.shape === 'round' ? roundTo(section.diameterM * 1000, 2) : '',
      section.shape === 'rect' ? roundTo(section.widthM * 1000, 2) : '',
      section.shape === 'rect' ? roundTo(section.heightM * 1000, 2) : '',
      lining ? roundTo(lining.thicknessM * 1000, 2) : '',
      lining ? lining.absorption : '',
      link.segment.id,
      labels.segments[link.segment.id] ?? '',
    ];
  });
  return csvText(SCHEDULE_COLUMNS, data);
}

type Cells = Partial<Record<ScheduleColumn, string>>;

/** A cell as text, without a leading quote added against formulas. */
const cellText = (value: string | undefined) => (value ?? '').trim().replace(/^'/, '');

function readNumber(cells: Cells, column: ScheduleColumn, row: number, errors: ScheduleError[], options: { required: boolean; min?: number; max?: number; minText?: string; maxText?: string; allowZero?: boolean }): number | null {
  const text = cellText(cells[column]);
  if (text === '') {
    if (options.required) errors.push({ row, column, message: `Row ${row}, ${column}: is empty; a number is needed.` });
    return null;
  }
  const value = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(text) ? Number(text) : Number.NaN;
  if (!Number.isFinite(value)) {
    errors.push({ row, column, message: `Row ${row}, ${column}: "${text}" is not a number.` });
    return null;
  }
  if (options.max !== undefined && value > options.max && options.maxText) {
    errors.push({ row, column, message: `Row ${row}, ${column}: ${text} ${options.maxText}.` });
    return null;
  }
  if ((options.min !== undefined && value < options.min) || (options.max !== undefined && value > options.max) || (value === 0 && !options.allowZero)) {
    errors.push({ row, column, message: `Row ${row}, ${column}: ${text} ${options.minText ?? 'is out of range'}.` });
    return null;
  }
  return value;
}

function readRow(cells: Cells, row: number, errors: ScheduleError[]): ScheduleRow | null {
  const before = errors.length;
  const order = readNumber(cells, 'order', row, errors, { required: true, min: 1, minText: 'must be a whole number from 1' });
  if (order !== null && !Number.isInteger(order)) errors.push({ row, column: 'order', message: `Row ${row}, order: ${order} must be a whole number.` });
  const lengthM = readNumber(cells, 'length_m', row, errors, { required: false, min: 0, max: MAX_SEGMENT_LENGTH_M, minText: 'must be more than 0 m', maxText: `must be at most ${MAX_SEGMENT_LENGTH_M} m` });
  const shape = cellText(cells.shape).toLowerCase();
  const sizeOptions = { min: MIN_SECTION_M * 1000, max: MAX_SECTION_DIMENSION_M * 1000, minText: `must be between ${MIN_SECTION_M * 1000} mm and ${MAX_SECTION_DIMENSION_M * 1000} mm` };
  let section: Section | null = null;
  if (shape === 'round') {
    const diameterMm = readNumber(cells, 'diameter_mm', row, errors, { required: true, ...sizeOptions });
    if (diameterMm !== null) section = { shape: 'round', diameterM: diameterMm / 1000 };
  } else if (shape === 'rect') {
    const widthMm = readNumber(cells, 'width_mm', row, errors, { required: true, ...sizeOptions });
    const heightMm = readNumber(cells, 'height_mm', row, errors, { required: true, ...sizeOptions });
    if (widthMm !== null && heightMm !== null) section = { shape: 'rect', widthM: widthMm / 1000, heightM: heightMm / 1000 };
  } else {
    errors.push({ row, column: 'shape', message: `Row ${row}, shape: "${cellText(cells.shape)}" must be round or rect.` });
  }
  const thicknessMm = readNumber(cells, 'lining_thickness_mm', row, errors, { required: false, min: 0, max: MAX_LINING_THICKNESS_M * 1000, minText: `must be between 0 and ${MAX_LINING_THICKNESS_M * 1000} mm` });
  const absorptionText = cellText(cells.lining_absorption);
  const absorption = readNumber(cells, 'lining_absorption', row, errors, { required: false, min: 0, max: 1, minText: 'must be between 0 and 1', allowZero: true });
  const thicknessGiven = cellText(cells.lining_thickness_mm) !== '';
  if (thicknessGiven !== (absorptionText !== '')) {
    const column = thicknessGiven ? 'lining_absorption' : 'lining_thickness_mm';
    errors.push({ row, column, message: `Row ${row}, ${column}: a lining needs both its thickness and its absorption.` });
  }
  if (errors.length > before || order === null || section === null) return null;
  const lining = thicknessMm !== null && absorption !== null ? { thicknessM: thicknessMm / 1000, absorption } : null;
  const segmentId = cellText(cells.segment_id);
  return { order, lengthM, section, lining, segmentId: segmentId === '' ? null : segmentId };
}

const isBlank = (line: readonly string[]) => line.every((cell) => cell.trim() === '');

/** A schedule of MAX_RUN_SEGMENTS rows is about 200 kB; a file over this many characters is refused unread. */
export const MAX_SCHEDULE_CSV_CHARS = 1_000_000;

export function parseScheduleCsv(text: string): { ok: true; rows: ScheduleRow[] } | { ok: false; errors: ScheduleError[] } {
  if (text.length > MAX_SCHEDULE_CSV_CHARS) {
    return { ok: false, errors: [{ row: 0, column: '', message: `The file is over ${MAX_SCHEDULE_CSV_CHARS} characters; a run's schedule (at most ${MAX_RUN_SEGMENTS} segments) is far smaller.` }] };
  }
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { header: false });
  const errors: ScheduleError[] = parsed.errors.map((error) => ({ row: (error.row ?? 0) + 1, column: '', message: `Row ${(error.row ?? 0) + 1}: ${error.message}.` }));
  const [header = [], ...lines] = parsed.data;
  const columns = header.map((name) => name.trim().toLowerCase());
  const missing = REQUIRED_COLUMNS.filter((column) => !columns.includes(column));
  if (missing.length > 0) return { ok: false, errors: missing.map((column) => ({ row: 1, column, message: `Row 1: the column ${column} is missing.` })) };
  const filled = lines.filter((line) => !isBlank(line)).length;
  if (filled > MAX_RUN_SEGMENTS) {
    return { ok: false, errors: [{ row: 0, column: '', message: `The file has ${filled} segment rows; a run holds at most ${MAX_RUN_SEGMENTS} segments.` }] };
  }
  const rows: ScheduleRow[] = [];
  lines.forEach((line, index) => {
    if (isBlank(line)) return;
    const cells: Cells = {};
    columns.forEach((column, position) => {
      if ((SCHEDULE_COLUMNS as readonly string[]).includes(column)) cells[column as ScheduleColumn] = line[position];
    });
    const row = readRow(cells, index + 2, errors);
    if (row) rows.push(row);
  });
  const seen = new Set<number>();
  rows.forEach((row) => {
    if (seen.has(row.order)) errors.push({ row: 0, column: 'order', message: `Order ${row.order} appears more than once.` });
    seen.add(row.order);
  });
  if (rows.length === 0 && errors.length === 0) errors.push({ row: 2, column: '', message: 'The file has no segment rows.' });
  return errors.length > 0 ? { ok: false, errors } : { ok: true, rows: [...rows].sort((a, b) => a.order - b.order) };
}

/** A length within this of the drawn one is taken as the drawn length (no override). */
const SAME_LENGTH_M = 0.0005;

/** Updates the run's main-path segments in order: section, lining and length override. Changes nothing on a mismatch. */
export function applySchedule(doc: PlanDocument, runId: string, rows: readonly ScheduleRow[], metresPerPixel: number): { ok: true; doc: PlanDocument } | { ok: false; message: string } {
  let links: ChildLink[];
  try {
    links = mainPathOf(buildRunTree(doc, runId, metresPerPixel, ['missing-termination'])).links;
  } catch (error) {
    if (error instanceof PlanError) return { ok: false, message: error.message };
    throw error;
  }
  if (rows.length !== links.length) return { ok: false, message: `The file has ${rows.length} segment rows but the run's path has ${links.length} segments; nothing was changed.` };
  const rowBySegment = new Map(links.map((link, index) => [link.segment.id, rows[index]]));
  const positions = nodePositions(doc);
  const segments = doc.segments.map((segment) => {
    const row = rowBySegment.get(segment.id);
    const from = positions.get(segment.from);
    const to = positions.get(segment.to);
    if (!row || !from || !to) return segment;
    const drawnM = segmentLengthM(from, to, metresPerPixel);
    const lengthOverrideM = row.lengthM === null || Math.abs(row.lengthM - drawnM) <= SAME_LENGTH_M ? null : row.lengthM;
    return { ...segment, section: { ...row.section }, lining: row.lining && { ...row.lining }, lengthOverrideM };
  });
  return { ok: true, doc: { ...doc, segments } };
}
