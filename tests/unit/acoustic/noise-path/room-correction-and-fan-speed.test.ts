// The noise path with a room correction from another model (the room equation of a bare room), and the
// fan laws for the fan's sound power at another speed.
import { describe, expect, it } from 'vitest';
import { fanSpeedSoundPowerChangeDb, noisePath, roomEquationCorrectionDb } from '@/lib/acoustic';
import { expectClose } from '../tolerance';

const flat = (levelDb: number) => Array.from({ length: 8 }, () => levelDb);
const bare = (absorption: number) => Object.fromEntries(['floor', 'ceiling', 'wallXMin', 'wallXMax', 'wallYMin', 'wallYMax'].map((name) => [name, flat(absorption)])) as never;

describe('noise path with the room equation of a bare room', () => {
  it('level = power into the room + the given Lp - Lw (Long, Architectural Acoustics, ch. 8), and the result says which correction it used', () => {
    const room = { box: { lengthM: 8, widthM: 6, heightM: 3 }, surfaces: bare(0.05), outlet: { xM: 2, yM: 2, zM: 3 }, listener: { xM: 5, yM: 4, zM: 1.2 } };
    const correctionDb = roomEquationCorrectionDb(room);
    const result = noisePath({ soundPowerDb: flat(60), elements: [{ kind: 'loss', label: 'grille', lossDb: flat(2) }], room: { volumeM3: 144, distanceM: 3.9, correctionDb } });
    result.listenerDb.forEach((levelDb, band) => expectClose(levelDb, 58 + correctionDb[band], 1e-12, `band ${band}`));
    expect(result.roomCorrection).toBe('given');
    expect(noisePath({ soundPowerDb: flat(60), elements: [], room: { volumeM3: 144, distanceM: 3.9 } }).roomCorrection).toBe('schultz');
  });

  it('refuses a correction without 8 bands or with a non-number, naming the field', () => {
    expect(() => noisePath({ soundPowerDb: flat(60), elements: [], room: { volumeM3: 144, distanceM: 3, correctionDb: [1, 2] } })).toThrow('room.correctionDb must have 8 octave-band values');
    expect(() => noisePath({ soundPowerDb: flat(60), elements: [], room: { volumeM3: 144, distanceM: 3, correctionDb: [...flat(-5).slice(0, 7), Number.NaN] } })).toThrow('room.correctionDb[7]');
  });
});

describe('fan laws: sound power changes by 50 log10(n2/n1) (ASHRAE Handbook, HVAC Applications, noise chapter; from memory)', () => {
  it('10 % faster: +2.07 dB; double speed: +15.05 dB; slower: a fall [calc]', () => {
    expectClose(fanSpeedSoundPowerChangeDb(600, 660), 50 * Math.log10(1.1), 1e-12, '[calc]');
    expectClose(fanSpeedSoundPowerChangeDb(600, 660), 2.07, 0.005, 'rounded');
    expectClose(fanSpeedSoundPowerChangeDb(500, 1000), 15.05, 0.005, 'doubling');
    expect(fanSpeedSoundPowerChangeDb(605, 450)).toBeLessThan(0);
    expect(() => fanSpeedSoundPowerChangeDb(0, 450)).toThrow('fromRpm must be > 0');
  });
});
