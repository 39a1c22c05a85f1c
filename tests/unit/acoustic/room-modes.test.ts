import { describe, expect, it } from 'vitest';
import { roomModes } from '@/lib/acoustic';
import { expectClose } from './tolerance';

describe('room modes (Rayleigh 1896, The Theory of Sound, §267)', () => {
  const room = { lengthM: 5, widthM: 4, heightM: 3, speedOfSoundMps: 343 };
  const rayleigh = (nx: number, ny: number, nz: number) => (343 / 2) * Math.hypot(nx / 5, ny / 4, nz / 3);

  it('5 x 4 x 3 m, c = 343: 13 modes up to 100 Hz, ascending (sheet)', () => {
    const modes = roomModes(room, 100);
    expect(modes).toHaveLength(13);
    for (let index = 1; index < modes.length; index++) expect(modes[index].frequencyHz).toBeGreaterThanOrEqual(modes[index - 1].frequencyHz);
    for (const mode of modes) expectClose(mode.frequencyHz, rayleigh(...mode.indices), 1e-9, `mode ${mode.indices}`);
  });

  it.each([
    [[1, 0, 0], 34.3, 'axial'],
    [[0, 1, 0], 42.88, 'axial'],
    [[0, 0, 1], 57.17, 'axial'],
    [[2, 0, 0], 68.6, 'axial'],
    [[1, 1, 0], 54.91, 'tangential'],
    [[1, 0, 1], 66.67, 'tangential'],
    [[1, 1, 1], 79.26, 'oblique'],
  ] as const)('mode %j at %s Hz is %s (sheet)', (indices, expectedHz, type) => {
    const mode = roomModes(room, 100).find((candidate) => candidate.indices.join() === indices.join());
    expect(mode?.type).toBe(type);
    expectClose(mode?.frequencyHz ?? NaN, expectedHz, 0.0051, `${indices}` /* sheet values rounded to 0.01 Hz */);
  });

  it('uses the speed of sound at the room temperature by default', () => {
    const modes = roomModes({ lengthM: 5, widthM: 4, heightM: 3 }, 40);
    expectClose(modes[0].frequencyHz, 343.2 / 10, 1e-9, 'first axial at 20 °C');
  });
});
