// Reading a fan's octave-band sound power from CSV: the layouts makers and spreadsheets use, and a
// clear refusal naming the row and column of every bad cell.
import { describe, expect, it } from 'vitest';
import { parseFanSpectrumCsv } from '@/lib/plan';

const LEVELS = [84, 82, 79, 75, 71, 67, 62, 56];

describe('fan spectrum from CSV', () => {
  it('one band per row with a header, as a spreadsheet exports it', () => {
    const csv = 'Band (Hz),Lw (dB)\n63,84\n125,82\n250,79\n500,75\n1000,71\n2000,67\n4000,62\n8000,56\n';
    expect(parseFanSpectrumCsv(csv)).toMatchObject({ ok: true, bandsDb: LEVELS });
  });

  it('one band per column (bands over levels, labels in the first column), with 31.5 Hz left out and said so', () => {
    const csv = 'Hz;31.5;63;125;250;500;1k;2k;4k;8k\r\nLw dB;88;84;82;79;75;71;67;62;56\r\n';
    const result = parseFanSpectrumCsv(csv);
    expect(result).toMatchObject({ ok: true, bandsDb: LEVELS });
    expect(result.ok && result.understood).toMatch(/31\.5 Hz left out/);
  });

  it('one row of eight levels; tabs with decimal commas; rows in any order; "1 kHz" and "dB" units', () => {
    expect(parseFanSpectrumCsv('84,82,79,75,71,67,62,56')).toMatchObject({ ok: true, bandsDb: LEVELS });
    expect(parseFanSpectrumCsv('63\t84,5\n125\t82\n250\t79\n500\t75\n1 kHz\t71\n2 kHz\t67\n4 kHz\t62\n8 kHz\t56,2')).toMatchObject({ ok: true, bandsDb: [84.5, 82, 79, 75, 71, 67, 62, 56.2] });
    expect(parseFanSpectrumCsv('8000,56 dB\n63,84 dB\n125,82\n250,79\n500,75\n1000,71\n2000,67\n4000,62')).toMatchObject({ ok: true, bandsDb: LEVELS });
  });

  it('names the row and column of a level that is not a number, and of a band that is not an octave centre', () => {
    const result = parseFanSpectrumCsv('Band,Lw\n63,84\n125,8x\n250,79\n500,75\n1000,71\n2000,67\n4000,62\n100,56');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toContain('Row 3, column 2: "8x" is not a number of decibels for the 125 Hz band.');
    expect(result.errors).toContain('Row 9, column 1: 100 Hz is not an octave-band centre; use 63, 125, 250, 500, 1000, 2000, 4000 or 8000 Hz.');
    expect(result.errors).toContain('The 8 kHz band is missing.');
    expect(result.errors).not.toContain('The 125 Hz band is missing.');
  });

  it('refuses a band given twice, a level out of range, a missing level, a short row, and an empty file, each in words', () => {
    const twice = parseFanSpectrumCsv('63,84\n63,85\n125,82\n250,79\n500,75\n1000,71\n2000,67\n4000,62\n8000,56');
    expect(twice.ok === false && twice.errors).toEqual(['Row 2, column 1: the 63 Hz band is given again (first in row 1).']);
    const loud = parseFanSpectrumCsv('63,184\n125,82\n250,79\n500,75\n1000,71\n2000,67\n4000,62\n8000,56');
    expect(loud.ok === false && loud.errors).toEqual(['Row 1, column 2: 184 dB for the 63 Hz band is outside -20 to 160 dB.']);
    const gap = parseFanSpectrumCsv('63,84\n125\n250,79\n500,75\n1000,71\n2000,67\n4000,62\n8000,56');
    expect(gap.ok === false && gap.errors).toEqual(['Row 2, column 2: is empty; give the 125 Hz band\'s level in dB.']);
    const short = parseFanSpectrumCsv('84,82,79,75,71,67,62');
    expect(short.ok === false && short.errors).toEqual(['Row 1 has 7 values; a row without band names needs exactly 8, 63 Hz to 8 kHz in order.']);
    expect(parseFanSpectrumCsv('\n\n')).toEqual({ ok: false, errors: ['The file is empty: give the fan\'s sound power in eight octave bands, 63 Hz to 8 kHz.'] });
  });

  it('with commas between cells, a decimal comma is refused with the reason', () => {
    const result = parseFanSpectrumCsv('63,"84,5"\n125,82\n250,79\n500,75\n1000,71\n2000,67\n4000,62\n8000,56');
    expect(result.ok === false && result.errors[0]).toBe('Row 1, column 2: "84,5" is not a number of decibels for the 63 Hz band (with commas between cells, write decimals with a point).');
  });

  it('a bad first cell is named, not taken for a header or a row label', () => {
    const badBand = parseFanSpectrumCsv('6x,84\n125,82\n250,79\n500,75\n1000,71\n2000,67\n4000,62\n8000,56');
    expect(badBand.ok === false && badBand.errors).toEqual(['Row 1, column 1: "6x" is not a frequency; give the band as 63, 125, … 8000 (or 1k, 2 kHz).', 'The 63 Hz band is missing.']);
    const badLevel = parseFanSpectrumCsv('8x,82,79,75,71,67,62,56');
    expect(badLevel.ok === false && badLevel.errors).toEqual(['Row 1, column 1: "8x" is not a number of decibels for the 63 Hz band.']);
  });

  it('names every bad cell of a file at once, by row and column, empty ones included', () => {
    const result = parseFanSpectrumCsv('Hz,31.5,63,125,250,500,1k,2k,4k,8k\nLw,88,84,,79,7o,71,67,62,56\n');
    expect(result.ok === false && result.errors).toEqual([
      'Row 2, column 4: is empty; give the 125 Hz band\'s level in dB.',
      'Row 2, column 6: "7o" is not a number of decibels for the 500 Hz band.',
    ]);
    const rows = parseFanSpectrumCsv('Band,Lw\n63,84\n,82\n250,abc\n500,75\n1000,71\n2000,67\n4000,62\n8000,56');
    expect(rows.ok === false && rows.errors).toEqual([
      'Row 3, column 1: is empty; give the band as 63, 125, … 8000 (or 1k, 2 kHz).',
      'Row 4, column 2: "abc" is not a number of decibels for the 250 Hz band.',
      'The 125 Hz band is missing.',
    ]);
  });
});
