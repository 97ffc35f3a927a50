import { createHash, randomBytes } from "node:crypto";
import { createCookieSessionStorage, type Session as CookieSession } from "react-router";
import { Op } from "sequelize";
import { env } from "~/config/env.server";
import { Session, User } from "~/models/index.server";

// The cookie carries only a random session id (plus the CSRF token); the row in `sessions`
// decides whether it is still valid, so an admin or a password reset can revoke it server-side.
export const SESSION_LIFETIME_MS = 30 * 24 * 60 * 60 * 1000;

interface CookieData {
  sid: string;
  csrf: string;
}

let storage: ReturnType<typeof createCookieSessionStorage<CookieData>> | undefined;

function sessionStorage() {
  if (!storage) {
    const e = env();
    storage = createCookieSessionStorage<CookieData>({
      cookie: {
        name: "dryside_session",
        secrets: [e.SESSION_SECRET],
        httpOnly: true,
        sameSite: "lax",
        secure: new URL(e.APP_URL).protocol === "https:",
        path: "/",
        maxAge: SESSION_LIFETIME_MS / 1000,
      },
    });
  }
  return storage;
}

export function getCookieSession(request: Request): Promise<CookieSession<CookieData>> {
  return sessionStorage().getSession(request.headers.get("Cookie"));
}

export function commitCookieSession(session: CookieSession<CookieData>): Promise<string> {
  return sessionStorage().commitSession(session);
}

export function randomToken(bytes = 32): string {
  return randomBytes(bytes).toString("base64url");
}

/** Stored form of a session id: a leaked table cannot be replayed as cookies. Fits CHAR(43). */
export function sessionRowId(sid: string): string {
  return createHash("sha256").update(sid).digest("base64url");
}

/** The signed-in user for this request, or null when the session is missing, expired or revoked. */
export async function findSessionUser(request: Request): Promise<User | null> {
  const cookie = await getCookieSession(request);
  const sid = cookie.get("sid");
  if (!sid) return null;
  const row = await Session.findOne({
    where: { id: sessionRowId(sid), revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [{ model: User, as: "user", required: true }],
  });
  return (row as (Session & { user?: User }) | null)?.user ?? null;
}

/**
 * Starts a fresh session (new id and new CSRF token) for the user: called on sign-in, so an id planted
 * before sign-in is never promoted. Revokes the id the browser held before, if any.
 */
export async function startSession(request: Request, userId: number): Promise<string> {
  const cookie = await getCookieSession(request);
  const previous = cookie.get("sid");
  if (previous)
    await Session.update({ revokedAt: new Date() }, { where: { id: sessionRowId(previous), revokedAt: null } });
  const sid = randomToken();
  await Session.create({
    id: sessionRowId(sid),
    userId,
    expiresAt: new Date(Date.now() + SESSION_LIFETIME_MS),
    userAgent: request.headers.get("User-Agent")?.slice(0, 255) ?? null,
  });
  cookie.set("sid", sid);
  cookie.set("csrf", randomToken());
  return commitCookieSession(cookie);
}

/** Ends this browser's session and clears the cookie. */
export async function endSession(request: Request): Promise<string> {
  const cookie = await getCookieSession(request);
  const sid = cookie.get("sid");
  if (sid) await Session.update({ revokedAt: new Date() }, { where: { id: sessionRowId(sid), revokedAt: null } });
  return sessionStorage().destroySession(cookie);
}

/** Revokes every live session of a user (role change, password reset, admin action). Returns how many. */
export async function revokeUserSessions(userId: number): Promise<number> {
  const [count] = await Session.update(
    { revokedAt: new Date() },
    { where: { userId, revokedAt: null, expiresAt: { [Op.gt]: new Date() } } },
  );
  return count;
}

export async function countLiveSessions(userId: number): Promise<number> {
  return Session.count({ where: { userId, revokedAt: null, expiresAt: { [Op.gt]: new Date() } } });
}
