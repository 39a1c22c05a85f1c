import { describe, expect, it } from 'vitest';
import { performCommand, initialEditorState, sequentialIds } from '@/lib/plan';
import { planRisks } from '@/lib/plans/risks';
import { treatmentOptions } from '@/lib/plans/treatment-options';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan, demoRecitalPlanFirstOutletOnly } from '@/lib/plans/demo/recital-plan';
import { ROOM_PLAN_METRES_PER_PIXEL as mpp, roomPlanDocument } from './room-plan-fixture';

describe('risks across the plan (server, from the document)', () => {
  it('flags the resonance on the blade-pass tone of the run feeding the room, with room results for the charts', () => {
    const risks = planRisks(roomPlanDocument(), mpp);
    const tone = risks.flags.find((flag) => flag.subject === 'tone:h1');
    expect(tone).toMatchObject({ kind: 'resonance-near-tone', runId: 'supply', roomId: 'recital', roomName: 'Recital room' });
    expect(tone?.reason).toMatch(/blade-pass tone/);
    // graded by the dB the run adds at the tone (product rule: low from 3, medium from 6, high from 10 dB)
    const gainDb = tone?.quantity.gainDb ?? 0;
    expect(tone?.severity).toBe(gainDb >= 10 ? 'high' : gainDb >= 6 ? 'medium' : 'low');
    const [room] = risks.rooms;
    expect(room.problem).toBeNull();
    expect(room.analysis?.modes.length).toBeGreaterThan(10);
    expect(room.analysis?.images[0].order).toBe(0);
    // 8 blades x 868 rpm / 60 = 115.73 Hz (blade-pass frequency = blades x rev/s)
    expect(room.fanTonesHz[0]).toBeCloseTo(115.733, 3);
    expect(room.criterionDb).toHaveLength(8);
    expect(room.levels).toBeNull();
    // the rules the list states are the ones the flags used
    expect(risks).toMatchObject({ temperatureSwingC: 5, speedSlipPercent: 2, nearMaximumWavelengths: 0.125 });
  });

  it('without a fan there is no tone flag; a room fed by no run says what to do', () => {
    expect(planRisks(roomPlanDocument(null), mpp).flags.some((flag) => flag.kind === 'resonance-near-tone')).toBe(false);
    const doc = roomPlanDocument();
    const unfed = { ...doc, rooms: [{ ...doc.rooms[0], outlet: { ...doc.rooms[0].outlet, nodeId: null } }] };
    const risks = planRisks(unfed, mpp);
    expect(risks.rooms[0].problem).toMatch(/no run feeds it yet/);
    // the run still has a fan: its tone flags are listed against the run alone
    expect(risks.flags.find((flag) => flag.subject === 'tone:h1')).toMatchObject({ runId: 'supply', roomId: null });
  });

  it('predicts levels against the criterion when the outlet sound power is given', () => {
    const doc = roomPlanDocument();
    const loud = { ...doc, rooms: [{ ...doc.rooms[0], outletSoundPowerDb: [75, 72, 68, 64, 60, 56, 52, 48] }] };
    const [room] = planRisks(loud, mpp).rooms;
    expect(room.levels).toHaveLength(8);
    expect(room.levelsNc).not.toBeNull();
  });

  it('the retune option maps onto a length override that clears the tone flag on the next results', () => {
    const doc = roomPlanDocument();
    const tone = planRisks(doc, mpp).flags.find((flag) => flag.subject === 'tone:h1')!;
    const { options } = treatmentOptions(doc, mpp, { roomId: 'recital' }, tone.id);
    // The outlet is already open and flanged, so changing it to that is not offered; an absorbing fan end is, as it lowers the gain.
    expect(options.map((option) => option.treatment.kind)).toEqual(['retune-length', 'side-branch-resonator', 'line-segment', 'change-termination']);
    expect(options[3].treatment).toMatchObject({ end: 'start' });
    const retune = options[0];
    expect(retune.clears).toBe(true);
    expect(retune.planChange).toMatchObject({ kind: 'length-override', segmentId: 'main' });
    const chosen = performCommand('add-treatment', doc, initialEditorState(), {
      treatment: { runId: 'supply', roomId: 'recital', flagId: tone.id, flagKind: tone.kind, flagSubject: tone.subject, flagReason: tone.reason, treatment: retune.treatment, description: retune.description, before: retune.before, after: retune.after, clears: retune.clears, planChange: retune.planChange },
    }, sequentialIds('t')).doc;
    expect(planRisks(chosen, mpp).flags.some((flag) => flag.subject === 'tone:h1')).toBe(false);
  });

  it('an unknown flag is a conflict (the saved plan changed)', () => {
    expect(() => treatmentOptions(roomPlanDocument(), mpp, { roomId: 'recital' }, 'resonance-near-tone:h1:1.0')).toThrow(/no longer raised/);
  });

  it('the retune keeps every blade-pass harmonic clear across the envelope: it raises no tone flag elsewhere', () => {
    // The demo plan's run to its first outlet (invented): 10 blades at 450–605 rpm, harmonics 2 and 3 at twice and three
    // times the blade-pass frequency (f = n B rpm / 60, common practice, no source). The search weighs every harmonic.
    const doc = demoRecitalPlanFirstOutletOnly({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    const tone = planRisks(doc, DEMO_METRES_PER_PIXEL).flags.find((flag) => flag.kind === 'resonance-near-tone')!;
    expect(tone).toBeDefined();
    const { options } = treatmentOptions(doc, DEMO_METRES_PER_PIXEL, { roomId: tone.roomId ?? '' }, tone.id);
    for (const option of options) expect(option.raises.every((reason) => !reason.includes(tone.reason))).toBe(true);
    const retune = options.find((option) => option.treatment.kind === 'retune-length');
    if (retune) {
      expect(retune.raises.some((reason) => /blade-pass/.test(reason))).toBe(false);
      expect(Math.abs(retune.treatment.kind === 'retune-length' ? retune.treatment.deltaLengthM ?? 0 : 0)).toBeGreaterThanOrEqual(0.025);
    }
  });
});
