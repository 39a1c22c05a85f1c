import { describe, expect, it } from 'vitest';
import { parsePlanDocument } from '@/lib/plan';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { planRisks } from '@/lib/plans/risks';

const demo = () => demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });

describe('the demo recital-room plan (invented)', () => {
  it('parses, and over the fan\'s speed range its blade-pass tone meets a resonance of the round spiral run: a flag with its dB', () => {
    const doc = demo();
    expect(parsePlanDocument(doc).ok).toBe(true);
    const risks = planRisks(doc, DEMO_METRES_PER_PIXEL);
    expect(risks.rooms[0].problem).toBeNull();
    const tone = risks.flags.find((flag) => flag.subject === 'tone:h1');
    expect(tone).toMatchObject({ kind: 'resonance-near-tone', roomName: 'Recital room' });
    // severity by the dB the run adds (product rule: low from 3, medium from 6, high from 10 dB)
    const gainDb = tone?.quantity.gainDb ?? 0;
    expect(gainDb).toBeGreaterThanOrEqual(3);
    expect(tone?.severity).toBe(gainDb >= 10 ? 'high' : gainDb >= 6 ? 'medium' : 'low');
    expect(tone?.reason).toContain('fan 450–605 rpm');
    const schroederHz = risks.rooms[0].analysis?.schroederHz ?? 0;
    for (const flag of risks.flags.filter((candidate) => candidate.kind === 'resonance-near-room-mode')) expect(flag.targetHz).toBeLessThanOrEqual(schroederHz);
  });

  it('lining the riser and the corridor with 50 mm fibrous liner damps the run: no tone flag is left', () => {
    const doc = demo();
    const lined = { ...doc, segments: doc.segments.map((segment) => (segment.id === 'riser' || segment.id === 'corridor-main' ? { ...segment, lining: { thicknessM: 0.05 } } : segment)) };
    const risks = planRisks(lined, DEMO_METRES_PER_PIXEL);
    expect(risks.flags.filter((flag) => flag.kind === 'resonance-near-tone')).toEqual([]);
  });
});
