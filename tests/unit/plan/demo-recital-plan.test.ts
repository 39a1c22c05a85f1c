import { describe, expect, it } from 'vitest';
import { parsePlanDocument } from '@/lib/plan';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { planRisks } from '@/lib/plans/risks';

describe('the demo recital-room plan (invented)', () => {
  it('parses, and at high speed its blade-pass tone sits on a resonance of the run: a high flag', () => {
    const doc = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
    expect(parsePlanDocument(doc).ok).toBe(true);
    const risks = planRisks(doc, DEMO_METRES_PER_PIXEL);
    expect(risks.rooms[0].problem).toBeNull();
    expect(risks.flags.find((flag) => flag.subject === 'tone:h1')).toMatchObject({ severity: 'high', roomName: 'Recital room' });
  });

  it('at low speed the blade-pass tone itself is clear; room-mode flags stay below the Schroeder frequency', () => {
    const risks = planRisks(demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.low }), DEMO_METRES_PER_PIXEL);
    expect(risks.flags.some((flag) => flag.subject === 'tone:h1')).toBe(false);
    const schroederHz = risks.rooms[0].analysis?.schroederHz ?? 0;
    for (const flag of risks.flags.filter((candidate) => candidate.kind === 'resonance-near-room-mode')) expect(flag.targetHz).toBeLessThanOrEqual(schroederHz);
  });
});
