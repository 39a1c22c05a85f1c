// The demo's recital-room plan as an accepted second revision with one chosen treatment, and its
// treatment schedule's content: fixed ids, names and dates, so its render is the same every time
// (the committed reference image of page 1 is drawn from it). Every name and number is invented.
import { initialEditorState, performCommand, sequentialIds, type PlanDocument } from '@/lib/plan';
import { computePlanAnalysis } from '@/lib/plans/analysis/compute';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, DEMO_PLAN_NAME, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { treatmentOptionsFromAnalysis } from '@/lib/plans/treatment-options';
import { freezeExtras } from '@/lib/revisions/freeze-extras';
import type { RevisionSummary, RevisionView } from '@/lib/revisions/types';
import { scheduleContent, type ScheduleContent, type SchedulePractice } from '@/lib/schedules/content';

export const DEMO_SCHEDULE_DATE = new Date('2026-12-07T09:00:00Z');
export const DEMO_PRACTICE_NAME = 'Fernhollow Acoustics';
const PLAN_ID = '5f1c2a7e-0000-4000-8000-00000000a001';
const TEAM_ID = '5f1c2a7e-0000-4000-8000-00000000a002';

/** The demo plan with the lining offered for its first level flag chosen (a treatment drawn on a segment). */
export function demoTreatedPlan(): PlanDocument {
  const doc = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
  const analysis = computePlanAnalysis(doc, DEMO_METRES_PER_PIXEL);
  const flag = analysis.risks.flags.find((candidate) => candidate.kind === 'level-above-criterion');
  if (!flag) return doc;
  const { options } = treatmentOptionsFromAnalysis(doc, DEMO_METRES_PER_PIXEL, analysis, { roomId: flag.roomId ?? '' }, flag.id);
  const option = options.find((candidate) => candidate.planChange !== null);
  if (!option) return doc;
  return performCommand('add-treatment', doc, initialEditorState(), {
    treatment: {
      runId: flag.runId ?? '', roomId: flag.roomId, flagId: flag.id, flagKind: flag.kind, flagSubject: flag.subject, flagReason: flag.reason,
      treatment: option.treatment, description: option.description, before: option.before, after: option.after, clears: option.clears, planChange: option.planChange,
    },
  }, sequentialIds('demo-treatment')).doc;
}

function summary(number: number, state: RevisionSummary['state'], createdAt: string, reviewNote: string): RevisionSummary {
  return {
    id: `5f1c2a7e-0000-4000-8000-00000000b00${number}`, planId: PLAN_ID, number, planVersion: number * 3, contentHash: null, state,
    note: '', submittedByName: 'Tomasz Reyne', reviewedByName: 'Priya Castellane', reviewedAt: createdAt, reviewNote, createdAt,
  };
}

/** Revision 1 sent back, revision 2 (the one printed) accepted with a note. */
export const DEMO_HISTORY: RevisionSummary[] = [
  summary(1, 'revise_resubmit', '2026-11-24T10:00:00Z', 'The 100.8 Hz resonance sits on the blade-pass tone at high speed; treat it or show it is inaudible in the recital room.'),
  summary(2, 'accepted_with_notes', '2026-12-04T15:30:00Z', 'Accepted. Confirm the liner’s fire rating with the duct contractor before ordering.'),
];

export function demoRevision(): RevisionView {
  const document = demoTreatedPlan();
  const analysis = computePlanAnalysis(document, DEMO_METRES_PER_PIXEL);
  return {
    ...DEMO_HISTORY[1], teamId: TEAM_ID, planName: DEMO_PLAN_NAME, project: { id: '5f1c2a7e-0000-4000-8000-00000000a003', name: 'Marrowgate Arts Centre' },
    metresPerPixel: DEMO_METRES_PER_PIXEL, document, analysis: analysis.runs, extras: freezeExtras(document, analysis), background: null,
  };
}

export function demoScheduleContent(practice: SchedulePractice = { name: DEMO_PRACTICE_NAME, logo: null }): ScheduleContent {
  return scheduleContent({ revision: demoRevision(), decisions: [], image: null, issuedBy: 'Tomasz Reyne', date: DEMO_SCHEDULE_DATE, practice, history: DEMO_HISTORY });
}
