// The one CSV writer, checked against RFC 4180 (Common Format and MIME Type for CSV Files, section 2):
// rule 2, records end in CRLF; rule 3, a header line with the same number of fields; rule 6, a field
// with a line break, a double quote or a comma is enclosed in double quotes; rule 7, a double quote in
// it is escaped by another. Parsed back with papaparse, a parser the project did not write. The formula
// rule (a leading apostrophe before = + - @, tab, carriage return) is common practice, no source
// beyond the spreadsheet makers' own advice.
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvFileName, csvNumber, csvText } from '@/lib/csv';

describe('csvText', () => {
  it('RFC 4180 rules 2, 6 and 7: CRLF between records; commas, quotes and line breaks inside quotes, a quote doubled', () => {
    const text = csvText(['Name', 'Value (m)'], [['Duct, "north"\nriser', 1.5], ['plain', 2]]);
    expect(text).toBe('Name,Value (m)\r\n"Duct, ""north""\nriser",1.5\r\nplain,2');
    expect(Papa.parse<string[]>(text).data).toEqual([['Name', 'Value (m)'], ['Duct, "north"\nriser', '1.5'], ['plain', '2']]);
  });

  it('RFC 4180 rule 3: every record has the header\'s number of fields, or the writer refuses, naming the row', () => {
    expect(() => csvText(['a', 'b'], [[1, 2], [3]])).toThrow('CSV row 3: 1 cells for 2 columns');
  });

  it('a text cell a spreadsheet would run as a formula stays text; a negative number stays a number', () => {
    const text = csvText(['Run', 'Loss (dB)'], [['=HYPERLINK("http://x")', -3.25], ['-2', -0], ['@SUM(A1)', null], ['+1', 0]]);
    const rows = Papa.parse<string[]>(text).data.slice(1);
    expect(rows).toEqual([[`'=HYPERLINK("http://x")`, '-3.25'], [`'-2`, '0'], [`'@SUM(A1)`, ''], [`'+1`, '0']]);
  });

  it('numbers with a dot for the decimal, no thousands separator and no exponent', () => {
    expect(csvText(['x'], [[csvNumber(12345.678, 2)], [csvNumber(0.00000012, 6)], [csvNumber(1234567.5, 1)]])).toBe('x\r\n12345.68\r\n0\r\n1234567.5');
    expect(() => csvNumber(Number.NaN, 2)).toThrow(/not a finite number/);
    expect(() => csvText(['x'], [[Number.POSITIVE_INFINITY]])).toThrow(/not a finite number/);
  });
});

describe('csvFileName', () => {
  it('says plan, run and kind in a name safe on every file system', () => {
    expect(csvFileName(['Level 1 – recital room supply', 'Rooftop air handler to recital room'], 'resonances'))
      .toBe('level-1-recital-room-supply_rooftop-air-handler-to-recital-room_resonances.csv');
    expect(csvFileName(['../../etc/passwd', 'Café Ø'], 'noise-path')).toBe('etc-passwd_cafe_noise-path.csv');
  });
});
