import { RouterContextProvider } from "react-router";
import { expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { useMailCatcher } from "../helpers/mail";
import { RouteClient } from "../helpers/route-client";

useMailCatcher();
useMigratedDatabase();

const password = "guards passphrase here"; // our own minimum is 12 characters

async function signedIn(email: string, role: "member" | "editor" | "reviewer" | "admin") {
  const { User } = await import("~/models/index.server");
  const { hashPassword } = await import("~/auth/password.server");
  const signIn = await import("~/routes/auth/sign-in");
  const user = await User.create({
    email,
    displayName: `Guard ${role}`,
    passwordHash: await hashPassword(password),
    role,
    emailVerifiedAt: new Date(),
  });
  const browser = new RouteClient();
  await browser.submit(signIn.action, "/sign-in", { email, password });
  return { user, browser };
}

/** A request context as the root middleware leaves it: the session's user (or null) loaded once. */
async function contextFor(request: Request): Promise<RouterContextProvider> {
  const { loadUser } = await import("~/auth/guards.server");
  const context = new RouterContextProvider();
  await loadUser(
    { request, params: {}, context, url: new URL(request.url), pattern: new URL(request.url).pathname },
    async () => new Response(null),
  );
  return context;
}

async function thrownBy(guard: () => unknown): Promise<Response> {
  try {
    await guard();
  } catch (error) {
    if (error instanceof Response) return error;
    const init = (error as { init?: ResponseInit }).init;
    return new Response(null, { status: init?.status ?? 500 });
  }
  throw new Error("expected the guard to throw");
}

test("requireUser sends a visitor on a page to sign in and back, and answers an API call with JSON 401", async () => {
  const { requireUser } = await import("~/auth/guards.server");
  const visitor = new RouterContextProvider();
  const page = await thrownBy(() => requireUser(new Request("http://127.0.0.1:3000/account?tab=plan"), visitor));
  expect(page.status).toBe(302);
  expect(page.headers.get("Location")).toBe("/sign-in?next=%2Faccount%3Ftab%3Dplan");
  const api = await thrownBy(() => requireUser(new Request("http://127.0.0.1:3000/api/saved"), visitor));
  expect(api.status).toBe(401);
  expect(await api.json()).toMatchObject({ error: "unauthorised" });
});

test("requireRole answers 403 below the role and returns the user at or above it", async () => {
  const { requireRole } = await import("~/auth/guards.server");
  const { browser: editor } = await signedIn("editor@example.test", "editor");
  const request = editor.request("/desk");
  const context = await contextFor(request);
  expect((await thrownBy(() => requireRole(request, context, "reviewer"))).status).toBe(403);
  expect(requireRole(request, context, "editor").email).toBe("editor@example.test");
  const apiRequest = editor.request("/api/review");
  const api = await thrownBy(async () => requireRole(apiRequest, await contextFor(apiRequest), "admin"));
  expect(api.status).toBe(403);
  expect(await api.json()).toMatchObject({ error: "forbidden" });
});

test("a page request looks the session up once: the root loader, the desk's guard and the page share the user", async () => {
  const { Session } = await import("~/models/index.server");
  const root = await import("~/root");
  const desk = await import("~/routes/desk/index");
  const { browser: editor } = await signedIn("once@example.test", "editor");
  let lookups = 0;
  Session.addHook("beforeFind", "count-lookups", () => {
    lookups++;
  });
  try {
    const [shell, page] = await editor.document([root.loader, desk.loader], "/desk", {});
    expect((shell.body as { user: { displayName: string } | null }).user?.displayName).toBe("Guard editor");
    expect(page.status).toBe(200);
  } finally {
    Session.removeHook("beforeFind", "count-lookups");
  }
  expect(lookups).toBe(1);
});

test("an admin's role change is audited with who, from and to, and signs the person out", async () => {
  const users = await import("~/routes/admin/users");
  const audit = await import("~/routes/admin/audit");
  const { browser: admin, user: adminUser } = await signedIn("admin@example.test", "admin");
  const { browser: member, user: memberUser } = await signedIn("promoted@example.test", "member");
  expect((await member.root()).user?.role).toBe("member");

  const result = await admin.submit(users.action, "/admin/users", {
    intent: "change-role",
    userId: String(memberUser.id),
    role: "editor",
  });
  expect(result.status).toBe(200);

  const { AuditEvent } = await import("~/models/index.server");
  const event = await AuditEvent.findOne({ where: { action: "user.role_changed", subjectId: String(memberUser.id) } });
  expect(event).toMatchObject({ actorId: adminUser.id, subjectType: "user" });
  const details = typeof event!.details === "string" ? JSON.parse(event!.details) : event!.details;
  expect(details).toEqual({ from: "member", to: "editor" });

  // The old session ended: the new role starts with a fresh session at the next sign-in.
  expect((await member.root()).user).toBeNull();
  const page = await admin.call(audit.loader, "/admin/audit", {});
  expect(JSON.stringify(page.body)).toContain("user.role_changed");
});

test("an admin cannot change their own role, and a bad change is a 400", async () => {
  const users = await import("~/routes/admin/users");
  const { browser: admin, user } = await signedIn("solo-admin@example.test", "admin");
  const self = await admin.submit(users.action, "/admin/users", {
    intent: "change-role",
    userId: String(user.id),
    role: "member",
  });
  expect(self.status).toBe(400);
  const nonsense = await admin.submit(users.action, "/admin/users", {
    intent: "change-role",
    userId: String(user.id),
    role: "overlord",
  });
  expect(nonsense.status).toBe(400);
});

test("an admin can sign a person out of every browser, and that is audited", async () => {
  const users = await import("~/routes/admin/users");
  const { browser: admin } = await signedIn("revoker@example.test", "admin");
  const { browser: member, user } = await signedIn("revoked@example.test", "member");
  const result = await admin.submit(users.action, "/admin/users", {
    intent: "revoke-sessions",
    userId: String(user.id),
  });
  expect(result.body).toMatchObject({ message: "Signed out of 1 browser." });
  expect((await member.root()).user).toBeNull();
  const { AuditEvent } = await import("~/models/index.server");
  expect(await AuditEvent.count({ where: { action: "user.sessions_revoked", subjectId: String(user.id) } })).toBe(1);
});

test("sign-ins are audited", async () => {
  const { user } = await signedIn("audited@example.test", "member");
  const { AuditEvent } = await import("~/models/index.server");
  expect(await AuditEvent.count({ where: { action: "user.signed_in", subjectId: String(user.id) } })).toBe(1);
});

test("passwords are stored as argon2id at OWASP's minimum parameters or stronger", async () => {
  const { hashPassword, verifyPassword } = await import("~/auth/password.server");
  const hash = await hashPassword("a passphrase to hash");
  // PHC string format; OWASP Password Storage Cheat Sheet: argon2id m=19456 (19 MiB), t=2, p=1 minimum
  expect(hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  expect(await verifyPassword(hash, "a passphrase to hash")).toBe(true);
  expect(await verifyPassword(hash, "a passphrase to hasH")).toBe(false);
});
