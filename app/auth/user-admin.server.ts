import { Op } from "sequelize";
import { User, sequelize } from "~/models/index.server";
import { recordAudit } from "./audit.server";
import type { StaffRole } from "~/vocabulary/roles";
import { countLiveSessions, revokeUserSessions } from "./session.server";

export interface UserRow {
  id: number;
  email: string;
  displayName: string;
  role: StaffRole;
  verified: boolean;
  liveSessions: number;
  createdAt: string;
}

export async function listUsers({ q, limit = 50 }: { q?: string; limit?: number } = {}): Promise<UserRow[]> {
  const term = q?.trim();
  const users = await User.findAll({
    where: term
      ? { [Op.or]: [{ email: { [Op.like]: `%${term}%` } }, { displayName: { [Op.like]: `%${term}%` } }] }
      : {},
    order: [["createdAt", "DESC"]],
    limit,
  });
  return Promise.all(
    users.map(async (user) => ({
      id: user.id,
      email: user.email,
      displayName: user.displayName,
      role: user.role,
      verified: user.emailVerifiedAt !== null,
      liveSessions: await countLiveSessions(user.id),
      createdAt: user.createdAt.toISOString(),
    })),
  );
}

export class UserAdminError extends Error {
  override name = "UserAdminError";
}

/**
 * Changes a user's role and records who did it. The user's sessions are revoked, so the new privileges
 * start with a fresh session id at their next sign-in. Admins cannot change their own role (no lock-out).
 */
export async function changeRole(actorId: number, userId: number, role: StaffRole): Promise<void> {
  if (actorId === userId) throw new UserAdminError("You cannot change your own role; ask another admin.");
  const user = await User.findByPk(userId);
  if (!user) throw new UserAdminError("No such user.");
  const from = user.role;
  if (from === role) return;
  await sequelize.transaction(async (transaction) => {
    await user.update({ role }, { transaction });
    await recordAudit(
      { actorId, action: "user.role_changed", subjectType: "user", subjectId: userId, details: { from, to: role } },
      transaction,
    );
  });
  await revokeUserSessions(userId);
}

export async function revokeSessionsByAdmin(actorId: number, userId: number): Promise<number> {
  const count = await revokeUserSessions(userId);
  await recordAudit({
    actorId,
    action: "user.sessions_revoked",
    subjectType: "user",
    subjectId: userId,
    details: { count },
  });
  return count;
}
