// One listener's noise path table as CSV, for the demo recital room (two outlets through the tee, two
// listeners), read back with papaparse and compared with the tables the noise sheet shows: every
// outlet's path rows, then the listener's rows, each band within 0.005 dB (written to 0.01 dB). The
// margin row is the criterion minus the level (its definition), checked again from the file's own cells.
import { describe, expect, it } from 'vitest';
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import { DEMO_METRES_PER_PIXEL } from '@/lib/plans/demo/recital-plan';
import { listenerPathCsv } from '@/lib/plans/exports';
import { noiseTables, ratingWords, rowWords } from '@/lib/plans/noise-path/path-tables';
import { roomNoise } from '@/lib/plans/noise-path/room-noise';
import { expectClose } from '../../acoustic/tolerance';
import { demoDocument, numberCell, readCsv } from './exports-fixture';

const bandColumns = OCTAVE_BANDS_HZ.map((hz) => `${hz} Hz (dB)`);

function demoTables() {
  const doc = demoDocument();
  return noiseTables(roomNoise(doc, DEMO_METRES_PER_PIXEL, doc.rooms[0]));
}

describe('listener path table CSV', () => {
  it('every outlet path and the listener\'s rows, with element, source on the plan, total and dB per band 63 Hz to 8 kHz', () => {
    const tables = demoTables();
    const listener = tables.listeners[1];
    const { header, rows } = readCsv(listenerPathCsv(tables, listener.listenerId, 'si'));
    expect(header).toEqual(['Table', 'Row (lengths in m and mm)', 'Element', 'Source on the plan', 'Total (yes or no)', ...bandColumns]);
    const expected = [
      ...tables.outlets.flatMap((outlet) => outlet.rows.map((row) => ({ table: `Path to ${outlet.label}`, row }))),
      ...listener.rows.map((row) => ({ table: `At listener ${listener.name}`, row })),
    ];
    expect(rows).toHaveLength(expected.length + 1);
    const ratings = rows.at(-1)!;
    expect([ratings.Element, ratings['Row (lengths in m and mm)']]).toEqual(['Ratings', ratingWords(listener)]);
    expect(bandColumns.map((column) => ratings[column])).toEqual(bandColumns.map(() => ''));
    expected.forEach(({ table, row }, index) => {
      const cells = rows[index];
      expect(cells.Table).toBe(table);
      expect(cells['Row (lengths in m and mm)']).toBe(row.label);
      expect(cells.Element).toBe(row.element);
      expect(cells['Source on the plan']).toBe(row.source);
      expect(cells['Total (yes or no)']).toBe(row.total ? 'yes' : 'no');
      bandColumns.forEach((column, band) => expectClose(numberCell(cells[column]), row.valuesDb[band], 0.005, `${table}, ${row.label}, ${column}`));
    });
    // the duct rows name their segment on the plan; the listener's last rows are the criterion and the margin
    expect(rows.filter((cells) => cells.Element === 'Duct').map((cells) => cells['Source on the plan'])).toEqual(['A1', 'A2', 'A3', 'A1', 'A2', 'A4', 'A5']);
    const [criterion, margin] = rows.slice(-3, -1);
    expect([criterion.Element, margin.Element]).toEqual(['Criterion', 'Margin']);
    const level = rows.at(-4)!;
    expect(level.Element).toBe('Level');
    bandColumns.forEach((column) => expectClose(numberCell(margin[column]), numberCell(criterion[column]) - numberCell(level[column]), 0.011, `margin ${column}`));
  });

  it('an element loss is a negative number written as a number, not turned into text', () => {
    const tables = demoTables();
    const text = listenerPathCsv(tables, tables.listeners[0].listenerId, 'si');
    const duct = readCsv(text).rows.find((cells) => cells.Element === 'Duct')!;
    expect(numberCell(duct['8000 Hz (dB)'])).toBeLessThan(0);
    expect(text).not.toContain(`'-`);
  });

  it('in imperial units the rows give lengths in feet and inches, and the header says so', () => {
    const tables = demoTables();
    const { header, rows } = readCsv(listenerPathCsv(tables, tables.listeners[0].listenerId, 'imperial'));
    expect(header[1]).toBe('Row (lengths in ft and in)');
    const duct = tables.outlets[0].rows.find((row) => row.element === 'Duct')!;
    expect(rows.map((cells) => cells['Row (lengths in ft and in)'])).toContain(rowWords(duct, 'imperial'));
    expect(rowWords(duct, 'imperial')).toMatch(/ft/);
  });

  it('a listener the room does not have is refused, naming it', () => {
    expect(() => listenerPathCsv(demoTables(), 'nobody', 'si')).toThrow('listenerId: the room\'s noise has no listener nobody');
  });
});
