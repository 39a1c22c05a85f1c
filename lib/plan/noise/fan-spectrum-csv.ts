// A fan's octave-band sound power read from a CSV file as makers and spreadsheets give it: one band per
// row (band, level), one band per column (a row of bands over a row of levels), or one row of eight
// levels from 63 Hz to 8 kHz. Commas, semicolons or tabs separate cells; with semicolons or tabs a decimal
// comma is read as a point. Bands outside 63 Hz–8 kHz (31.5 Hz, 16 kHz) are left out and said so. Every
// refusal names the row and column, counted as a spreadsheet shows them (from 1, blank lines included).

const BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;
/** Other nominal octave centres a maker's table may carry; read and left out. */
const OUTSIDE_BANDS_HZ = [16, 31.5, 16000];
/** The plan document's bounds on a band level (soundPowerBandsSchema). */
const MIN_LEVEL_DB = -20;
const MAX_LEVEL_DB = 160;
const MAX_ROWS = 200;

export type FanSpectrumCsvResult =
  | { ok: true; bandsDb: number[]; understood: string }
  | { ok: false; errors: string[] };

interface Cell { text: string; row: number; column: number }

function bandWords(hz: number): string {
  return hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`;
}

/** Splits one line into cells, with double-quoted cells that may hold the separator ("" is a quote). */
function splitLine(line: string, separator: string): string[] {
  const cells: string[] = [];
  let current = '';
  let quoted = false;
  for (let index = 0; index < line.length; index++) {
    const char = line[index];
    if (quoted) {
      if (char === '"' && line[index + 1] === '"') { current += '"'; index++; }
      else if (char === '"') quoted = false;
      else current += char;
    } else if (char === '"' && current.trim() === '') { quoted = true; current = ''; }
    else if (char === separator) { cells.push(current.trim()); current = ''; }
    else current += char;
  }
  cells.push(current.trim());
  return cells;
}

/** "63", "63 Hz", "1k", "1 kHz", "1000Hz", "31.5" → Hz; null when the text is no frequency. */
function readFrequency(text: string): number | null {
  const match = /^(\d+(?:[.,]\d+)?)\s*(k)?\s*(hz)?$/i.exec(text.trim());
  if (!match) return null;
  const value = Number(match[1].replace(',', '.')) * (match[2] ? 1000 : 1);
  return Number.isFinite(value) ? value : null;
}

function readLevel(text: string, decimalComma: boolean): number | null {
  const cleaned = text.trim().replace(/\s*db$/i, '');
  if (!/^[-+]?\d+(?:[.,]\d+)?$/.test(cleaned) || (!decimalComma && cleaned.includes(','))) return null;
  return Number(cleaned.replace(',', '.'));
}

const where = (cell: Pick<Cell, 'row' | 'column'>) => `Row ${cell.row}, column ${cell.column}`;

export function parseFanSpectrumCsv(text: string): FanSpectrumCsvResult {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  if (lines.length > MAX_ROWS) return { ok: false, errors: [`The file has ${lines.length} rows; a fan's spectrum needs at most a few (one per band).`] };
  const separator = lines.some((line) => line.includes('\t')) ? '\t' : lines.some((line) => line.includes(';')) ? ';' : ',';
  const decimalComma = separator !== ',';
  const rows = lines
    .map((line, index) => splitLine(line, separator).map((cellText, column) => ({ text: cellText, row: index + 1, column: column + 1 })))
    .map((cells) => cells.filter((cell, index) => cell.text !== '' || cells.slice(index).some((later) => later.text !== '')))
    .filter((cells) => cells.some((cell) => cell.text !== ''));
  if (rows.length === 0) return { ok: false, errors: ['The file is empty: give the fan\'s sound power in eight octave bands, 63 Hz to 8 kHz.'] };

  const errors: string[] = [];
  const found = new Map<number, { levelDb: number; cell: Cell }>();
  const leftOut = new Set<number>();

  // levelPlace: where the band's level belongs, named when it is empty
  const takeBand = (bandCell: Cell, levelCell: Cell | undefined, levelPlace: Pick<Cell, 'row' | 'column'>): void => {
    if (bandCell.text === '') { errors.push(`${where(bandCell)}: is empty; give the band as 63, 125, … 8000 (or 1k, 2 kHz).`); return; }
    const hz = readFrequency(bandCell.text);
    if (hz === null) { errors.push(`${where(bandCell)}: "${bandCell.text}" is not a frequency; give the band as 63, 125, … 8000 (or 1k, 2 kHz).`); return; }
    if (OUTSIDE_BANDS_HZ.includes(hz)) { leftOut.add(hz); return; }
    if (!(BANDS_HZ as readonly number[]).includes(hz)) { errors.push(`${where(bandCell)}: ${hz} Hz is not an octave-band centre; use 63, 125, 250, 500, 1000, 2000, 4000 or 8000 Hz.`); return; }
    if (!levelCell || levelCell.text === '') { errors.push(`${where(levelPlace)}: is empty; give the ${bandWords(hz)} band's level in dB.`); return; }
    const levelDb = readLevel(levelCell.text, decimalComma);
    if (levelDb === null) { errors.push(`${where(levelCell)}: "${levelCell.text}" is not a number of decibels for the ${bandWords(hz)} band${!decimalComma && levelCell.text.includes(',') ? ' (with commas between cells, write decimals with a point)' : ''}.`); return; }
    if (levelDb < MIN_LEVEL_DB || levelDb > MAX_LEVEL_DB) { errors.push(`${where(levelCell)}: ${levelDb} dB for the ${bandWords(hz)} band is outside ${MIN_LEVEL_DB} to ${MAX_LEVEL_DB} dB.`); return; }
    const earlier = found.get(hz);
    if (earlier) { errors.push(`${where(bandCell)}: the ${bandWords(hz)} band is given again (first in row ${earlier.cell.row}).`); return; }
    found.set(hz, { levelDb, cell: levelCell });
  };

  const isLabel = (cell: Cell | undefined) => cell !== undefined && readFrequency(cell.text) === null && readLevel(cell.text, decimalComma) === null;
  const first = rows[0];
  const firstData = isLabel(first[0]) ? first.slice(1) : first;
  const allBands = firstData.length >= 2 && firstData.every((cell) => { const hz = readFrequency(cell.text); return hz !== null && ([...BANDS_HZ, ...OUTSIDE_BANDS_HZ] as number[]).includes(hz); });
  let layout: string;

  if (allBands) {
    // bands across the first row, levels across the next, column by column
    layout = 'one band per column';
    const levels = rows[1];
    if (!levels) return { ok: false, errors: [`Row ${first[0].row} names the bands, but no row of levels follows it.`] };
    if (rows.length > 2) errors.push(`Row ${rows[2][0].row}: only one row of levels is read under the bands; remove the others or import them one at a time.`);
    for (const bandCell of firstData) takeBand(bandCell, levels.find((cell) => cell.column === bandCell.column), { row: levels[0].row, column: bandCell.column });
  } else if (rows.length === 1) {
    // one row of eight levels, 63 Hz to 8 kHz
    layout = 'one row of levels, 63 Hz to 8 kHz';
    // eight cells are eight levels, even when the first is no number (it is named then, not skipped)
    const cells = first.length !== BANDS_HZ.length && isLabel(first[0]) ? first.slice(1) : first;
    if (cells.length !== BANDS_HZ.length) return { ok: false, errors: [`Row ${first[0].row} has ${cells.length} values; a row without band names needs exactly 8, 63 Hz to 8 kHz in order.`] };
    cells.forEach((cell, band) => takeBand({ ...cell, text: String(BANDS_HZ[band]) }, cell, cell));
  } else {
    // one band per row: band, level (a first row of words only is a header; a number in it makes it a row of data)
    layout = 'one band per row';
    const body = first.every(isLabel) ? rows.slice(1) : rows;
    for (const cells of body) takeBand(cells[0], cells[1], { row: cells[0].row, column: cells[0].column + 1 });
  }

  for (const hz of BANDS_HZ) if (!found.has(hz) && !errors.some((error) => error.includes(`the ${bandWords(hz)} band`))) errors.push(`The ${bandWords(hz)} band is missing.`);
  if (errors.length > 0) return { ok: false, errors };
  const bandsDb = BANDS_HZ.map((hz) => found.get(hz)!.levelDb);
  const outside = [...leftOut].sort((a, b) => a - b).map(bandWords);
  return { ok: true, bandsDb, understood: `Read ${layout}: ${bandsDb.join(', ')} dB${outside.length > 0 ? `; ${outside.join(' and ')} left out (outside 63 Hz–8 kHz)` : ''}.` };
}
