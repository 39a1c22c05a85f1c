import { afterAll, describe, expect, it } from 'vitest';
import { DELETE as remove, PATCH as changeRole } from '@/app/api/v1/team/members/[memberId]/route';
import { sequelize } from '@/lib/db';
import { createProject } from '@/lib/projects/data';
import { AuditEvent, Membership, Project } from '@/models';
import { createTestTeam } from '../helpers/people';
import { call } from '../helpers/routes';

afterAll(async () => { await sequelize.close(); });

async function membershipOf(teamId: string, userId: string): Promise<Membership> {
  return (await Membership.findOne({ where: { teamId, userId } }))!;
}

describe('members', () => {
  it('the last admin cannot be demoted or removed, and hears why', async () => {
    const { team, members, cookieFor } = await createTestTeam('last-admin');
    const admin = await membershipOf(team.id, members.admin.id);
    const cookie = await cookieFor('admin');
    const demoted = await call(changeRole, 'PATCH', '/x', { cookie, params: { memberId: admin.id }, body: { role: 'viewer' } });
    expect(demoted.status).toBe(409);
    expect(demoted.body).toMatchObject({ error: { message: `${members.admin.name} is the only admin of this team and must stay an admin. Make another member an admin first.` } });
    const removed = await call(remove, 'DELETE', '/x', { cookie, params: { memberId: admin.id } });
    expect(removed.status).toBe(409);
    expect(removed.body).toMatchObject({ error: { message: `${members.admin.name} is the only admin of this team and cannot be removed. Make another member an admin first.` } });
    expect((await admin.reload()).role).toBe('admin');
  });

  it('with a second admin, the first may step down', async () => {
    const { team, members, cookieFor } = await createTestTeam('two-admins');
    const cookie = await cookieFor('admin');
    const engineer = await membershipOf(team.id, members.engineer.id);
    expect((await call(changeRole, 'PATCH', '/x', { cookie, params: { memberId: engineer.id }, body: { role: 'admin' } })).status).toBe(200);
    const first = await membershipOf(team.id, members.admin.id);
    const stepped = await call(changeRole, 'PATCH', '/x', { cookie, params: { memberId: first.id }, body: { role: 'acoustician' } });
    expect(stepped.status).toBe(200);
    expect(await AuditEvent.count({ where: { teamId: team.id, action: 'member.role_changed' } })).toBe(2);
  });

  it('removing a member keeps what they made, attributed to them', async () => {
    const { team, members, cookieFor } = await createTestTeam('remove');
    const project = await createProject(team.id, members.acoustician.id, { name: 'Kept project', site: '' });
    const acoustician = await membershipOf(team.id, members.acoustician.id);
    const answer = await call(remove, 'DELETE', '/x', { cookie: await cookieFor('admin'), params: { memberId: acoustician.id } });
    expect(answer.status).toBe(200);
    expect(await Membership.count({ where: { teamId: team.id, userId: members.acoustician.id } })).toBe(0);
    expect(await Project.findByPk(project.id)).toMatchObject({ createdById: members.acoustician.id, teamId: team.id });
  });

  it('a role that is not one of ours is refused naming the field', async () => {
    const { team, members, cookieFor } = await createTestTeam('bad-role');
    const viewer = await membershipOf(team.id, members.viewer.id);
    const answer = await call(changeRole, 'PATCH', '/x', { cookie: await cookieFor('admin'), params: { memberId: viewer.id }, body: { role: 'owner' } });
    expect(answer.status).toBe(400);
    expect(answer.body).toMatchObject({ error: { code: 'bad_input', field: 'role' } });
  });
});
