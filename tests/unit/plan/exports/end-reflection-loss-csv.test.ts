// The end reflection loss CSV of the demo run's outlets, read back with papaparse and compared with the
// table the results panel shows (outletReflectionLosses): a dB value per octave band 63 Hz to 8 kHz,
// each within 0.005 dB (written to 0.01 dB); the diameter in millimetres or inches (1 in = 25.4 mm
// exactly, International Yard and Pound Agreement, 1959).
import { describe, expect, it } from 'vitest';
import { OCTAVE_BANDS_HZ } from '@/lib/acoustic';
import { OUTLET_MOUNTING_WORDS, outletReflectionLosses } from '@/lib/plan/outlet-reflection-loss';
import { endReflectionLossCsv } from '@/lib/plans/exports';
import { expectClose } from '../../acoustic/tolerance';
import { demoRunResult, numberCell, readCsv } from './exports-fixture';

describe('end reflection loss CSV', () => {
  it('a row per outlet with its rooms, diameter and mounting, then dB per band, headers with units', () => {
    const { doc, labels } = demoRunResult();
    const outlets = outletReflectionLosses(doc, doc.runs[0].id, labels);
    const { header, rows } = readCsv(endReflectionLossCsv(outlets, 'si'));
    expect(header).toEqual(['Run', 'Outlet', 'Rooms fed', 'Diameter taken (mm)', 'Mounting', ...OCTAVE_BANDS_HZ.map((hz) => `End reflection loss at ${hz} Hz (dB)`)]);
    expect(header).toContain('End reflection loss at 8000 Hz (dB)');
    expect(rows.map((row) => row.Outlet)).toEqual(['A3 end', 'A5 end']);
    outlets.forEach((outlet, index) => {
      const row = rows[index];
      expect(row['Rooms fed']).toBe(outlet.rooms.join('; '));
      expect(row.Mounting).toBe(OUTLET_MOUNTING_WORDS[outlet.mounting]);
      expectClose(numberCell(row['Diameter taken (mm)']), outlet.diameterM * 1000, 0.005, 'diameter');
      OCTAVE_BANDS_HZ.forEach((hz, band) => expectClose(numberCell(row[`End reflection loss at ${hz} Hz (dB)`]), outlet.erlDb[band], 0.005, `${outlet.label} at ${hz} Hz`));
    });
  });

  it('in imperial units the diameter is in inches, and the header says so', () => {
    const { doc, labels } = demoRunResult();
    const outlets = outletReflectionLosses(doc, doc.runs[0].id, labels);
    const { header, rows } = readCsv(endReflectionLossCsv(outlets, 'imperial'));
    expect(header[3]).toBe('Diameter taken (in)');
    // the demo's drops are 315 mm round: 315 / 25.4 = 12.402 in
    expectClose(numberCell(rows[0]['Diameter taken (in)']), 315 / 25.4, 0.0005, 'diameter in inches');
  });
});
