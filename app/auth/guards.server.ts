import { createContext, data, redirect, type MiddlewareFunction, type RouterContextProvider } from "react-router";
import type { User } from "~/models/index.server";
import { roleAtLeast, type StaffRole } from "~/vocabulary/roles";
import { findSessionUser } from "./session.server";

/** The fields of a user that any page may show; never the hash or the payment ids. */
export interface PublicUser {
  id: number;
  displayName: string;
  role: StaffRole;
}

export function publicUser(user: User): PublicUser {
  return { id: user.id, displayName: user.displayName, role: user.role };
}

/**
 * The visitor's account, or null: set once per request by `loadUser` (the root middleware), so the root
 * loader, the area guards and every loader read it without another session lookup.
 */
export const optionalUserContext = createContext<User | null>(null);

/** The signed-in user, set by an area guard (account, desk, admin layouts): loaders below them read it. */
export const userContext = createContext<User>();

type Context = Readonly<RouterContextProvider>;

/** Root middleware: looks the session up once and keeps the user (or null) for the rest of the request. */
export const loadUser: MiddlewareFunction<Response> = async ({ request, context }, next) => {
  context.set(optionalUserContext, await findSessionUser(request));
  return next();
};

/** The visitor's account (or null), as loaded by the root middleware. */
export function getUser(context: Context): User | null {
  return context.get(optionalUserContext);
}

function isApi(request: Request): boolean {
  return new URL(request.url).pathname.startsWith("/api/");
}

/** Pages send a visitor to sign in and back; API routes answer JSON 401. */
function refuseVisitor(request: Request): never {
  if (isApi(request)) throw Response.json({ error: "unauthorised", message: "Sign in to use this." }, { status: 401 });
  const url = new URL(request.url);
  const next = `${url.pathname}${url.search}`;
  throw redirect(`/sign-in?next=${encodeURIComponent(next)}`, { status: 302 });
}

/** Signed in, else 401 (API) or a redirect to sign in and back (pages). */
export function requireUser(request: Request, context: Context): User {
  return getUser(context) ?? refuseVisitor(request);
}

/** Signed in and at least this role (roles rank member < editor < reviewer < admin), else 401 or 403. */
export function requireRole(request: Request, context: Context, needed: StaffRole): User {
  const user = requireUser(request, context);
  if (roleAtLeast(user.role, needed)) return user;
  if (isApi(request))
    throw Response.json({ error: "forbidden", message: `This needs the ${needed} role.` }, { status: 403 });
  throw data({ message: `This page needs the ${needed} role.` }, { status: 403 });
}

/**
 * Layout middleware for an area (account: member, desk: editor, admin: admin): refuses everyone below
 * the role before any loader or action of the area runs, and hands the user on in `userContext`.
 */
export function guardArea(needed: StaffRole): MiddlewareFunction<Response> {
  return async ({ request, context }, next) => {
    context.set(userContext, requireRole(request, context, needed));
    return next();
  };
}

/** Only same-site relative paths are followed after sign-in, never another host. */
export function safeNext(next: string | null | undefined, fallback = "/account"): string {
  if (!next?.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return fallback;
  return next;
}
