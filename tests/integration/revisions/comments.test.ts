// Comments: pinned on the plan or a row, answered, resolved and reopened; a mention mails the
// member (unless they turned it off); viewers may not write.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '@/lib/db';
import { stopJobQueue } from '@/lib/jobs/queue';
import { listPlanActivity } from '@/lib/activity/data';
import { setNotificationSetting } from '@/lib/notifications/settings';
import { createProject } from '@/lib/projects/data';
import { call } from '../helpers/routes';
import { mailsTo } from '../helpers/inbox';
import { workWaitingJobs } from '../helpers/jobs';
import { createTestTeam, type TestTeam } from '../helpers/people';
import { planWithRuns, submitted } from '../helpers/revisions';
import { GET as list, POST as write } from '@/app/api/v1/comments/route';
import { PATCH as resolve } from '@/app/api/v1/comments/[commentId]/route';

let t: TestTeam;
let planId: string;
let revisionId: string;

beforeAll(async () => {
  t = await createTestTeam('comments');
  const project = await createProject(t.team.id, t.members.acoustician.id, { name: 'Comment project', site: '' });
  planId = await planWithRuns(t, project.id, 1);
  revisionId = (await submitted(t, planId)).id;
});
afterAll(async () => { await stopJobQueue(); await sequelize.close(); });

describe('comments', () => {
  it('pins, answers, resolves, reopens, and mails mentions', async () => {
    const architect = await t.cookieFor('architect');
    const refused = await call(write, 'POST', '/x', { cookie: await t.cookieFor('viewer'), body: { planId, xPx: 1, yPx: 2, body: 'hello' } });
    expect(refused.status).toBe(403);
    const unplaced = await call(write, 'POST', '/x', { cookie: architect, body: { planId, body: 'nowhere' } });
    expect(unplaced.status).toBe(400);

    const body = `@${t.members.acoustician.name} can the riser move 300 mm east? cc @${t.members.engineer.email}`;
    const pinned = await call(write, 'POST', '/x', { cookie: architect, body: { planId, revisionId, xPx: 420.5, yPx: 1500, body } });
    expect(pinned.status).toBe(201);
    expect(pinned.body).toMatchObject({ mailed: 2 });
    const commentId = (pinned.body as { comment: { id: string } }).comment.id;
    await workWaitingJobs();
    const mail = (await mailsTo(t.members.acoustician.email)).at(-1);
    expect(mail?.subject).toContain('mentioned you');
    expect(mail?.text).toContain(`/plans/${planId}/revisions/1?comment=${commentId}`);

    await setNotificationSetting(t.members.engineer.id, { kind: 'mention', enabled: false });
    const muted = await call(write, 'POST', '/x', { cookie: architect, body: { planId, target: 'resonance:x:1', body: `@${t.members.engineer.name} this row?` } });
    expect(muted.body).toMatchObject({ mailed: 0 });

    const answer = await call(write, 'POST', '/x', { cookie: await t.cookieFor('acoustician'), body: { planId, parentId: commentId, body: 'Yes, drawn in revision 2.' } });
    expect(answer.status).toBe(201);
    expect((await call(resolve, 'PATCH', '/x', { cookie: architect, params: { commentId }, body: { resolved: true } })).body).toMatchObject({ comment: { resolved: true } });
    expect((await call(resolve, 'PATCH', '/x', { cookie: await t.cookieFor('viewer'), params: { commentId }, body: { resolved: false } })).status).toBe(403);
    expect((await call(resolve, 'PATCH', '/x', { cookie: architect, params: { commentId }, body: { resolved: false } })).body).toMatchObject({ comment: { resolved: false } });

    const threads = await call(list, 'GET', `/api/v1/comments?planId=${planId}&revisionId=${revisionId}`, { cookie: await t.cookieFor('viewer') });
    expect(threads.body).toMatchObject({ threads: [{ id: commentId, xPx: 420.5, answers: [{ body: 'Yes, drawn in revision 2.' }] }, { target: 'resonance:x:1' }] });
    const activity = await listPlanActivity(t.team.id, planId);
    expect(activity.map((line) => line.kind)).toEqual(['comment.reopened', 'comment.resolved', 'comment.answered', 'comment.added', 'comment.added', 'revision.submitted']);
  });
});
