// Submitting freezes a revision; an engineer checks each row or raises a query on it, checks every
// clear row in one step, and finishes by stamping an outcome with a note; the mails name the
// project and plan and carry the notes; later edits make a new draft and never appear accepted;
// roles are enforced. The outcomes are the ones stamped on returned submittals (common practice,
// no source); what each needs is the product's rule (lib/reviews/outcome.ts).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { stopJobQueue } from '@/lib/jobs/queue';
import { savePlanDocument, getPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { getRevisionByNumber, latestRevision } from '@/lib/revisions/data';
import { reviewRows } from '@/lib/revisions/rows';
import { call } from '../helpers/routes';
import { mailsTo } from '../helpers/inbox';
import { workWaitingJobs } from '../helpers/jobs';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { recitalPlan } from '../helpers/revisions';
import { POST as submit, GET as list } from '@/app/api/v1/plans/[planId]/revisions/route';
import { GET as read } from '@/app/api/v1/revisions/[revisionId]/route';
import { PUT as decide } from '@/app/api/v1/revisions/[revisionId]/decisions/route';
import { POST as checkClear } from '@/app/api/v1/revisions/[revisionId]/clear-rows/route';
import { POST as finish } from '@/app/api/v1/revisions/[revisionId]/review/route';

const PROJECT = 'Marrowgate review test';
const PLAN = 'Level 1 recital supply';
let t: TestTeam;
let planId: string;

beforeAll(async () => {
  t = await createTestTeam('review');
  const project = await createProject(t.team.id, t.members.acoustician.id, { name: PROJECT, site: '' });
  planId = await recitalPlan(t, project.id, PLAN);
});
afterAll(async () => { await stopJobQueue(); await sequelize.close(); });

async function submitAs(role: 'acoustician' | 'engineer', note = 'First look: the riser is new') {
  return call(submit, 'POST', `/api/v1/plans/${planId}/revisions`, { cookie: await t.cookieFor(role), params: { planId }, body: { note } });
}

describe('revisions and review', () => {
  it('freezes a revision and mails the reviewers the project, plan and the acoustician’s note', async () => {
    expect((await submitAs('engineer')).status).toBe(403);
    const answer = await submitAs('acoustician');
    expect(answer.status).toBe(201);
    const revision = await getRevisionByNumber(t.team.id, planId, 1);
    expect(revision.state).toBe('waiting');
    await workWaitingJobs();
    const mail = (await mailsTo(t.members.engineer.email)).at(-1);
    expect(mail?.subject).toBe(`Review requested: ${PROJECT}: ${PLAN}, revision 1`);
    expect(mail?.text).toContain('First look: the riser is new');
    expect(mail?.text).toContain(`/plans/${planId}/revisions/1`);
  });

  it('checks every clear row in one step and leaves rows near a fan tone and risk flags to the engineer', async () => {
    const first = await getRevisionByNumber(t.team.id, planId, 1);
    const rows = reviewRows(first.analysis, first.extras);
    const atRisk = rows.filter((row) => row.atRisk);
    // The demo fan: 10 blades at 605 rpm, blade pass 100.8 Hz on the run's 100.8 Hz resonance (lib/plans/demo).
    expect(atRisk.length).toBeGreaterThan(0);
    const engineer = await t.cookieFor('engineer');
    const params = { revisionId: first.id };
    const viewer = await call(decide, 'PUT', '/x', { cookie: await t.cookieFor('viewer'), params, body: { target: rows[0].target, decision: 'checked' } });
    expect(viewer.status).toBe(403);
    const noText = await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: atRisk[0].target, decision: 'query' } });
    expect(noText.status).toBe(400);
    expect(noText.body).toMatchObject({ error: { field: 'note' } });
    const query = await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: atRisk[0].target, decision: 'query', note: 'Sits on the blade-pass tone: retune the riser' } });
    expect(query.status).toBe(200);

    const bulk = await call(checkClear, 'POST', '/x', { cookie: engineer, params, body: {} });
    expect(bulk.status).toBe(200);
    expect(bulk.body).toMatchObject({ checked: rows.length - atRisk.length, tally: { checked: rows.length - atRisk.length, queries: 1, unchecked: atRisk.length - 1, clear: 0 } });
    const again = await call(checkClear, 'POST', '/x', { cookie: engineer, params, body: {} });
    expect(again.body).toMatchObject({ checked: 0 });
    const readBack = await call(read, 'GET', '/x', { cookie: await t.cookieFor('viewer'), params });
    const marks = new Map((readBack.body as { decisions: { target: string; decision: string }[] }).decisions.map((mark) => [mark.target, mark.decision]));
    for (const row of atRisk.slice(1)) expect(marks.has(row.target), `${row.label} was checked in bulk`).toBe(false);
    expect(readBack.body).toMatchObject({ queries: [{ row: expect.stringContaining(atRisk[0].label), note: 'Sits on the blade-pass tone: retune the riser' }] });
  });

  it('refuses an outcome the review does not support, then returns the revision with the note and the query in the mail', async () => {
    const first = await getRevisionByNumber(t.team.id, planId, 1);
    const engineer = await t.cookieFor('engineer');
    const params = { revisionId: first.id };
    const accept = await call(finish, 'POST', '/x', { cookie: engineer, params, body: { outcome: 'accepted', note: '' } });
    expect(accept.status).toBe(400);
    expect(accept.body).toMatchObject({ error: { field: 'outcome', message: expect.stringContaining('not checked yet') } });
    const reject = await call(finish, 'POST', '/x', { cookie: engineer, params, body: { outcome: 'rejected' } });
    expect(reject.body).toMatchObject({ error: { field: 'note' } });
    const unknown = await call(finish, 'POST', '/x', { cookie: engineer, params, body: { outcome: 'approve' } });
    expect(unknown.body).toMatchObject({ error: { field: 'outcome' } });

    const note = 'Retune the riser before anything is ordered.\nThe branch to the green room looks fine.';
    const done = await call(finish, 'POST', '/x', { cookie: engineer, params, body: { outcome: 'revise_resubmit', note } });
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ revision: { state: 'revise_resubmit', reviewNote: note }, tally: { queries: 1 } });
    const late = await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: reviewRows(first.analysis, first.extras)[0].target, decision: 'checked' } });
    expect(late.status).toBe(409);

    await workWaitingJobs();
    const mail = (await mailsTo(t.members.acoustician.email)).at(-1);
    expect(mail?.subject).toBe(`Review finished: ${PROJECT}: ${PLAN}, revision 1, revise and resubmit`);
    expect(mail?.text).toContain('Outcome: Revise and resubmit.');
    expect(mail?.text).toContain('  Retune the riser before anything is ordered.\n  The branch to the green room looks fine.');
    expect(mail?.text).toContain(': Sits on the blade-pass tone: retune the riser');
  });

  it('accepts a later revision once every row is checked, and a later save makes the plan a draft again', async () => {
    const plan = await getPlan(t.team.id, planId);
    const retuned = { ...plan.document, runs: plan.document.runs.map((run) => ({ ...run, fan: run.fan && { ...run.fan, rpm: 450 } })) };
    await savePlanDocument(t.team.id, t.members.acoustician.id, planId, { version: plan.version, metresPerPixel: plan.metresPerPixel, document: retuned });
    expect((await submitAs('acoustician', 'Low speed')).status).toBe(201);
    expect((await getRevisionByNumber(t.team.id, planId, 1)).state).toBe('revise_resubmit');
    const second = await getRevisionByNumber(t.team.id, planId, 2);
    const engineer = await t.cookieFor('engineer');
    const params = { revisionId: second.id };
    await call(checkClear, 'POST', '/x', { cookie: engineer, params, body: {} });
    for (const row of reviewRows(second.analysis, second.extras).filter((candidate) => candidate.atRisk)) {
      expect((await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: row.target, decision: 'checked' } })).status).toBe(200);
    }
    const accepted = await call(finish, 'POST', '/x', { cookie: engineer, params, body: { outcome: 'accepted' } });
    expect(accepted.body).toMatchObject({ revision: { state: 'accepted', number: 2, reviewNote: '' } });
    const listed = await call(list, 'GET', '/x', { cookie: await t.cookieFor('viewer'), params: { planId } });
    expect(listed.body).toMatchObject({ revisions: [{ number: 2, state: 'accepted' }, { number: 1, state: 'revise_resubmit' }] });
    await workWaitingJobs();
    expect((await mailsTo(t.members.acoustician.email)).at(-1)?.subject).toBe(`Review finished: ${PROJECT}: ${PLAN}, revision 2, accepted`);

    const acceptedPlan = await getPlan(t.team.id, planId);
    expect((await latestRevision(t.team.id, planId))?.planVersion).toBe(acceptedPlan.version);
    await savePlanDocument(t.team.id, t.members.acoustician.id, planId, { version: acceptedPlan.version, metresPerPixel: acceptedPlan.metresPerPixel, document: acceptedPlan.document });
    const latest = await latestRevision(t.team.id, planId);
    expect(latest).toMatchObject({ number: 2, state: 'accepted' });
    expect(latest?.planVersion).not.toBe((await getPlan(t.team.id, planId)).version);
  });
});
