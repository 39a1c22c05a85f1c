// Mail as jobs: a lookup step run twice (its worker stopped before marking it done) queues its
// mail once, and a sent mail's text, which may carry a link's token, does not stay in the queue's
// tables. (At-least-once jobs made idempotent by a key derived from the job: common practice, no source.)
import { afterAll, describe, expect, it } from 'vitest';
import { passwordResetMailJob } from '@/lib/account/recovery';
import { sequelize } from '@/lib/db';
import { jobQueue, sendJob, stopJobQueue } from '@/lib/jobs/queue';
import { PasswordReset } from '@/models';
import { mailsTo } from '../helpers/inbox';
import { workWaitingJobs } from '../helpers/jobs';
import { createTestTeam } from '../helpers/people';

afterAll(async () => { await stopJobQueue(); await sequelize.close(); });

describe('mail jobs', () => {
  it('a reset lookup run twice queues one mail, and the sent mail’s text is cleared from the queue', async () => {
    const { members } = await createTestTeam('mail-jobs');
    await workWaitingJobs(); // what earlier tests left
    const data = { email: members.viewer.email, requestedAt: new Date().toISOString() };
    const id = await sendJob('password-reset-mail', data);
    const job = { id: id!, data };
    expect(await passwordResetMailJob(job)).toEqual({ outcome: 'link' });
    expect(await passwordResetMailJob(job)).toEqual({ outcome: 'already queued' });
    expect(await PasswordReset.count({ where: { userId: members.viewer.id } })).toBe(1);

    await workWaitingJobs();
    const mails = await mailsTo(members.viewer.email);
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toMatch(/\/reset-password\?token=/);
    const [rows] = await sequelize.query(`select data->>'text' as text, state from pgboss.job where name = 'send-mail' and data->>'to' = $1`, { bind: [members.viewer.email] });
    expect(rows).toEqual([{ text: '(sent; text cleared)', state: 'completed' }]);
    const boss = await jobQueue();
    expect((await boss.getJobById('password-reset-mail', id!))?.state).toBe('completed');
  });
});
