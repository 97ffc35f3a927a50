import { createHash } from "node:crypto";
import { Op } from "sequelize";
import { AuthToken } from "~/models/index.server";
import type { TokenPurpose } from "~/models/auth-token.server";
import { randomToken } from "./session.server";

export const TOKEN_LIFETIME_MS: Record<TokenPurpose, number> = {
  "verify-email": 24 * 60 * 60 * 1000,
  "reset-password": 60 * 60 * 1000,
};

function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** Issues a new link token; earlier unused tokens of the same purpose stop working, so only the newest mail counts. */
export async function issueToken(userId: number, purpose: TokenPurpose, now = new Date()): Promise<string> {
  await AuthToken.update({ usedAt: now }, { where: { userId, purpose, usedAt: null } });
  const token = randomToken();
  await AuthToken.create({
    userId,
    purpose,
    tokenHash: hashToken(token),
    expiresAt: new Date(now.getTime() + TOKEN_LIFETIME_MS[purpose]),
  });
  return token;
}

function liveWhere(token: string, purpose: TokenPurpose, now: Date) {
  return { tokenHash: hashToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: now } };
}

/** The user a live token belongs to, without using it up (to show a form or an "expired" message). */
export async function peekToken(token: string, purpose: TokenPurpose, now = new Date()): Promise<number | null> {
  const row = await AuthToken.findOne({ where: liveWhere(token, purpose, now) });
  return row?.userId ?? null;
}

/**
 * Uses a token up and returns its user id, or null when it is unknown, expired or already used.
 * One conditional UPDATE, so two simultaneous clicks cannot both succeed.
 */
export async function consumeToken(token: string, purpose: TokenPurpose, now = new Date()): Promise<number | null> {
  const row = await AuthToken.findOne({ where: liveWhere(token, purpose, now) });
  if (!row) return null;
  const [changed] = await AuthToken.update({ usedAt: now }, { where: { id: row.id, usedAt: null } });
  return changed === 1 ? row.userId : null;
}
