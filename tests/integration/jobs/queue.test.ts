// Background jobs on PostgreSQL (pg-boss): a treatment schedule asked for in a request is rendered
// by the worker, once even when its job runs twice; a job that fails its last try leaves the
// schedule saying so and what to do; a saved plan is analysed ahead, its flags' candidates stored.
// (Idempotent, retried background jobs: common practice, no source.)
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeComputePool } from '@/lib/compute/pool';
import { sequelize } from '@/lib/db';
import { workAllQueues } from '@/lib/jobs/handlers';
import type { JobData } from '@/lib/jobs/names';
import { jobQueue, sendJob, stopJobQueue } from '@/lib/jobs/queue';
import { renderScheduleJob } from '@/lib/jobs/render-schedule';
import { contentHash } from '@/lib/plans/analysis';
import { getPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { issueSchedule } from '@/lib/schedules/data';
import { PlanActivity, PlanAnalysisRow, Schedule } from '@/models';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { recitalPlan, submitted } from '../helpers/revisions';
import { until } from '../helpers/until';

let t: TestTeam;
let projectId: string;

beforeAll(async () => {
  t = await createTestTeam('jobs');
  projectId = (await createProject(t.team.id, t.members.acoustician.id, { name: 'Queued project', site: '' })).id;
  // this test's process works the queue, as the job worker does
  await workAllQueues(await jobQueue('worker'), 0.5);
});
afterAll(async () => { await stopJobQueue(); await closeComputePool(); await sequelize.close(); });

const issuedEntries = (planId: string) => PlanActivity.count({ where: { teamId: t.team.id, planId, kind: 'schedule.issued' } });

describe('background jobs', () => {
  it('renders an asked-for schedule once, even when its job runs twice', async () => {
    const planId = await recitalPlan(t, projectId, 'Queued schedule plan');
    const revision = await submitted(t, planId);
    const who = { id: t.members.acoustician.id, name: t.members.acoustician.name };
    const asked = await issueSchedule(t.team.id, who, revision.id);
    expect(asked.status).toBe('rendering');
    const issued = await until('the schedule being issued', async () => {
      const row = await Schedule.findByPk(asked.id);
      return row?.status === 'issued' ? row : null;
    });
    expect(issued.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(await issuedEntries(planId)).toBe(1);

    // the same job again (a retry after a lost acknowledgement): nothing changes
    const again = await sendJob('render-schedule', { scheduleId: asked.id, teamId: t.team.id });
    const boss = await jobQueue();
    await until('the repeated job finishing', async () => (await boss.getJobById('render-schedule', again!))?.state === 'completed');
    const after = await Schedule.findByPk(asked.id);
    expect(after?.sha256).toBe(issued.sha256);
    expect(after?.storageKey).toBe(issued.storageKey);
    expect(await issuedEntries(planId)).toBe(1);
  });

  it('marks a schedule failed, saying what to do, when its last try fails', async () => {
    const planId = await recitalPlan(t, projectId, 'Failing schedule plan');
    const revision = await submitted(t, planId);
    const row = await Schedule.create({ teamId: t.team.id, revisionId: revision.id, status: 'rendering', issuedById: null, issuedByName: 'Test', createdAt: new Date() });
    const bucket = process.env.S3_BUCKET;
    process.env.S3_BUCKET = 'antinode-no-such-bucket'; // the store refuses the file
    try {
      const lastTry = { data: { scheduleId: row.id, teamId: t.team.id }, retryCount: 3, retryLimit: 3 } as PgBoss.JobWithMetadata<JobData['render-schedule']>;
      const earlierTry = { ...lastTry, retryCount: 1 };
      await expect(renderScheduleJob(earlierTry)).rejects.toThrow();
      expect((await Schedule.findByPk(row.id))?.status).toBe('rendering'); // still to be tried again
      await expect(renderScheduleJob(lastTry)).rejects.toThrow();
    } finally {
      process.env.S3_BUCKET = bucket;
    }
    const failed = await Schedule.findByPk(row.id);
    expect(failed?.status).toBe('failed');
    expect(failed?.failure).toMatch(/could not be rendered .* Issue it again; if it fails again, tell your team admin\./);
  });

  it('analyses a saved plan ahead and stores its flags’ candidate treatments', async () => {
    const planId = await recitalPlan(t, projectId, 'Analysed ahead plan'); // saving queues the job
    const plan = await getPlan(t.team.id, planId);
    const hash = contentHash(plan.document, plan.metresPerPixel);
    const row = await until('the analysis and its candidates being stored', async () => {
      const stored = await PlanAnalysisRow.findOne({ where: { planId, contentHash: hash } });
      return stored && Object.keys(stored.candidates as object).length > 0 ? stored : null;
    });
    const flags = (row.analysis as { risks: { flags: unknown[] } }).risks.flags;
    expect(flags.length).toBeGreaterThan(0);
    expect(Object.keys(row.candidates as object).length).toBeGreaterThan(0);
  });
});
