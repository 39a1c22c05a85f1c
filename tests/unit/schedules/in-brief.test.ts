// The first page's plain verdict per room: a predicted NC against the room's criterion NC
// (ANSI S12.2: a room meets an NC criterion when its rating is at or below it).
import { describe, expect, it } from 'vitest';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { computePlanAnalysis } from '@/lib/plans/analysis/compute';
import type { NoiseTables } from '@/lib/plans/noise-path/path-tables';
import { freezeExtras } from '@/lib/revisions/freeze-extras';
import type { RoomRow } from '@/lib/revisions/types';
import { roomVerdicts, treatmentsInBrief } from '@/lib/schedules/in-brief';

function roomWith(listeners: { name: string; nc: number }[], criterionNc: number): RoomRow {
  const noise = {
    criterionNc, worstListenerId: listeners[0].name, outlets: [], warnings: [], bandsBelowSchroederHz: [], schroederHz: 80, correction: 'furnished',
    listeners: listeners.map((listener) => ({ listenerId: listener.name, name: listener.name, nc: listener.nc, nr: 0, dba: 0, governingHz: 125, rows: [] })),
  } as unknown as NoiseTables;
  return { id: 'r', name: 'Room 1.04', problem: null, summary: '', noise };
}

describe('in brief', () => {
  const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });

  it('says plainly that a room predicted at NC 30 does not meet NC 25', () => {
    const [verdict] = roomVerdicts([roomWith([{ name: 'L1', nc: 30 }], 25)], document);
    expect(verdict).toEqual({ room: 'Room 1.04', meets: false, text: 'Room 1.04: NC 30 predicted at L1 against NC 25 — does not meet its criterion, by 5.' });
  });

  it('a room at its criterion meets it, with nothing to spare', () => {
    expect(roomVerdicts([roomWith([{ name: 'L1', nc: 25 }, { name: 'L2', nc: 22 }], 25)], document)[0]).toMatchObject({ meets: true, text: expect.stringContaining('at L1, the worst of 2 listeners against NC 25 — meets its criterion, with nothing to spare') });
  });

  it('a room without a prediction is not judged, and says why', () => {
    const [verdict] = roomVerdicts([{ id: 'r', name: 'Store', problem: 'No run feeds it yet.', summary: '', noise: null }], document);
    expect(verdict).toEqual({ room: 'Store', meets: null, text: 'Store: no level predicted (No run feeds it yet), so it is not judged against its criterion.' });
  });

  it('judges the demo recital room by its worst listener against its NC 20 criterion', () => {
    const analysis = computePlanAnalysis(document, DEMO_METRES_PER_PIXEL);
    const rows = freezeExtras(document, analysis).rooms!;
    const worst = analysis.risks.rooms[0].noise!.listeners.reduce((a, b) => (b.nc > a.nc ? b : a));
    const [verdict] = roomVerdicts(rows, document);
    expect(verdict.meets).toBe(worst.nc <= 20);
    expect(verdict.text).toContain(`NC ${worst.nc} predicted`);
    expect(verdict.text).toContain('against NC 20');
  });

  it('counts the chosen treatments and whether they clear their flags', () => {
    expect(treatmentsInBrief([])).toBe('No treatments are chosen in this revision.');
    const row = { id: 't', riskId: null, kind: 'line-segment', label: 'Line A2', before: '', after: '', clears: true };
    expect(treatmentsInBrief([row, { ...row, id: 'u', clears: false }])).toContain('2 treatments chosen (marked T1–T2 on the plan); 1 of 2 clear their flags');
  });
});
