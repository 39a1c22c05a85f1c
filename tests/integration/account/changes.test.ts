import { afterAll, describe, expect, it } from 'vitest';
import { changeEmail, changePassword } from '@/lib/account/changes';
import { signIn, startSession } from '@/lib/auth/accounts';
import { sequelize } from '@/lib/db';
import { stopJobQueue } from '@/lib/jobs/queue';
import { AppError } from '@/lib/errors';
import { Session } from '@/models';
import { mailsTo } from '../helpers/inbox';
import { workWaitingJobs } from '../helpers/jobs';
import { createTestTeam, TEST_PASSWORD, uniqueEmail } from '../helpers/people';
import { FILE_PEER } from '../helpers/routes';

const here = { address: FILE_PEER, deviceToken: null };

afterAll(async () => { await stopJobQueue(); await sequelize.close(); });

describe('account changes', () => {
  it('wrong current passwords are budgeted per session (5) and per account (10): a stolen session cannot guess on', async () => {
    // Before, 30 wrong current passwords in a row were each answered "wrong" at once.
    const { team, members } = await createTestTeam('guessing');
    const user = members.engineer;
    const stolen = (await startSession(user.id, team.id)).value;
    const outcomes: string[] = [];
    for (let attempt = 0; attempt < 6; attempt += 1) {
      outcomes.push(await changePassword(user.id, stolen, `guess ${attempt}`, 'a new long password').then(() => 'changed', (error: AppError) => error.code));
    }
    expect(outcomes).toEqual(['wrong_credentials', 'wrong_credentials', 'wrong_credentials', 'wrong_credentials', 'wrong_credentials', 'throttled']);
    // Spent for this session, the right password included; the answer says when and what else to do.
    await expect(changeEmail(user.id, stolen, TEST_PASSWORD, uniqueEmail('taken-over'))).rejects.toMatchObject({
      code: 'throttled', field: 'currentPassword', message: expect.stringContaining('Too many wrong current passwords'), retryAfterS: expect.any(Number),
    });
    // A second session may try until the account's budget of 10 is spent; then every session waits.
    const second = (await startSession(user.id, team.id)).value;
    for (let attempt = 0; attempt < 5; attempt += 1) await changePassword(user.id, second, `more ${attempt}`, 'a new long password').catch(() => undefined);
    const third = (await startSession(user.id, team.id)).value;
    await expect(changePassword(user.id, third, TEST_PASSWORD, 'a new long password')).rejects.toMatchObject({ code: 'throttled', message: expect.stringContaining('for this account') });
    await expect(signIn(user.email, TEST_PASSWORD, here)).resolves.toMatchObject({ session: { name: 'antinode_session' } }); // the password did not change
  });

  it('a new password needs the current one, and ends every other session', async () => {
    const { team, members } = await createTestTeam('change-pw');
    const user = members.architect;
    const kept = await startSession(user.id, team.id);
    await startSession(user.id, team.id);
    await expect(changePassword(user.id, kept.value, 'not it', 'a new long password')).rejects.toMatchObject({ code: 'wrong_credentials', field: 'currentPassword' });
    await changePassword(user.id, kept.value, TEST_PASSWORD, 'a new long password');
    expect((await Session.findAll({ where: { userId: user.id } })).map((session) => session.id)).toEqual([kept.value]);
    await expect(signIn(user.email, 'a new long password', here)).resolves.toMatchObject({ session: { name: 'antinode_session' } });
  });

  it('a new e-mail needs the current password and must be free', async () => {
    const { team, members } = await createTestTeam('change-email');
    const sessionId = (await startSession(members.engineer.id, team.id)).value;
    const taken = members.viewer.email;
    await expect(changeEmail(members.engineer.id, sessionId, TEST_PASSWORD, taken)).rejects.toMatchObject({ code: 'conflict', field: 'email' });
    await expect(changeEmail(members.engineer.id, sessionId, 'wrong', uniqueEmail('new'))).rejects.toBeInstanceOf(AppError);
    const fresh = uniqueEmail('moved');
    const previous = members.engineer.email;
    await expect(changeEmail(members.engineer.id, sessionId, TEST_PASSWORD, fresh)).resolves.toBe(fresh);
    await workWaitingJobs();
    expect((await mailsTo(previous)).map((mail) => mail.subject)).toEqual(['Your Antinode e-mail address was changed']);
    await expect(signIn(fresh, TEST_PASSWORD, here)).resolves.toMatchObject({ session: { name: 'antinode_session' } });
  });
});
