import { data, redirect } from "react-router";
import type { User } from "~/models/index.server";
import { roleAtLeast, type StaffRole } from "~/vocabulary/roles";
import { findSessionUser } from "./session.server";

export { roleAtLeast, isStaffRole, STAFF_ROLES, type StaffRole } from "~/vocabulary/roles";

/** The fields of a user that any page may show; never the hash or the payment ids. */
export interface PublicUser {
  id: number;
  displayName: string;
  role: StaffRole;
}

export function publicUser(user: User): PublicUser {
  return { id: user.id, displayName: user.displayName, role: user.role };
}

export function getUser(request: Request): Promise<User | null> {
  return findSessionUser(request);
}

function isApi(request: Request): boolean {
  return new URL(request.url).pathname.startsWith("/api/");
}

/** Pages send a visitor to sign in and back; API routes answer JSON 401. */
export async function requireUser(request: Request): Promise<User> {
  const user = await getUser(request);
  if (user) return user;
  if (isApi(request)) throw Response.json({ error: "unauthorised", message: "Sign in to use this." }, { status: 401 });
  const url = new URL(request.url);
  const next = `${url.pathname}${url.search}`;
  throw redirect(`/sign-in?next=${encodeURIComponent(next)}`, { status: 302 });
}

/** Signed in and at least this role (roles rank member < editor < reviewer < admin), else 403. */
export async function requireRole(request: Request, needed: StaffRole): Promise<User> {
  const user = await requireUser(request);
  if (roleAtLeast(user.role, needed)) return user;
  if (isApi(request)) throw Response.json({ error: "forbidden", message: `This needs the ${needed} role.` }, { status: 403 });
  throw data({ message: `This page needs the ${needed} role.` }, { status: 403 });
}

/** Only same-site relative paths are followed after sign-in, never another host. */
export function safeNext(next: string | null | undefined, fallback = "/account"): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  return next;
}
