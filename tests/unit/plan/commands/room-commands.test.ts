import { describe, expect, it } from 'vitest';
import {
  emptyDocument, FINISHES, initialEditorState, parsePlanDocument, performCommand, sequentialIds, toRoomInput, tryCommand,
  type PlanTreatment,
} from '@/lib/plan';
import { roomPlanDocument } from '../room-plan-fixture';

const state = initialEditorState();
const shape = { name: 'Meeting room 2', x: 10, y: 20, lengthM: 5, widthM: 4, heightM: 3 };

describe('room commands', () => {
  it('adds a room with default finishes, NC 25, outlet near the ceiling and listener seated at the middle', () => {
    const { doc } = performCommand('add-room', emptyDocument(), state, shape, sequentialIds('r'));
    expect(doc.rooms).toHaveLength(1);
    const room = doc.rooms[0];
    expect(room).toMatchObject({ id: 'r1', name: 'Meeting room 2', criterionNc: 25, outlet: { nodeId: null, xM: 2.5, yM: 2, zM: 2.7 }, listener: { xM: 2.5, yM: 2, zM: 1.2 } });
    expect(room.surfaces.floor.finishId).toBe('timber-floor-on-joists');
    expect(room.surfaces.ceiling.absorption).toHaveLength(8);
    expect(parsePlanDocument(doc).ok).toBe(true);
  });

  it('updates a room and refuses a listener outside the box or an outlet on a missing point, naming the field', () => {
    const added = performCommand('add-room', emptyDocument(), state, shape, sequentialIds('r'));
    const updated = performCommand('update-room', added.doc, state, { roomId: 'r1', changes: { criterionNc: 20, lengthM: 6 }, metresPerPixel: 0.02 });
    expect(updated.doc.rooms[0]).toMatchObject({ criterionNc: 20, lengthM: 6, widthM: 4 });
    const outside = tryCommand('update-room', added.doc, state, { roomId: 'r1', changes: { listener: { xM: 1, yM: 1, zM: 3.5 } }, metresPerPixel: 0.02 });
    expect(outside.ok === false && outside.error.message).toMatch(/listener z: must be inside the room \(at most its height, 3 m\)/);
    const noNode = tryCommand('update-room', added.doc, state, { roomId: 'r1', changes: { outlet: { nodeId: 'nowhere', xM: 1, yM: 1, zM: 2 } }, metresPerPixel: 0.02 });
    expect(noNode.ok === false && noNode.error.message).toMatch(/no point with id "nowhere"/);
    const badNc = tryCommand('update-room', added.doc, state, { roomId: 'r1', changes: { criterionNc: 90 }, metresPerPixel: 0.02 });
    expect(badNc.ok === false && badNc.error.message).toMatch(/criterionNc.*at most NC 70/);
    // The published NC curves start at NC 15 (ANSI S12.2): below it there is no curve to hold the room to.
    const lowNc = tryCommand('update-room', added.doc, state, { roomId: 'r1', changes: { criterionNc: 5 }, metresPerPixel: 0.02 });
    expect(lowNc.ok === false && lowNc.error.message).toMatch(/criterionNc.*at least NC 15/);
    expect(tryCommand('update-room', added.doc, state, { roomId: 'r1', changes: { criterionNc: 22.5 }, metresPerPixel: 0.02 }).ok).toBe(true);
  });

  it('deletes a room; deleting the point an outlet names unlinks the room', () => {
    const doc = roomPlanDocument();
    expect(performCommand('delete-room', doc, state, { roomId: 'recital' }).doc.rooms).toHaveLength(0);
    const cut = performCommand('delete-selection', doc, { ...state, selection: { nodeIds: ['outlet'], segmentIds: [] } }, {}, sequentialIds('x'));
    expect(cut.doc.rooms[0].outlet.nodeId).toBeNull();
    expect(tryCommand('delete-room', doc, state, { roomId: 'none' }).ok).toBe(false);
  });

  it('maps a room onto the engine input surface by surface', () => {
    const input = toRoomInput(roomPlanDocument().rooms[0], 18);
    expect(input.box).toEqual({ lengthM: 12, widthM: 8, heightM: 5, temperatureC: 18 });
    expect(Object.keys(input.surfaces).sort()).toEqual(['ceiling', 'floor', 'wallXMax', 'wallXMin', 'wallYMax', 'wallYMin']);
    expect(input.outlet).toEqual({ xM: 4, yM: 1, zM: 4.7 });
  });
});

describe('treatment list commands', () => {
  const chosen: Omit<PlanTreatment, 'id'> = {
    runId: 'supply', roomId: 'recital', flagId: 'resonance-near-tone:h1:115.8', flagKind: 'resonance-near-tone', flagSubject: 'tone:h1', flagReason: 'test',
    treatment: { kind: 'retune-length', segmentIndex: 0, deltaLengthM: 0.13 }, description: "Change segment 0's length by 130 mm",
    before: { valueHz: 115.8, distanceHz: 0.1, windowHz: 3.5 }, after: { valueHz: 111, distanceHz: 4.7, windowHz: 3.3 }, clears: true,
    planChange: { kind: 'length-override', segmentId: 'main', lengthM: 3.13 },
  };

  it('adds a chosen treatment to the list and applies its length change to the segment; removing it puts the old length back', () => {
    const before = roomPlanDocument();
    const { doc } = performCommand('add-treatment', before, state, { treatment: chosen }, sequentialIds('t'));
    expect(doc.treatments).toHaveLength(1);
    expect(doc.treatments?.[0]).toMatchObject({ id: 't1', clears: true });
    expect(doc.segments.find((segment) => segment.id === 'main')?.lengthOverrideM).toBe(3.13);
    expect(parsePlanDocument(doc).ok).toBe(true);
    const removed = performCommand('remove-treatment', doc, state, { treatmentId: 't1' });
    expect(removed.doc.treatments).toHaveLength(0);
    expect(removed.doc.segments.find((segment) => segment.id === 'main')?.lengthOverrideM ?? null).toBe(before.segments.find((segment) => segment.id === 'main')?.lengthOverrideM ?? null);
  });

  it('refuses to remove a treatment whose element was edited since, and removes it from the list only when asked', () => {
    const { doc } = performCommand('add-treatment', roomPlanDocument(), state, { treatment: chosen }, sequentialIds('t'));
    const edited = performCommand('set-length-override', doc, state, { segmentIds: ['main'], lengthM: 4 });
    const refused = tryCommand('remove-treatment', edited.doc, state, { treatmentId: 't1' });
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.error.message).toMatch(/edited since/);
    const listOnly = performCommand('remove-treatment', edited.doc, state, { treatmentId: 't1', keepDrawing: true });
    expect(listOnly.doc.treatments).toHaveLength(0);
    expect(listOnly.doc.segments.find((segment) => segment.id === 'main')?.lengthOverrideM).toBe(4);
  });

  it('applies a lining or a termination change, and refuses a change to a segment that is gone', () => {
    const lined = performCommand('add-treatment', roomPlanDocument(), state, { treatment: { ...chosen, planChange: { kind: 'lining', segmentId: 'drop', lining: { thicknessM: 0.05, absorption: 0.7 } } } }, sequentialIds('t'));
    expect(lined.doc.segments.find((segment) => segment.id === 'drop')?.lining).toEqual({ thicknessM: 0.05, absorption: 0.7 });
    const ended = performCommand('add-treatment', roomPlanDocument(), state, { treatment: { ...chosen, planChange: { kind: 'termination', nodeId: 'outlet', termination: { kind: 'lined', absorption: 0.8 } } } }, sequentialIds('t'));
    expect(ended.doc.runs[0].terminations.outlet).toEqual({ kind: 'lined', absorption: 0.8 });
    const gone = tryCommand('add-treatment', roomPlanDocument(), state, { treatment: { ...chosen, planChange: { kind: 'length-override', segmentId: 'gone', lengthM: 2 } } });
    expect(gone.ok === false && gone.error.message).toMatch(/no longer on the plan/);
  });
});

describe('room document parts', () => {
  it('an older document with empty placeholder arrays and no treatments still parses (treatments default to none)', () => {
    const old = { schemaVersion: 1, nodes: [], segments: [], runs: [], rooms: [], outlets: [], listeners: [] };
    const parsed = parsePlanDocument(old);
    expect(parsed.ok && parsed.value.treatments).toEqual([]);
  });

  it('names a bad surface band and an outlet outside the room', () => {
    const doc = roomPlanDocument();
    const room = doc.rooms[0];
    const badBand = parsePlanDocument({ ...doc, rooms: [{ ...room, surfaces: { ...room.surfaces, floor: { finishId: null, absorption: [0.1, 0.1, 0.1] } } }] });
    expect(badBand.ok === false && badBand.errors.join()).toMatch(/rooms\[0\]\.surfaces\.floor\.absorption: needs 8 octave bands/);
    const outside = parsePlanDocument({ ...doc, rooms: [{ ...room, outlet: { ...room.outlet, xM: 13 } }] });
    expect(outside.ok === false && outside.errors.join()).toMatch(/rooms\[0\]\.outlet\.xM: must be inside the room/);
  });
});

describe('finish library', () => {
  it('every finish has 8 bands between 0 and 1 and says where its numbers come from', () => {
    for (const finish of FINISHES) {
      expect(finish.absorption).toHaveLength(8);
      for (const value of finish.absorption) expect(value >= 0 && value <= 1).toBe(true);
      // the values are written from memory (typical textbook-table values); the person is told plainly to check them
      expect(finish.source).toMatch(/^Typical values .*check them against the maker’s published data/);
    }
    expect(new Set(FINISHES.map((finish) => finish.id)).size).toBe(FINISHES.length);
  });
});
