import type { Adapter, DatabaseSession, DatabaseUser } from "lucia";
import { Op } from "sequelize";
import { Session, User } from "@/db";

function toDatabaseUser(user: User): DatabaseUser {
  return {
    id: user.id,
    attributes: { email: user.email, role: user.role, emailVerified: user.emailVerifiedAt !== null },
  };
}

function toDatabaseSession(session: Session): DatabaseSession {
  return { id: session.id, userId: session.userId, expiresAt: session.expiresAt, attributes: {} };
}

/** Lucia v3 keeps sessions through this small adapter over the Sequelize models. */
export const sequelizeAdapter: Adapter = {
  async getSessionAndUser(sessionId) {
    const session = await Session.findByPk(sessionId, { include: [{ model: User, as: "user" }] });
    if (!session?.user) return [null, null];
    return [toDatabaseSession(session), toDatabaseUser(session.user)];
  },
  async getUserSessions(userId) {
    const sessions = await Session.findAll({ where: { userId } });
    return sessions.map(toDatabaseSession);
  },
  async setSession(session) {
    await Session.create({ id: session.id, userId: String(session.userId), expiresAt: session.expiresAt });
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
