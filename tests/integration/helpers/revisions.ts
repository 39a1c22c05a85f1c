// A plan with duct runs submitted as a revision, a comment on it and an issued schedule:
// fixtures for the review, comment and schedule tests.
import { benchDocument } from '../../../bench/schedule/plan';
import { createComment } from '@/lib/comments/data';
import { createPlan, savePlanDocument } from '@/lib/plans/data';
import { DEMO_FAN_BLADES, DEMO_FAN_SPEEDS_RPM, DEMO_METRES_PER_PIXEL, demoRecitalPlan } from '@/lib/plans/demo/recital-plan';
import { submitRevision } from '@/lib/revisions/data';
import type { RevisionSummary } from '@/lib/revisions/types';
import { issueSchedule, renderAskedSchedule } from '@/lib/schedules/data';
import type { TestTeam } from './people';

export const TEST_METRES_PER_PIXEL = 0.005;

export async function planWithRuns(testTeam: TestTeam, projectId: string, runs = 2, name = 'Level 2 supply'): Promise<string> {
  const acoustician = testTeam.members.acoustician;
  const plan = await createPlan(testTeam.team.id, acoustician.id, projectId, name);
  await savePlanDocument(testTeam.team.id, acoustician.id, plan.id, { version: plan.version, metresPerPixel: TEST_METRES_PER_PIXEL, document: benchDocument(runs, 3) });
  return plan.id;
}

// The demo's recital-room plan (one run, one room), saved: the plan's id.
export async function recitalPlan(testTeam: TestTeam, projectId: string, name: string): Promise<string> {
  const acoustician = testTeam.members.acoustician;
  const plan = await createPlan(testTeam.team.id, acoustician.id, projectId, name);
  const document = demoRecitalPlan({ blades: DEMO_FAN_BLADES, rpm: DEMO_FAN_SPEEDS_RPM.high });
  await savePlanDocument(testTeam.team.id, acoustician.id, plan.id, { version: plan.version, metresPerPixel: DEMO_METRES_PER_PIXEL, document });
  return plan.id;
}

export async function submitted(testTeam: TestTeam, planId: string): Promise<RevisionSummary> {
  const acoustician = testTeam.members.acoustician;
  return submitRevision(testTeam.team.id, { id: acoustician.id, name: acoustician.name }, planId, '');
}

export async function reviewFixtures(testTeam: TestTeam, projectId: string): Promise<{ revisionId: string; commentId: string; scheduleId: string }> {
  const acoustician = testTeam.members.acoustician;
  const who = { id: acoustician.id, name: acoustician.name };
  const planId = await planWithRuns(testTeam, projectId, 1, 'Walk reviewed plan');
  const revision = await submitted(testTeam, planId);
  const created = await createComment(testTeam.team.id, who, { planId, revisionId: revision.id, parentId: null, xPx: 10, yPx: 20, target: null, body: 'Walk comment' });
  const schedule = await issueSchedule(testTeam.team.id, who, revision.id);
  await renderAskedSchedule(testTeam.team.id, schedule.id); // the render-schedule job's work
  return { revisionId: revision.id, commentId: created.comment.id, scheduleId: schedule.id };
}
