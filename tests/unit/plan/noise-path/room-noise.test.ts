// The noise in a room from every outlet at every listener, read off the plan. Each outlet's level is the
// engine's path (checked element by element in derive-path.test.ts); here the sums and choices are
// checked against their definitions: the energy sum of incoherent sources, 10 log10 Σ 10^(L/10)
// (definition of the decibel, ISO 80000-8); the branch split's power shares adding to the whole
// (10 log(A_total / A_branch), ASHRAE Handbook, HVAC Applications, noise chapter); the fan laws,
// 50 log10(n2/n1) (from memory); Wells' plenum equation (Wells 1958); the room equation for a bare room
// (Long, Architectural Acoustics, ch. 8).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { noisePath, OCTAVE_BANDS_HZ, plenumAttenuationDb, roomEquationCorrectionDb, sumLevelsDb, SURFACE_NAMES, type RoomSurfaces } from '@/lib/acoustic';
import type { PlanDocument, PlanRoom } from '@/lib/plan';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { noiseTables, rowWords } from '@/lib/plans/noise-path/path-tables';
import { plenumElement } from '@/lib/plans/noise-path/plenum-element';
import { pathLevelFlags } from '@/lib/plans/noise-path/room-path';
import { roomNoise } from '@/lib/plans/noise-path/room-noise';
import { expectClose } from '../../acoustic/tolerance';

const mpp = DEMO_METRES_PER_PIXEL;
const demo = () => demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
const energySum = (levelsDb: number[]) => 10 * Math.log10(levelsDb.reduce((sum, levelDb) => sum + 10 ** (levelDb / 10), 0));
const withRoom = (doc: PlanDocument, change: Partial<PlanRoom>): PlanDocument => ({ ...doc, rooms: doc.rooms.map((room) => ({ ...room, ...change })) });

describe('noise from several outlets at several listeners', () => {
  it('the demo recital room: two outlets fed from one fan through the tee, two listeners; each listener\'s level is the energy sum of the two paths', () => {
    const doc = demo();
    const room = doc.rooms[0];
    const noise = roomNoise(doc, mpp, room);
    expect(noise.outlets.map((outlet) => outlet.label)).toEqual(['Outlet A3 end', 'Outlet A5 end']);
    expect(noise.listeners.map((listener) => listener.name)).toEqual(['L1', 'L2']);
    // the two branches at the tee carry the whole power between them: 10^(-s1/10) + 10^(-s2/10) = 1
    const splits = noise.outlets.map((outlet) => outlet.steps[outlet.elements.findIndex((element) => element.kind === 'split')].lossDb[0]);
    expectClose(10 ** (-splits[0] / 10) + 10 ** (-splits[1] / 10), 1, 1e-12, 'power shares at the tee');
    for (const listener of noise.listeners) {
      expect(listener.contributions).toHaveLength(2);
      OCTAVE_BANDS_HZ.forEach((hz, band) => {
        expectClose(listener.levelDb[band], energySum(listener.contributions.map((part) => part.levelDb[band])), 1e-9, `${listener.name} ${hz} Hz`);
        expectClose(listener.marginDb[band], noise.criterionDb[band] - listener.levelDb[band], 1e-12, 'margin');
      });
      // each outlet's own level: its path into the room plus Schultz at its own distance
      for (const part of listener.contributions) {
        const outlet = noise.outlets.find((candidate) => candidate.outletId === part.outletId)!;
        const alone = noisePath({ soundPowerDb: outlet.startPowerDb, elements: outlet.elements, temperatureC: 16, room: { volumeM3: 840, distanceM: part.distanceM } });
        alone.listenerDb.forEach((levelDb, band) => expectClose(part.levelDb[band], levelDb, 1e-9, 'one outlet'));
      }
    }
    // listener 2 (12.5, 8.8, 1.2) from outlet 2 (11.8, 1, 5.6) [calc]
    expectClose(noise.listeners[1].contributions[1].distanceM, Math.hypot(0.7, 7.8, 4.4), 1e-9, 'distance');
    expect(noise.bandsBelowSchroederHz).toEqual([63]);
    expect(noise.warnings[0]).toMatch(/63 Hz band lies below the room's Schroeder frequency/);
  });

  it('the sum does not depend on the order of the outlets (property)', () => {
    const doc = demo();
    const base = roomNoise(doc, mpp, doc.rooms[0]);
    // the engine's energy sum, in any order of its terms
    const levelsAndShuffle = fc.array(fc.double({ min: -20, max: 120, noNaN: true }), { minLength: 1, maxLength: 6 })
      .chain((levels) => fc.tuple(fc.constant(levels), fc.shuffledSubarray(levels, { minLength: levels.length, maxLength: levels.length })));
    fc.assert(fc.property(levelsAndShuffle, ([levels, shuffled]) => {
      expect(Math.abs(sumLevelsDb(shuffled) - sumLevelsDb(levels))).toBeLessThan(1e-9);
      expect(Math.abs(sumLevelsDb(levels) - energySum(levels))).toBeLessThan(1e-9);
    }));
    // the room's own sum, with the outlets listed the other way round
    const swapped = withRoom(doc, {
      outlet: { ...doc.rooms[0].outlet, nodeId: 'recital-outlet-2', xM: 11.8 },
      extraOutlets: [{ id: 'first-as-second', nodeId: 'recital-outlet', xM: 2.8, yM: 1, zM: 5.6 }],
    });
    const other = roomNoise(swapped, mpp, swapped.rooms[0]);
    base.listeners.forEach((listener, index) => listener.levelDb.forEach((levelDb, band) => expectClose(other.listeners[index].levelDb[band], levelDb, 1e-9, 'swapped')));
  });

  it('a fan with a speed range is worked at its top speed: every level rises by 50 log10(n_max / n) (fan laws)', () => {
    const doc = demo();
    const faster: PlanDocument = { ...doc, runs: doc.runs.map((run) => ({ ...run, fan: { ...run.fan!, maxRpm: 660 } })) };
    const before = roomNoise(doc, mpp, doc.rooms[0]);
    const after = roomNoise(faster, mpp, faster.rooms[0]);
    expect(before.outlets[0].fanSpeed).toBeNull();
    expect(after.outlets[0].fanSpeed).toMatchObject({ ratedRpm: 605, worstRpm: 660 });
    const rise = 50 * Math.log10(660 / 605);
    after.listeners.forEach((listener, index) => listener.levelDb.forEach((levelDb, band) => expectClose(levelDb - before.listeners[index].levelDb[band], rise, 1e-9, 'rise')));
    expect(noiseTables(after).outlets[0].rows[1].label).toMatch(/^Fan at 660 rpm, the top of its range: 50 log\(660\/605\)/);
  });

  it('a bare room takes the room equation with its own absorption for each outlet and listener', () => {
    const doc = withRoom(demo(), { roomCorrection: 'bare' });
    const room = doc.rooms[0];
    const noise = roomNoise(doc, mpp, room);
    expect(noise.correction).toBe('bare');
    const surfaces = Object.fromEntries(SURFACE_NAMES.map((name) => [name, [...room.surfaces[name].absorption]])) as RoomSurfaces;
    const expected = roomEquationCorrectionDb({ box: { lengthM: 14, widthM: 10, heightM: 6 }, surfaces, outlet: room.outlet, listener: room.extraListeners![0] });
    noise.listeners[1].contributions[0].roomCorrectionDb.forEach((correctionDb, band) => expectClose(correctionDb, expected[band], 1e-12, `band ${band}`));
    expect(noiseTables(noise).correction).toBe('bare');
    expect(noiseTables(noise).listeners[0].rows[0].label).toMatch(/^Outlet A3 end, [\d.]+ m away: room correction \(Lp − Lw\)$/);
  });

  it('raises a flag per listener and band above the criterion, naming the listener; the first keeps its old subject', () => {
    const doc = demo();
    const noise = roomNoise(doc, mpp, doc.rooms[0]);
    const flags = pathLevelFlags(doc.rooms[0], noise);
    const atL2 = flags.filter((flag) => flag.subject.endsWith('@recital-back-seat'));
    expect(atL2.length).toBe(noise.listeners[1].marginDb.filter((margin) => margin < 0).length);
    expect(flags.filter((flag) => /^band:\d+$/.test(flag.subject)).length).toBe(noise.listeners[0].marginDb.filter((margin) => margin < 0).length);
    expect(atL2[0].reason).toMatch(/^At listener L2 in Recital room, the .* from its 2 outlets/);
  });

  it('a further outlet without a run end is left out and said so; one whose run has no fan sound power stops the result with the reason', () => {
    const doc = demo();
    const unfed = withRoom(doc, { extraOutlets: [{ id: 'spare', nodeId: null, xM: 5, yM: 5, zM: 5 }] });
    const noise = roomNoise(unfed, mpp, unfed.rooms[0]);
    expect(noise.outlets).toHaveLength(1);
    expect(noise.warnings).toContain('Outlet 2 has no run end chosen yet: it is left out until one feeds it.');
    const silent: PlanDocument = { ...doc, runs: doc.runs.map((run) => ({ ...run, fanSoundPowerDb: null })) };
    expect(() => roomNoise(silent, mpp, silent.rooms[0])).toThrow(/give its fan's sound power/);
  });

  it('a plenum box put in after a segment is Wells\' element: r = sqrt(L² + offset²), θ = atan(offset / L), S the inside surface', () => {
    const box = { lengthM: 2, widthM: 1.5, heightM: 1, outletAreaM2: 0.16, offsetM: 1, absorption: 0.5 };
    const element = plenumElement(box);
    expectClose(element.distanceM, Math.sqrt(5), 1e-12, 'r');
    expectClose(element.angleDeg, (Math.atan(0.5) * 180) / Math.PI, 1e-12, 'θ');
    expectClose(element.surfaceAreaM2, 2 * (3 + 2 + 1.5), 1e-12, 'S');
    // Wells (1958): TL = -10 log[S_out (Q cos θ / 4π r² + (1 - α)/(S α))], Q = 2 [calc]
    const byHand = -10 * Math.log10(0.16 * ((2 * Math.cos(Math.atan(0.5))) / (4 * Math.PI * 5) + 0.5 / (13 * 0.5)));
    expectClose(plenumAttenuationDb(element), byHand, 1e-9, 'Wells');
    const doc = demo();
    const withPlenum: PlanDocument = { ...doc, segments: doc.segments.map((segment) => (segment.id === 'riser' ? { ...segment, inserts: [{ kind: 'plenum' as const, label: 'Supply plenum', plenum: box }] } : segment)) };
    const before = roomNoise(doc, mpp, doc.rooms[0]);
    const after = roomNoise(withPlenum, mpp, withPlenum.rooms[0]);
    const step = after.outlets[0].steps.findIndex((candidate) => candidate.kind === 'plenum');
    expect(after.outlets[0].sources[step].label).toBe('Supply plenum (after A1)');
    after.outlets[0].steps[step].lossDb.forEach((loss) => expectClose(loss, byHand, 1e-9, 'loss in the path'));
    after.listeners[0].levelDb.forEach((levelDb, band) => expectClose(levelDb, before.listeners[0].levelDb[band] - byHand, 1e-9, 'both outlets lose it'));
  });

  it('path rows give a duct\'s length and liner in either unit system', () => {
    const doc = demo();
    const lined: PlanDocument = { ...doc, segments: doc.segments.map((segment) => (segment.id === 'corridor-main' ? { ...segment, lining: { thicknessM: 0.0508, absorption: 0.7 } } : segment)) };
    const tables = noiseTables(roomNoise(lined, mpp, lined.rooms[0]));
    const row = tables.outlets[0].rows.find((candidate) => candidate.label.startsWith('Duct: A2'))!;
    expect(rowWords(row, 'si')).toBe('Duct: A2, 8.00 m, lined 50.8 mm (loss)');
    // 8 m = 314.96 in = 26 ft 3 in to the quarter inch; 50.8 mm = 2 in (international inch, 1959)
    expect(rowWords(row, 'imperial')).toBe('Duct: A2, 26 ft 3 in, lined 2 in (loss)');
    const correction = tables.listeners[0].rows[0];
    // outlet (2.8, 1, 5.6) to L1 (8.5, 6.2, 1.2): 8.882 m = 349.69 in, 29 ft 1 3/4 in to the quarter inch [calc]
    expect(rowWords(correction, 'imperial')).toMatch(/29 ft 1 3\/4 in away/);
  });
});
