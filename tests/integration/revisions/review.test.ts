// Submitting freezes a revision; an engineer settles each row; the outcome follows the rows;
// later edits make a new draft and never appear approved; roles are enforced.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { savePlanDocument, getPlan } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { getRevisionByNumber, latestRevision } from '@/lib/revisions/data';
import { reviewRows } from '@/lib/revisions/rows';
import { call } from '../helpers/routes';
import { mailsTo } from '../helpers/inbox';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { planWithRuns, TEST_METRES_PER_PIXEL } from '../helpers/revisions';
import { POST as submit, GET as list } from '@/app/api/v1/plans/[planId]/revisions/route';
import { PUT as decide } from '@/app/api/v1/revisions/[revisionId]/decisions/route';
import { POST as finish } from '@/app/api/v1/revisions/[revisionId]/review/route';

let t: TestTeam;
let planId: string;

beforeAll(async () => {
  t = await createTestTeam('review');
  const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Review project', site: '' });
  planId = await planWithRuns(t, project.id, 1);
});
afterAll(async () => { await sequelize.close(); });

async function submitAs(role: 'acoustician' | 'engineer') {
  return call(submit, 'POST', `/api/v1/plans/${planId}/revisions`, { cookie: await t.cookieFor(role), params: { planId }, body: { note: 'First look' } });
}

describe('revisions and review', () => {
  it('freezes a revision, mails the reviewers, and refuses roles that may not submit', async () => {
    expect((await submitAs('engineer')).status).toBe(403);
    const answer = await submitAs('acoustician');
    expect(answer.status).toBe(201);
    const revision = await getRevisionByNumber(t.team.id, planId, 1);
    expect(revision.state).toBe('waiting');
    expect(revision.analysis[0].analysis?.resonances.length).toBeGreaterThan(0);
    const mails = await mailsTo(t.members.engineer.email);
    expect(mails.at(-1)?.subject).toContain('Review requested');
    expect(mails.at(-1)?.text).toContain(`/plans/${planId}/revisions/1`);
  });

  it('returns the revision when a row is flagged, and approves a later one when every row is accepted', async () => {
    const first = await getRevisionByNumber(t.team.id, planId, 1);
    const rows = reviewRows(first.analysis, first.extras);
    const engineer = await t.cookieFor('engineer');
    const params = { revisionId: first.id };
    const viewer = await call(decide, 'PUT', `/api/v1/revisions/${first.id}/decisions`, { cookie: await t.cookieFor('viewer'), params, body: { target: rows[0].target, decision: 'accepted' } });
    expect(viewer.status).toBe(403);
    const noNote = await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: rows[0].target, decision: 'flagged' } });
    expect(noNote.status).toBe(400);
    const flagged = await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: rows[0].target, decision: 'flagged', note: 'Sits on the blade-pass tone' } });
    expect(flagged.status).toBe(200);
    const done = await call(finish, 'POST', '/x', { cookie: engineer, params, body: {} });
    expect(done.body).toMatchObject({ revision: { state: 'returned' }, tally: { flagged: 1 } });
    const again = await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: rows[0].target, decision: 'accepted' } });
    expect(again.status).toBe(409);
    expect((await mailsTo(t.members.acoustician.email)).at(-1)?.subject).toContain('Review finished');

    // An edit after the review makes a new draft; revision 1 stays as it was.
    const plan = await getPlan(t.team.id, planId);
    const moved = { ...plan.document, nodes: plan.document.nodes.map((node, index) => (index === plan.document.nodes.length - 1 ? { ...node, x: node.x + 200 } : node)) };
    await savePlanDocument(t.team.id, t.members.acoustician.id, planId, { version: plan.version, metresPerPixel: TEST_METRES_PER_PIXEL, document: moved });
    expect((await submitAs('acoustician')).status).toBe(201);
    const second = await getRevisionByNumber(t.team.id, planId, 2);
    expect(second.analysis[0].analysis?.lengthM).not.toBe(first.analysis[0].analysis?.lengthM);
    expect((await getRevisionByNumber(t.team.id, planId, 1)).state).toBe('returned');
    for (const row of reviewRows(second.analysis, second.extras)) {
      const answer = await call(decide, 'PUT', '/x', { cookie: engineer, params: { revisionId: second.id }, body: { target: row.target, decision: 'accepted' } });
      expect(answer.status).toBe(200);
    }
    const approved = await call(finish, 'POST', '/x', { cookie: engineer, params: { revisionId: second.id }, body: {} });
    expect(approved.body).toMatchObject({ revision: { state: 'approved', number: 2 } });
    const listed = await call(list, 'GET', '/x', { cookie: await t.cookieFor('viewer'), params: { planId } });
    expect(listed.body).toMatchObject({ revisions: [{ number: 2, state: 'approved' }, { number: 1, state: 'returned' }] });

    // The approval belongs to revision 2 only: the next save makes the drawing a draft again.
    const approvedPlan = await getPlan(t.team.id, planId);
    expect((await latestRevision(t.team.id, planId))?.planVersion).toBe(approvedPlan.version);
    await savePlanDocument(t.team.id, t.members.acoustician.id, planId, { version: approvedPlan.version, metresPerPixel: TEST_METRES_PER_PIXEL, document: approvedPlan.document });
    const latest = await latestRevision(t.team.id, planId);
    expect(latest).toMatchObject({ number: 2, state: 'approved' });
    expect(latest?.planVersion).not.toBe((await getPlan(t.team.id, planId)).version);
  });
});
