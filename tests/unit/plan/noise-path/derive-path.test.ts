// The noise path read off the drawing. The listener level is recomputed here element by element
// from the engine's own published-formula functions: sound power minus each element's loss (the
// decibel sum of a chain of losses), plus Schultz's room correction (Schultz 1985, ASHRAE Trans. 91);
// the branch split is 10 log(A_total / A_branch) (ASHRAE Handbook, HVAC Applications, noise chapter).
import { describe, expect, it } from 'vitest';
import { branchPowerSplitDb, elbowAttenuationDb, endReflectionLoss, equivalentRadiusM, linedDuctAttenuationDb, OCTAVE_BANDS_HZ, schultzRoomCorrectionDb, sectionArea, unlinedDuctAttenuationDbPerM } from '@/lib/acoustic';
import { newRoom, type PlanDocument } from '@/lib/plan';
import { DEMO_FAN_BLADES, DEMO_FAN_SOUND_POWER_DB, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { derivePath } from '@/lib/plans/noise-path/derive-path';
import { roomNoisePath } from '@/lib/plans/noise-path/room-path';
import { expectClose } from '../../acoustic/tolerance';

const bands = [...OCTAVE_BANDS_HZ];

describe('noise path read off the plan', () => {
  it('the demo run to its first outlet: ducts, an elbow at the bend, the tee to the second outlet as a split, the flush outlet; the listener level is the fan power less each loss plus the room correction', () => {
    const doc = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    const room = doc.rooms[0];
    const derived = derivePath(doc, DEMO_METRES_PER_PIXEL, room);
    expect(derived.input.elements.map((element) => element.kind)).toEqual(['duct', 'elbow', 'duct', 'split', 'duct', 'outlet']);
    expect(derived.sources.map((source) => source.label.split(',')[0])).toEqual(['A1', 'A1/A2 elbow', 'A2', 'A2 tee: to A3', 'A3', 'Outlet A3 end']);
    // riser 300 px, corridor 400 px, drop 90 px at 20 mm per pixel; at the tee the drop (Ø 315) and the onward corridor (400 × 250) leave
    const [riser, corridor, drop, onward] = ['riser', 'corridor-main', 'recital-drop', 'corridor-on'].map((id) => doc.segments.find((segment) => segment.id === id)!.section);
    const dropM2 = sectionArea(drop);
    const losses = [
      unlinedDuctAttenuationDbPerM(riser, bands).map((perM) => perM * 6),
      elbowAttenuationDb({ section: riser }, bands),
      unlinedDuctAttenuationDbPerM(corridor, bands).map((perM) => perM * 8),
      // ASHRAE Handbook, HVAC Applications, noise chapter: 10 log(total area / branch area)
      bands.map(() => 10 * Math.log10((dropM2 + sectionArea(onward)) / dropM2)),
      unlinedDuctAttenuationDbPerM(drop, bands).map((perM) => perM * 1.8),
      // flanged at the ceiling: flush mounting (ASHRAE RP-1314 form)
      endReflectionLoss(2 * equivalentRadiusM(drop), 'flush', bands, 16),
    ];
    const distanceM = Math.hypot(room.outlet.xM - room.listener.xM, room.outlet.yM - room.listener.yM, room.outlet.zM - room.listener.zM);
    const volumeM3 = room.lengthM * room.widthM * room.heightM;
    const path = roomNoisePath(doc, DEMO_METRES_PER_PIXEL, room);
    bands.forEach((hz, band) => {
      const expected = DEMO_FAN_SOUND_POWER_DB[band] - losses.reduce((sum, loss) => sum + loss[band], 0) + schultzRoomCorrectionDb(volumeM3, distanceM, hz);
      expectClose(path.result.listenerDb[band], expected, 0.05, `${hz} Hz`);
    });
    // the margin and the governing band follow from the listener level and the NC-20 curve
    const worst = path.marginDb.indexOf(Math.min(...path.marginDb));
    expect(path.governingHz).toBe(bands[worst]);
  });

  it('a tee on the way is a power split by the areas leaving it, and a liner on the path counts with its thickness', () => {
    const room = newRoom('room', { name: 'Office', x: 380, y: 300, lengthM: 5, widthM: 4, heightM: 3 });
    const doc: PlanDocument = {
      schemaVersion: 1,
      nodes: [{ id: 'fan', x: 0, y: 0 }, { id: 'tee', x: 300, y: 0 }, { id: 'on', x: 600, y: 0 }, { id: 'out', x: 300, y: 300 }],
      segments: [
        { id: 'main', from: 'fan', to: 'tee', section: { shape: 'rect', widthM: 0.5, heightM: 0.4 } },
        { id: 'onward', from: 'tee', to: 'on', section: { shape: 'rect', widthM: 0.4, heightM: 0.3 } },
        { id: 'branch', from: 'tee', to: 'out', section: { shape: 'round', diameterM: 0.25 }, lining: { thicknessM: 0.025, absorption: 0.6 } },
      ],
      runs: [{ id: 'r', name: 'Supply', startNodeId: 'fan', endNodeId: null, temperatureC: 20, fan: null, fanSoundPowerDb: [80, 80, 80, 80, 80, 80, 80, 80],
        terminations: { fan: { kind: 'closed' }, on: { kind: 'open', flange: 'unflanged' }, out: { kind: 'open', flange: 'unflanged' } } }],
      rooms: [{ ...room, outlet: { nodeId: 'out', xM: 1, yM: 1, zM: 2.7 } }],
      outlets: [], listeners: [], treatments: [],
    };
    const derived = derivePath(doc, 0.01, doc.rooms[0]);
    expect(derived.input.elements.map((element) => element.kind)).toEqual(['duct', 'split', 'duct', 'outlet']);
    const split = derived.input.elements[1];
    if (split.kind !== 'split') throw new Error('no split');
    const branchM2 = sectionArea({ shape: 'round', diameterM: 0.25 });
    expectClose(split.totalAreaM2, branchM2 + 0.4 * 0.3, 1e-12, 'areas leaving the tee');
    const path = roomNoisePath(doc, 0.01, doc.rooms[0]);
    expectClose(path.result.steps[1].lossDb[0], branchPowerSplitDb(branchM2, branchM2 + 0.12), 1e-9, 'split loss');
    const lined = linedDuctAttenuationDb({ shape: 'round', diameterM: 0.25 }, { thicknessM: 0.025 }, 3, bands);
    path.result.steps[2].lossDb.forEach((loss, band) => expect(loss).toBeGreaterThanOrEqual(lined[band] - 1e-9));
  });

  it('says what is missing when the run has no fan sound power', () => {
    const doc = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    const without = { ...doc, runs: doc.runs.map((run) => ({ ...run, fanSoundPowerDb: null })) };
    expect(() => derivePath(without, DEMO_METRES_PER_PIXEL, without.rooms[0])).toThrow(/give its fan's sound power/);
  });

  it('a run that shares another run\'s fan takes that fan\'s power, divided between the runs by the area of each one\'s first duct', () => {
    // A second run from the same air handler: its own start point, a Ø 250 duct to the room; it shares the demo run's fan.
    const doc = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    const second = {
      ...doc,
      nodes: [...doc.nodes, { id: 'ahu-2', x: 160, y: 80 }, { id: 'second-outlet', x: 700, y: 470 }],
      segments: [...doc.segments, { id: 'second-duct', from: 'ahu-2', to: 'second-outlet', section: { shape: 'round' as const, diameterM: 0.25 } }],
      runs: [...doc.runs, { id: 'second', name: 'Second supply', startNodeId: 'ahu-2', endNodeId: 'second-outlet', temperatureC: 16, fan: null, fanOfRunId: 'recital-supply', terminations: { 'ahu-2': { kind: 'closed' as const }, 'second-outlet': { kind: 'open' as const, flange: 'flanged' as const } } }],
      rooms: [{ ...doc.rooms[0], outlet: { ...doc.rooms[0].outlet, nodeId: 'second-outlet', xM: 6.4 }, extraOutlets: [] }],
    } as PlanDocument;
    const derived = derivePath(second, DEMO_METRES_PER_PIXEL, second.rooms[0]);
    expect(derived.input.elements[0].kind).toBe('split');
    const riserM2 = sectionArea({ shape: 'round', diameterM: 0.56 });
    const ownM2 = sectionArea({ shape: 'round', diameterM: 0.25 });
    // ASHRAE Handbook, HVAC Applications, noise chapter: 10 log(total area / branch area)
    expectClose(branchPowerSplitDb(ownM2, riserM2 + ownM2), 10 * Math.log10((riserM2 + ownM2) / ownM2), 1e-12, 'split');
    const split = derived.input.elements[0];
    expect(split.kind === 'split' && split.branchAreaM2).toBeCloseTo(ownM2, 12);
    expect(split.kind === 'split' && split.totalAreaM2).toBeCloseTo(riserM2 + ownM2, 12);
    // the fan's power and speed range are the first run's: worked at the top of its range by the fan laws
    expect(derived.input.soundPowerDb[0]).toBeCloseTo(DEMO_FAN_SOUND_POWER_DB[0] + 50 * Math.log10(DEMO_FAN_SPEEDS_RPM.high / DEMO_FAN_SPEEDS_RPM.high), 9);
    expect(derived.sources[0].label).toContain('Fan shared by 2 runs');
  });
});
