// The resonances CSV of the demo run, read back with papaparse and compared with the results the panel
// shows: every number within half of the step it is written to (the file is the data, not a new
// calculation); end corrections converted to feet at 1 ft = 0.3048 m exactly (International Yard and
// Pound Agreement, 1959) for a reader who chose imperial units.
import { describe, expect, it } from 'vitest';
import { resonancesCsv } from '@/lib/plans/exports';
import { expectClose } from '../../acoustic/tolerance';
import { demoRunResult, numberCell, readCsv } from './exports-fixture';

describe('resonances CSV', () => {
  it('headers carry the units; a row per resonance with the values the panel holds', () => {
    const { result } = demoRunResult();
    const analysis = result.analysis!;
    const { header, rows } = readCsv(resonancesCsv(result, 'si'));
    expect(header).toEqual(['Run', 'Order', 'Frequency (Hz)', 'Q', 'Bandwidth (Hz)', 'Fan tone (broad, clear or meets)', 'Fan tone met (Hz)', 'End correction at the start (m)', 'End correction at the end (m)']);
    expect(rows).toHaveLength(analysis.resonances.length);
    analysis.resonances.forEach((resonance, index) => {
      const row = rows[index];
      expect(row.Run).toBe(result.name);
      expect(numberCell(row.Order)).toBe(resonance.order);
      expectClose(numberCell(row['Frequency (Hz)']), resonance.frequencyHz, 0.0005, `order ${resonance.order} frequency`);
      if (resonance.q === null) expect(row.Q).toBe(''); else expectClose(numberCell(row.Q), resonance.q, 5e-7, 'Q');
      if (resonance.bandwidthHz === null) expect(row['Bandwidth (Hz)']).toBe(''); else expectClose(numberCell(row['Bandwidth (Hz)']), resonance.bandwidthHz, 5e-7, 'bandwidth');
      const tone = result.nearFanTone[resonance.order] ?? null;
      expect(row['Fan tone (broad, clear or meets)']).toBe(resonance.broadband ? 'broad' : tone === null ? 'clear' : 'meets');
      if (tone === null || resonance.broadband) expect(row['Fan tone met (Hz)']).toBe(''); else expectClose(numberCell(row['Fan tone met (Hz)']), tone, 0.0005, 'fan tone');
      expectClose(numberCell(row['End correction at the start (m)']), analysis.endCorrectionM.start, 0.00005, 'start end correction');
      expectClose(numberCell(row['End correction at the end (m)']), analysis.endCorrectionM.end, 0.00005, 'end end correction');
    });
    // the demo's 100.8 Hz blade-pass tone meets one of the run's resonances (its reason for being)
    expect(rows.some((row) => row['Fan tone (broad, clear or meets)'] === 'meets')).toBe(true);
  });

  it('in imperial units the end corrections are in feet, and the header says so', () => {
    const { result } = demoRunResult();
    const { header, rows } = readCsv(resonancesCsv(result, 'imperial'));
    expect(header.slice(-2)).toEqual(['End correction at the start (ft)', 'End correction at the end (ft)']);
    expectClose(numberCell(rows[0]['End correction at the end (ft)']) * 0.3048, result.analysis!.endCorrectionM.end, 0.00005 * 0.3048, 'end correction in feet');
  });

  it('a run name that looks like a formula, or holds commas and quotes, comes back as written (RFC 4180 rules 6 and 7) and stays text', () => {
    const { result } = demoRunResult();
    const hostile = { ...result, name: '=cmd|"/c calc", north' };
    const text = resonancesCsv(hostile, 'si');
    expect(text.split('\r\n')[1].startsWith(`"'=cmd|""/c calc"", north",`)).toBe(true);
    expect(readCsv(text).rows[0].Run).toBe(`'=cmd|"/c calc", north`);
  });

  it('a run without results gives the header alone', () => {
    const { result } = demoRunResult();
    expect(resonancesCsv({ ...result, analysis: null, problem: 'no path' }, 'si').split('\r\n')).toHaveLength(1);
  });
});
