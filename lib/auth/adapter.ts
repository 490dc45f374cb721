import { createHash } from "node:crypto";
import type { Adapter, DatabaseSession, DatabaseUser } from "lucia";
import { Op } from "sequelize";
import { Session, User } from "@/db";

/**
 * The session table stores the SHA-256 of each session token, never the token: the cookie holds the token, and a
 * copy of the table opens no session. Lucia hands this adapter the token; only here is it hashed.
 */
export function sessionKey(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

function toDatabaseUser(user: User): DatabaseUser {
  return {
    id: user.id,
    attributes: { email: user.email, role: user.role, emailVerified: user.emailVerifiedAt !== null },
  };
}

/** `id` is the token when the caller gave one, else the stored hash (listing a member's sessions). */
function toDatabaseSession(session: Session, token = session.id): DatabaseSession {
  return { id: token, userId: session.userId, expiresAt: session.expiresAt, attributes: {} };
}

/** Lucia v3 keeps sessions through this small adapter over the Sequelize models. */
export const sequelizeAdapter: Adapter = {
  async getSessionAndUser(sessionId) {
    const session = await Session.findByPk(sessionKey(sessionId), { include: [{ model: User, as: "user" }] });
    if (!session?.user) return [null, null];
    return [toDatabaseSession(session, sessionId), toDatabaseUser(session.user)];
  },
  async getUserSessions(userId) {
    const sessions = await Session.findAll({ where: { userId } });
    return sessions.map((session) => toDatabaseSession(session));
  },
  async setSession(session) {
    await Session.create({ id: sessionKey(session.id), userId: String(session.userId), expiresAt: session.expiresAt });
  },
  async updateSessionExpiration(sessionId, expiresAt) {
    await Session.update({ expiresAt }, { where: { id: sessionKey(sessionId) } });
  },
  async deleteSession(sessionId) {
    await Session.destroy({ where: { id: sessionKey(sessionId) } });
  },
  async deleteUserSessions(userId) {
    await Session.destroy({ where: { userId } });
  },
  async deleteExpiredSessions() {
    await Session.destroy({ where: { expiresAt: { [Op.lte]: new Date() } } });
  },
};
