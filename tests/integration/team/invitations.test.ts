import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import { POST as accept } from '@/app/api/v1/invitations/accept/route';
import { POST as invite } from '@/app/api/v1/team/invitations/route';
import { POST as resend } from '@/app/api/v1/team/invitations/[invitationId]/resend/route';
import { DELETE as revoke } from '@/app/api/v1/team/invitations/[invitationId]/route';
import { sequelize } from '@/lib/db';
import { stopJobQueue } from '@/lib/jobs/queue';
import { workWaitingJobs } from '../helpers/jobs';
import { newLinkToken } from '@/lib/tokens';
import { AuditEvent, Invitation, Membership, Team, User } from '@/models';
import { lastLinkTo, mailsTo } from '../helpers/inbox';
import { addMember, createTestTeam, TEST_PASSWORD, uniqueEmail } from '../helpers/people';
import { call } from '../helpers/routes';

afterAll(async () => { await stopJobQueue(); await sequelize.close(); });
afterEach(() => { vi.useRealTimers(); });

const DAY_MS = 86_400_000;

async function seededInvitation(teamId: string, email: string, fields: Partial<Invitation> = {}): Promise<string> {
  const { token, tokenHash } = newLinkToken();
  await Invitation.create({ teamId, email, role: 'engineer', tokenHash, invitedById: null, expiresAt: new Date(Date.now() + 7 * DAY_MS), ...fields });
  return token;
}

describe('invitations', () => {
  it('mails a single-use link; accepting creates the account with the invited role', async () => {
    const { team, cookieFor } = await createTestTeam('invite');
    await Membership.destroy({ where: { teamId: team.id, role: ['engineer', 'architect', 'viewer'] } }); // two members: one included seat free
    const email = uniqueEmail('invitee');
    const sent = await call(invite, 'POST', '/api/v1/team/invitations', { cookie: await cookieFor('admin'), body: { email, role: 'architect' } });
    expect(sent.status).toBe(201);
    const stored = await Invitation.findOne({ where: { teamId: team.id, email } });
    await workWaitingJobs();
    const token = await lastLinkTo(email, '/invitation');
    expect(stored!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored!.tokenHash).not.toContain(token);

    const joined = await call(accept, 'POST', '/api/v1/invitations/accept', { body: { token, name: 'Ada Nightingale', password: 'a long new password' } });
    expect(joined.status).toBe(201);
    expect(joined.headers.get('set-cookie')).toMatch(/antinode_session=/);
    const user = await User.findOne({ where: { email } });
    expect(await Membership.findOne({ where: { userId: user!.id, teamId: team.id } })).toMatchObject({ role: 'architect' });
    expect(await AuditEvent.count({ where: { teamId: team.id, action: ['invitation.sent', 'invitation.accepted'] } })).toBe(2);

    const again = await call(accept, 'POST', '/api/v1/invitations/accept', { body: { token, name: 'Someone Else', password: 'another long password' } });
    expect(again.status).toBe(409);
    expect(again.body).toMatchObject({ error: { code: 'conflict', message: 'This invitation has already been used. Sign in to reach the team.', field: 'token' } });
  });

  it('the mail carries no name or text chosen by the team: only our words and the link', async () => {
    const { team, members, cookieFor } = await createTestTeam('spam-names');
    await Membership.destroy({ where: { teamId: team.id, role: ['engineer', 'architect', 'viewer'] } });
    await Team.update({ name: 'WIN A PRIZE at prize.spam.example' }, { where: { id: team.id } });
    await User.update({ name: 'Call +1 555 0100 now, visit spam.example' }, { where: { id: members.admin.id } });
    const email = uniqueEmail('spam-invitee');
    expect((await call(invite, 'POST', '/api/v1/team/invitations', { cookie: await cookieFor('admin'), body: { email, role: 'viewer' } })).status).toBe(201);
    await workWaitingJobs();
    const [mail] = await mailsTo(email);
    expect(mail.subject).toBe('An invitation to join a team on Antinode');
    expect(`${mail.subject}\n${mail.text}`).not.toMatch(/spam\.example|555 0100|PRIZE/);
    expect(mail.text).toMatch(/\/invitation\?token=/);
  });

  it('“Send again” waits 10 minutes after each mail, and says so', async () => {
    // Before, 10 presses in 2 s sent 11 mails.
    const { team, cookieFor } = await createTestTeam('resend');
    await Membership.destroy({ where: { teamId: team.id, role: ['engineer', 'architect', 'viewer'] } });
    const admin = await cookieFor('admin');
    const email = uniqueEmail('resent');
    await call(invite, 'POST', '/api/v1/team/invitations', { cookie: admin, body: { email, role: 'viewer' } });
    const invitationId = (await Invitation.findOne({ where: { teamId: team.id, email } }))!.id;
    const presses = [];
    for (let press = 0; press < 10; press += 1) presses.push(await call(resend, 'POST', '/x', { cookie: admin, params: { invitationId } }));
    expect(presses.map((answer) => answer.status)).toEqual(Array<number>(10).fill(429));
    expect(presses[0].body).toMatchObject({ error: { code: 'throttled', message: expect.stringMatching(/^This invitation was sent less than 10 minutes ago\. Give the mail time to arrive; you can send it again in \d+ (s|minutes)\.$/) } });
    await workWaitingJobs();
    expect(await mailsTo(email)).toHaveLength(1);

    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(Date.now() + 10 * 60_000 + 1000);
    expect((await call(resend, 'POST', '/x', { cookie: admin, params: { invitationId } })).status).toBe(200);
    await workWaitingJobs();
    expect(await mailsTo(email)).toHaveLength(2);
  });

  it('inviting and withdrawing in a loop sends one address at most 3 mails a day', async () => {
    const { team, cookieFor } = await createTestTeam('loop');
    await Membership.destroy({ where: { teamId: team.id, role: ['engineer', 'architect', 'viewer'] } });
    const admin = await cookieFor('admin');
    const email = uniqueEmail('looped');
    const statuses: number[] = [];
    for (let round = 0; round < 5; round += 1) {
      const sent = await call(invite, 'POST', '/api/v1/team/invitations', { cookie: admin, body: { email, role: 'viewer' } });
      statuses.push(sent.status);
      const open = await Invitation.findOne({ where: { teamId: team.id, email, revokedAt: null } });
      if (open) await call(revoke, 'DELETE', '/x', { cookie: admin, params: { invitationId: open.id } });
    }
    expect(statuses).toEqual([201, 201, 201, 429, 429]);
    await workWaitingJobs();
    expect(await mailsTo(email)).toHaveLength(3);
  });

  it('one team sends at most 30 invitation mails a day', async () => {
    const { team, cookieFor } = await createTestTeam('team-cap');
    await Membership.destroy({ where: { teamId: team.id, role: ['engineer', 'architect', 'viewer'] } });
    const admin = await cookieFor('admin');
    const statuses: number[] = [];
    for (let index = 0; index < 31; index += 1) {
      const sent = await call(invite, 'POST', '/api/v1/team/invitations', { cookie: admin, body: { email: uniqueEmail(`cap-${index}`), role: 'viewer' } });
      statuses.push(sent.status);
      const open = await Invitation.findOne({ where: { teamId: team.id, revokedAt: null, acceptedAt: null } });
      if (open) await call(revoke, 'DELETE', '/x', { cookie: admin, params: { invitationId: open.id } });
    }
    expect(statuses).toEqual([...Array<number>(30).fill(201), 429]);
    await workWaitingJobs();
  });

  it('an account whose own address is not confirmed cannot invite', async () => {
    const { team, members, cookieFor } = await createTestTeam('unconfirmed');
    await Membership.destroy({ where: { teamId: team.id, role: ['engineer', 'architect', 'viewer'] } });
    await User.update({ emailVerifiedAt: null }, { where: { id: members.admin.id } });
    const email = uniqueEmail('not-sent');
    const answer = await call(invite, 'POST', '/api/v1/team/invitations', { cookie: await cookieFor('admin'), body: { email, role: 'viewer' } });
    expect(answer.status).toBe(403);
    expect(answer.body).toMatchObject({ error: { code: 'forbidden', message: expect.stringContaining('Confirm your own e-mail address before inviting anyone') } });
    expect(await Invitation.count({ where: { teamId: team.id } })).toBe(0);
  });

  it('refuses an expired link and says to ask for a new one', async () => {
    const { team } = await createTestTeam('expired');
    const token = await seededInvitation(team.id, uniqueEmail('late'), { expiresAt: new Date(Date.now() - DAY_MS) });
    const answer = await call(accept, 'POST', '/api/v1/invitations/accept', { body: { token, name: 'Late Comer', password: 'a long new password' } });
    expect(answer.status).toBe(409);
    expect(answer.body).toMatchObject({ error: { code: 'conflict', message: expect.stringMatching(/^This invitation expired on \d{4}-\d{2}-\d{2}\. Ask your team admin to send it again\.$/) } });
  });

  it('refuses a withdrawn link and an unknown one', async () => {
    const { team, cookieFor } = await createTestTeam('revoked');
    const email = uniqueEmail('withdrawn');
    const token = await seededInvitation(team.id, email);
    const invitation = await Invitation.findOne({ where: { teamId: team.id, email } });
    expect((await call(revoke, 'DELETE', '/x', { cookie: await cookieFor('admin'), params: { invitationId: invitation!.id } })).status).toBe(200);
    const withdrawn = await call(accept, 'POST', '/api/v1/invitations/accept', { body: { token, name: 'Too Late', password: 'a long new password' } });
    expect(withdrawn.body).toMatchObject({ error: { code: 'conflict', message: expect.stringContaining('withdrew this invitation') } });
    const unknown = await call(accept, 'POST', '/api/v1/invitations/accept', { body: { token: 'not-a-real-token', password: 'x' } });
    expect(unknown.status).toBe(404);
    expect(unknown.body).toMatchObject({ error: { code: 'not_found', message: expect.stringContaining('not valid') } });
  });

  it('adds the team to an existing account only with that account’s password', async () => {
    const { team } = await createTestTeam('existing');
    const other = await createTestTeam('existing-other');
    const person = await addMember(other.team.id, 'viewer', 'existing-person');
    const token = await seededInvitation(team.id, person.email);
    const wrong = await call(accept, 'POST', '/api/v1/invitations/accept', { body: { token, password: 'not the password' } });
    expect(wrong.status).toBe(401);
    expect(wrong.body).toMatchObject({ error: { field: 'password', message: expect.stringContaining(person.email) } });
    const right = await call(accept, 'POST', '/api/v1/invitations/accept', { body: { token, password: TEST_PASSWORD } });
    expect(right.status).toBe(201);
    expect(await Membership.count({ where: { userId: person.id } })).toBe(2);
  });

  it('someone signed in as the invited address joins without typing a password', async () => {
    const { team } = await createTestTeam('signed-in');
    const other = await createTestTeam('signed-in-other');
    const person = other.members.architect;
    const token = await seededInvitation(team.id, person.email);
    const joined = await call(accept, 'POST', '/api/v1/invitations/accept', { cookie: await other.cookieFor('architect'), body: { token } });
    expect(joined.status).toBe(201);
    expect(await Membership.findOne({ where: { userId: person.id, teamId: team.id } })).toMatchObject({ role: 'engineer' });
  });

  it('refuses an invitation beyond the seats and points to buying more', async () => {
    const { cookieFor } = await createTestTeam('full'); // five members, three included seats
    const answer = await call(invite, 'POST', '/api/v1/team/invitations', { cookie: await cookieFor('admin'), body: { email: uniqueEmail('nine'), role: 'viewer' } });
    expect(answer.status).toBe(409);
    expect(answer.body).toMatchObject({ error: { field: 'seats', message: 'All 3 seats are taken (5 members and 0 pending invitations). Buy more seats under Seats and billing, then send the invitation.' } });
  });

  it('names the field of a bad invitation', async () => {
    const { cookieFor } = await createTestTeam('bad-invite');
    const answer = await call(invite, 'POST', '/api/v1/team/invitations', { cookie: await cookieFor('admin'), body: { email: 'not an address', role: 'viewer' } });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'email' } });
  });
});
