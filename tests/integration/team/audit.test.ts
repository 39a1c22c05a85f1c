import { afterAll, describe, expect, it } from 'vitest';
import { GET as exportCsv } from '@/app/api/v1/team/audit/export/route';
import { GET as listAudit } from '@/app/api/v1/team/audit/route';
import { PUT as decide } from '@/app/api/v1/revisions/[revisionId]/decisions/route';
import { POST as checkClear } from '@/app/api/v1/revisions/[revisionId]/clear-rows/route';
import { POST as finish } from '@/app/api/v1/revisions/[revisionId]/review/route';
import { PATCH as patchPlan } from '@/app/api/v1/plans/[planId]/route';
import { POST as signInRoute } from '@/app/api/v1/sessions/route';
import { listAuditPeople } from '@/lib/audit/data';
import { recordAudit } from '@/lib/audit/record';
import { sequelize } from '@/lib/db';
import type { PlanTreatment } from '@/lib/plan';
import { getPlan, savePlanDocument, setPlanBackground } from '@/lib/plans/data';
import { createProject } from '@/lib/projects/data';
import { getRevisionById } from '@/lib/revisions/data';
import { reviewRows } from '@/lib/revisions/rows';
import { issueSchedule, renderAskedSchedule } from '@/lib/schedules/data';
import { storePlanBackground } from '@/lib/uploads/data';
import { AuditEvent } from '@/models';
import { tinyPng } from '../helpers/files';
import { createTestTeam, TEST_PASSWORD } from '../helpers/people';
import { recitalPlan, submitted } from '../helpers/revisions';
import { call } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });

describe('audit log', () => {
  it('filters by area (the older name of the kind filter) and exports CSV with formulas neutralised', async () => {
    const { team, members, cookieFor } = await createTestTeam('audit');
    const actor = { id: members.admin.id, name: members.admin.name };
    await recordAudit({ teamId: team.id, actor, action: 'member.removed', subject: '=cmd|calc' });
    await recordAudit({ teamId: team.id, actor: null, action: 'billing.payment_failed', subject: 'Invoice in_1, €29.00' });
    const cookie = await cookieFor('admin');

    const billingOnly = await call(listAudit, 'GET', '/api/v1/team/audit?area=billing', { cookie });
    expect(billingOnly.body).toEqual({ events: [expect.objectContaining({ actorName: 'Payment service', actionLabel: 'Payment failed' })] });

    const csv = await call(exportCsv, 'GET', '/api/v1/team/audit/export?area=member', { cookie });
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toBe('text/csv; charset=utf-8');
    expect(csv.body).toContain(`${members.admin.name},Member removed,'=cmd|calc`);
    expect(csv.body).not.toContain('Payment failed');
  });

  it('names a malformed date filter', async () => {
    const { cookieFor } = await createTestTeam('audit-bad');
    const answer = await call(listAudit, 'GET', '/api/v1/team/audit?from=yesterday', { cookie: await cookieFor('admin') });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'from' } });
  });
});

describe('audit log of the team’s work', () => {
  it('records sign-ins, projects and plans, revisions, reviews, treatments and schedules, and filters by kind, person and dates', async () => {
    const t = await createTestTeam('audit-work');
    const { team, members } = t;
    const acoustician = { id: members.acoustician.id, name: members.acoustician.name };
    const admin = await t.cookieFor('admin');

    const signedIn = await call(signInRoute, 'POST', '/api/v1/sessions', { body: { email: members.engineer.email, password: TEST_PASSWORD } });
    expect(signedIn.status).toBe(201);
    const project = await createProject(team.id, acoustician.id, { name: 'Audit hall', site: '' });
    const planId = await recitalPlan(t, project.id, 'Audit supply');
    await call(patchPlan, 'PATCH', '/x', { cookie: await t.cookieFor('acoustician'), params: { planId }, body: { detailsVersion: 1, name: 'Audit supply, level 1' } });
    const upload = await storePlanBackground(team.id, acoustician.id, 'level-1.png', tinyPng(40, 30));
    await setPlanBackground(team.id, acoustician, planId, upload.id);
    const plan = await getPlan(team.id, planId);
    const chosen = { ...plan.document, treatments: [{ ...AUDIT_TREATMENT, runId: plan.document.runs[0].id }] };
    const saved = await savePlanDocument(team.id, acoustician.id, planId, { version: plan.version, metresPerPixel: 0.025, document: chosen });
    await savePlanDocument(team.id, acoustician.id, planId, { version: saved.version, metresPerPixel: 0.025, document: { ...chosen, treatments: [] } });

    const revision = await submitted(t, planId);
    const frozen = await getRevisionById(team.id, revision.id);
    const atRisk = reviewRows(frozen.analysis, frozen.extras).find((row) => row.atRisk)!;
    const engineer = await t.cookieFor('engineer');
    const params = { revisionId: revision.id };
    await call(decide, 'PUT', '/x', { cookie: engineer, params, body: { target: atRisk.target, decision: 'query', note: 'On the fan tone' } });
    await call(checkClear, 'POST', '/x', { cookie: engineer, params, body: {} });
    await call(finish, 'POST', '/x', { cookie: engineer, params, body: { outcome: 'revise_resubmit', note: 'Retune' } });
    const asked = await issueSchedule(team.id, acoustician, revision.id);
    await renderAskedSchedule(team.id, asked.id); // the render-schedule job's work: the schedule is issued when stored

    const all = await call(listAudit, 'GET', '/api/v1/team/audit', { cookie: admin });
    const actions = (all.body as { events: { action: string }[] }).events.map((event) => event.action);
    for (const action of [
      'session.signed_in', 'project.created', 'plan.created', 'plan.changed', 'plan.drawing_set', 'plan.scale_set', 'treatment.chosen', 'treatment.removed',
      'revision.submitted', 'review.query_raised', 'review.rows_checked', 'review.finished', 'schedule.issued',
    ]) expect(actions, `${action} is in the log`).toContain(action);

    const reviews = await call(listAudit, 'GET', '/api/v1/team/audit?kind=review', { cookie: admin });
    const reviewLines = (reviews.body as { events: { action: string; actorName: string; subject: string }[] }).events;
    expect(reviewLines.map((line) => line.action).sort()).toEqual(['review.finished', 'review.query_raised', 'review.rows_checked']);
    expect(reviewLines.find((line) => line.action === 'review.finished')?.subject).toContain('revise and resubmit');

    const finished = await call(listAudit, 'GET', '/api/v1/team/audit?kind=review.finished', { cookie: admin });
    expect((finished.body as { events: unknown[] }).events).toEqual([expect.objectContaining({ action: 'review.finished', actionLabel: 'Review finished', actorName: members.engineer.name })]);

    const byEngineer = await call(listAudit, 'GET', `/api/v1/team/audit?person=${members.engineer.id}`, { cookie: admin });
    const engineerLines = (byEngineer.body as { events: { actorName: string; action: string }[] }).events;
    expect(new Set(engineerLines.map((line) => line.actorName))).toEqual(new Set([members.engineer.name]));
    expect(engineerLines.map((line) => line.action)).toContain('session.signed_in');

    // Dates: a line moved to 2026-03-02 is found by that day and not by the days either side.
    const old = await AuditEvent.findOne({ where: { teamId: team.id, action: 'project.created' } });
    await sequelize.query(`update audit_events set created_at = '2026-03-02T12:00:00Z' where id = :id`, { replacements: { id: old!.id } });
    const onTheDay = await call(listAudit, 'GET', '/api/v1/team/audit?from=2026-03-02&to=2026-03-02', { cookie: admin });
    expect((onTheDay.body as { events: { action: string }[] }).events.map((event) => event.action)).toEqual(['project.created']);
    const before = await call(listAudit, 'GET', '/api/v1/team/audit?to=2026-03-01', { cookie: admin });
    expect((before.body as { events: unknown[] }).events).toEqual([]);
    const after = await call(listAudit, 'GET', '/api/v1/team/audit?from=2026-03-03&kind=plan', { cookie: admin });
    expect((after.body as { events: { action: string }[] }).events.map((event) => event.action)).not.toContain('project.created');

    expect(await listAuditPeople(team.id)).toEqual(expect.arrayContaining([
      { value: members.engineer.id, name: members.engineer.name }, { value: members.acoustician.id, name: members.acoustician.name },
    ]));
  });

  it('names a kind or person that is not in the lists', async () => {
    const { cookieFor } = await createTestTeam('audit-bad-kind');
    const cookie = await cookieFor('admin');
    expect((await call(listAudit, 'GET', '/api/v1/team/audit?kind=review.approved', { cookie })).body).toMatchObject({ error: { code: 'bad_input', field: 'kind' } });
    expect((await call(listAudit, 'GET', '/api/v1/team/audit?person=somebody', { cookie })).body).toMatchObject({ error: { code: 'bad_input', field: 'person' } });
  });
});

const AUDIT_TREATMENT: PlanTreatment = {
  id: 'audit-t1', runId: '', roomId: null, flagId: 'resonance-near-tone:h1:100.8', flagKind: 'resonance-near-tone', flagSubject: 'tone:h1', flagReason: 'test',
  treatment: { kind: 'line-segment', segmentIndex: 0, thicknessM: 0.05, absorption: 0.7 }, description: 'Line A1 with 50 mm liner', before: {}, after: {}, clears: true, planChange: null,
};
