// A lucia session adapter over the Sequelize models (sessions and users tables).
import type { Adapter, DatabaseSession, DatabaseUser } from 'lucia';
import { Op } from 'sequelize';
import { Session, User } from '@/models';

function toDatabaseSession(row: Session): DatabaseSession {
  return { id: row.id, userId: row.userId, expiresAt: row.expiresAt, attributes: { activeTeamId: row.activeTeamId ?? null } };
}

function toDatabaseUser(row: User): DatabaseUser {
  return { id: row.id, attributes: { email: row.email, name: row.name, unitSystem: row.unitSystem } };
}

export const sequelizeSessionAdapter: Adapter = {
  async getSessionAndUser(sessionId) {
    const row = await Session.findByPk(sessionId, { include: [{ model: User, as: 'user' }] });
    if (!row) return [null, null];
    const user = (row as Session & { user?: User }).user;
    return [toDatabaseSession(row), user ? toDatabaseUser(user) : null];
  },
  async getUserSessions(userId) {
    const rows = await Session.findAll({ where: { userId } });
    return rows.map(toDatabaseSession);
  },
  async setSession(session) {
    await Session.create({
      id: session.id,
      userId: session.userId,
      expiresAt: session.expiresAt,
      activeTeamId: session.attributes.activeTeamId ?? null,
    });
  },
  async updateSessionExpiration(sessionId, expiresAt) {
    await Session.update({ expiresAt }, { where: { id: sessionId } });
  },
  async deleteSession(sessionId) {
    await Session.destroy({ where: { id: sessionId } });
  },
  async deleteUserSessions(userId) {
    await Session.destroy({ where: { userId } });
  },
  async deleteExpiredSessions() {
    await Session.destroy({ where: { expiresAt: { [Op.lte]: new Date() } } });
  },
};
