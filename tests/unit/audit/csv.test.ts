import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { auditCsv } from '@/lib/audit/csv';
import { neutraliseCell } from '@/lib/csv';

describe('audit CSV', () => {
  it('prefixes an apostrophe to every cell a spreadsheet would read as a formula', () => {
    for (const cell of ['=SUM(A1)', '+1', '-2', '@cmd', '\tx', '\rx']) expect(neutraliseCell(cell)).toBe(`'${cell}`);
  });

  it('leaves ordinary text alone', () => {
    expect(neutraliseCell('Imogen Vale')).toBe('Imogen Vale');
    expect(neutraliseCell('2 → 6 paid seats')).toBe('2 → 6 paid seats');
  });

  it('writes a header and one row per line, quoting commas and neutralising formulas', () => {
    const csv = auditCsv([{ id: '1', at: '2026-12-02T10:00:00.000Z', actorName: '=HYPERLINK("x")', action: 'member.removed', actionLabel: 'Member removed', subject: 'a@example.test, Viewer' }]);
    const parsed = Papa.parse<string[]>(csv.trim()).data;
    expect(parsed).toEqual([
      ['When (UTC)', 'Who', 'What', 'Subject'],
      ['2026-12-02T10:00:00.000Z', `'=HYPERLINK("x")`, 'Member removed', 'a@example.test, Viewer'],
    ]);
  });
});
