// The one way the product writes CSV (RFC 4180): a header row, then rows; CRLF line ends; a cell with
// a comma, a double quote, a line break or an edge space is wrapped in double quotes, a quote inside
// doubled. A text cell a spreadsheet would read as a formula (starting with = + - @, a tab or a
// carriage return) gets a leading apostrophe so it stays text. Numbers are written as numbers: a dot
// for the decimal, no thousands separators, never an exponent.
import Papa from 'papaparse';

/** null or undefined: an empty cell. */
export type CsvCell = string | number | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

/** Text a spreadsheet would take for a formula, made plain text by a leading apostrophe. */
export function neutraliseCell(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

/** Largest number of decimals a CSV number carries: beyond it toString could write an exponent (1e-7). */
const MAX_DECIMALS = 6;

/** value rounded to `decimals` places as a number whose text has no exponent; refuses NaN and the infinities. */
export function csvNumber(value: number, decimals: number): number {
  if (!Number.isFinite(value)) throw new RangeError(`csvNumber: ${value} is not a finite number`);
  if (decimals < 0 || decimals > MAX_DECIMALS || !Number.isInteger(decimals)) throw new RangeError(`csvNumber: decimals must be a whole number from 0 to ${MAX_DECIMALS}`);
  const rounded = Number(value.toFixed(decimals));
  // 1e21 and above would print with an exponent; no quantity here comes near it
  if (Math.abs(rounded) >= 1e21) throw new RangeError(`csvNumber: ${value} is too large to write without an exponent`);
  return rounded === 0 ? 0 : rounded;
}

function cellValue(cell: CsvCell): string | number {
  if (cell === null || cell === undefined) return '';
  if (typeof cell === 'number') {
    if (!Number.isFinite(cell)) throw new RangeError(`CSV cell: ${cell} is not a finite number`);
    return cell;
  }
  return neutraliseCell(cell);
}

/** The CSV text of a header and rows; every row must have the header's number of cells. */
export function csvText(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  rows.forEach((row, index) => {
    if (row.length !== header.length) throw new RangeError(`CSV row ${index + 2}: ${row.length} cells for ${header.length} columns`);
  });
  const text = Papa.unparse({ fields: header.map(neutraliseCell), data: rows.map((row) => row.map(cellValue)) }, { newline: '\r\n' });
  // with no rows papaparse ends the header with a line break; without one, every file ends alike
  return rows.length === 0 ? text.replace(/\r\n$/, '') : text;
}
