// The reflections CSV of the demo run, read back with papaparse and compared with the results the panel
// shows: |R| and the phase (degrees = radians × 180/π) of every octave band below the cut-off, each
// within half the step it is written to; distances in metres or in feet (1 ft = 0.3048 m exactly).
import { describe, expect, it } from 'vitest';
import { reflectionKindWords } from '@/lib/plan/reflection-words';
import { reflectionPlace, reflectionsCsv } from '@/lib/plans/exports';
import { expectClose } from '../../acoustic/tolerance';
import { demoRunResult, numberCell, readCsv } from './exports-fixture';

describe('reflections CSV', () => {
  it('a row per reflecting place, |R| and phase per band with the band and unit in each header, values as the panel holds them', () => {
    const { result, labels } = demoRunResult();
    const reflections = result.analysis!.reflections;
    const bandsHz = reflections[0].bands.map((band) => band.hz);
    const { header, rows } = readCsv(reflectionsCsv(result, labels.nodes, 'si'));
    expect(header.slice(0, 4)).toEqual(['Run', 'Where', 'Place on the plan', 'Distance along the path (m)']);
    expect(header.slice(4, 6)).toEqual([`|R| at ${bandsHz[0]} Hz (ratio)`, `Phase at ${bandsHz[0]} Hz (degrees)`]);
    expect(header).toHaveLength(4 + 2 * bandsHz.length);
    expect(rows).toHaveLength(reflections.length);
    reflections.forEach((reflection, index) => {
      const row = rows[index];
      expect(row.Where).toBe(reflectionKindWords(reflection.kind));
      expect(row['Place on the plan']).toBe(reflectionPlace(result.path, labels.nodes, reflection.atM, reflection.kind) ?? '');
      expectClose(numberCell(row['Distance along the path (m)']), reflection.atM, 0.00005, 'distance');
      for (const band of reflection.bands) {
        expectClose(numberCell(row[`|R| at ${band.hz} Hz (ratio)`]), band.magnitude, 5e-7, `|R| at ${band.hz} Hz`);
        expectClose(numberCell(row[`Phase at ${band.hz} Hz (degrees)`]) * (Math.PI / 180), band.phaseRad, 0.0005 * (Math.PI / 180), `phase at ${band.hz} Hz`);
      }
    });
    // the run starts at the air handler (A start) and ends at the recital room's outlet; every place is named
    expect(rows[0]['Place on the plan']).toBe('A start');
    expect(rows.every((row) => row['Place on the plan'] !== '')).toBe(true);
  });

  it('in imperial units the distances are in feet, and the header says so', () => {
    const { result, labels } = demoRunResult();
    const { header, rows } = readCsv(reflectionsCsv(result, labels.nodes, 'imperial'));
    expect(header[3]).toBe('Distance along the path (ft)');
    const last = result.analysis!.reflections.at(-1)!;
    expectClose(numberCell(rows.at(-1)!['Distance along the path (ft)']) * 0.3048, last.atM, 0.00005 * 0.3048, 'distance in feet');
  });
});
