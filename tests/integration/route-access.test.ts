// The role × route table, generated from app/routes.ts: every route must be listed here as public or
// protected, so a new route without a decision fails this test. Protected routes are called as each role.
import { resolve } from "node:path";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import { beforeAll, expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { useMailCatcher } from "../helpers/mail";
import { RouteClient, type RouteResult } from "../helpers/route-client";
import routeConfig from "~/routes";
import { STAFF_ROLES, roleAtLeast, type StaffRole } from "~/vocabulary/roles";

useMailCatcher();
useMigratedDatabase();

/**
 * "public", or the least role that may use the route. loaderPublic: only the action is guarded (a public
 * page with a members' form). entitlement: signed-in people may still be refused for lack of a plan or set,
 * which the payments tests check; here only the sign-in guard is checked.
 */
type Access =
  | "public"
  | { atLeast: StaffRole; params?: Record<string, string>; loaderPublic?: true; entitlement?: true };

/** One decision per route path (as app/routes.ts spells it, "/" for the index). */
const ACCESS: Record<string, Access> = {
  "/": "public",
  "/details": "public",
  "/details/:slug": "public",
  "/preferences/units": "public",
  "/healthz": "public",
  "/sign-up": "public",
  "/sign-in": "public",
  "/sign-out": "public",
  "/verify-email/:token": "public",
  "/forgot-password": "public",
  "/reset-password/:token": "public",
  "/account": { atLeast: "member" },
  "/admin": { atLeast: "admin" },
  "/admin/users": { atLeast: "admin" },
  "/admin/outbox": { atLeast: "admin" },
  "/admin/audit": { atLeast: "admin" },
  "/api/details": "public",
  "/api/details/:slug": "public",
  "/api/details/:slug/check": "public",
  "/api/materials": "public",
  "/api/suggestions": "public",
  "/pricing": { atLeast: "member", loaderPublic: true },
  "/sets": "public",
  "/sets/:slug/pack": { atLeast: "member", params: { slug: "no-such-set" }, entitlement: true },
  "/account/billing": { atLeast: "member" },
  "/account/checkout/return": { atLeast: "member" },
  "/admin/payments": { atLeast: "admin" },
  "/api/payments/webhook": "public", // callers prove themselves with the webhook signature, not a session
  "/details/:slug/save": { atLeast: "member", params: { slug: "no-such-detail" } },
  "/uploads/:id": "public", // readUpload decides per file: published free drawings for all, premium ones with access
  // The desk (docs/design.md "People and roles"): editors write, reviewers approve others' work.
  "/desk": { atLeast: "editor" },
  "/desk/new": { atLeast: "editor" },
  "/desk/details/:slug/edit": { atLeast: "editor", params: { slug: "no-such-detail" } },
  "/desk/details/:slug/withdraw": { atLeast: "reviewer", params: { slug: "no-such-detail" } }, // withdrawing is a reviewer's call
  "/desk/revisions/:id": { atLeast: "editor", params: { id: "999999" } },
  "/desk/revisions/:id/export": { atLeast: "editor", params: { id: "999999" } },
  "/desk/revisions/:id/uploads": { atLeast: "editor", params: { id: "999999" } },
  "/desk/review/:id": { atLeast: "reviewer", params: { id: "999999" } },
  "/desk/materials": { atLeast: "editor" },
  "/desk/materials/:slug": { atLeast: "editor", params: { slug: "no-such-material" } },
  "/desk/api/check": { atLeast: "editor" },
  "/desk/api/preview": { atLeast: "editor" },
};

interface FlatRoute {
  path: string;
  file: string;
}

function flatten(entries: RouteConfigEntry[], parent = ""): FlatRoute[] {
  return entries.flatMap((entry) => {
    const path = entry.path ? `${parent}/${entry.path}`.replace(/\/+/g, "/") : parent || "/";
    const own = entry.path !== undefined || entry.index ? [{ path, file: entry.file }] : [];
    return [...own, ...flatten(entry.children ?? [], entry.path ? path : parent)];
  });
}

const routes = flatten(routeConfig);

test("every route in app/routes.ts is listed as public or protected", () => {
  const unlisted = routes.filter((route) => !(route.path in ACCESS)).map((route) => `${route.path} (${route.file})`);
  expect(unlisted, "add these to ACCESS in tests/integration/route-access.test.ts").toEqual([]);
});

test("the table lists no route that app/routes.ts no longer has", () => {
  const paths = new Set(routes.map((route) => route.path));
  expect(Object.keys(ACCESS).filter((path) => !paths.has(path))).toEqual([]);
});

const browsers = new Map<StaffRole, RouteClient>();
const password = "role table passphrase"; // our own minimum is 12 characters

beforeAll(async () => {
  const { User } = await import("~/models/index.server");
  const { hashPassword } = await import("~/auth/password.server");
  const signIn = await import("~/routes/auth/sign-in");
  const passwordHash = await hashPassword(password);
  for (const role of STAFF_ROLES) {
    await User.create({
      email: `${role}@example.test`,
      displayName: `Table ${role}`,
      passwordHash,
      role,
      emailVerifiedAt: new Date(),
    });
    const browser = new RouteClient();
    const result = await browser.submit(signIn.action, "/sign-in", { email: `${role}@example.test`, password });
    if (result.status !== 302) throw new Error(`could not sign in as ${role}`);
    browsers.set(role, browser);
  }
});

type RouteFunction = (args: never) => unknown;
interface RouteModule {
  loader?: RouteFunction;
  action?: RouteFunction;
}

function urlFor(path: string, params: Record<string, string> = {}): string {
  return path.replace(/:(\w+)/g, (_, name: string) => params[name] ?? "x");
}

function expectRefused(result: RouteResult, path: string, who: string) {
  const where = `${who} on ${path}`;
  if (who === "visitor") {
    if (path.startsWith("/api/")) expect(result.status, where).toBe(401);
    else {
      expect(result.status, where).toBe(302);
      expect(result.headers.get("Location"), where).toMatch(/^\/sign-in\?next=/);
    }
  } else {
    expect(result.status, where).toBe(403);
  }
}

const protectedRoutes = routes.filter((route) => ACCESS[route.path] && ACCESS[route.path] !== "public");

test.each(protectedRoutes.map((route) => [route.path, route] as const))(
  "%s: refused below its role, served at or above it",
  async (path, route) => {
    const access = ACCESS[path] as Exclude<Access, "public">;
    const module = (await import(/* @vite-ignore */ resolve("app", route.file))) as RouteModule;
    expect(module.loader ?? module.action, `${path} has neither loader nor action`).toBeDefined();
    const url = urlFor(path, access.params);

    const loader = access.loaderPublic ? undefined : module.loader;
    const visitor = new RouteClient();
    if (loader) expectRefused(await visitor.call(loader, url, access.params ?? {}), path, "visitor");
    if (module.action)
      expectRefused(await visitor.submit(module.action, url, {}, access.params ?? {}), path, "visitor");

    for (const role of STAFF_ROLES) {
      const browser = browsers.get(role)!;
      if (roleAtLeast(role, access.atLeast)) {
        if (loader) {
          // Past the guard: whatever the route answers next, it is not "sign in" or "not allowed".
          const result = await browser.call(loader, url, access.params ?? {});
          const refused =
            [401, 403].includes(result.status) || (result.headers.get("Location") ?? "").startsWith("/sign-in");
          if (!access.entitlement) expect(refused, `${role} on ${path} (status ${result.status})`).toBe(false);
          expect(result.status, `${role} on ${path}`).toBeLessThan(500);
        }
      } else {
        if (loader) expectRefused(await browser.call(loader, url, access.params ?? {}), path, role);
        if (module.action) expectRefused(await browser.submit(module.action, url, {}, access.params ?? {}), path, role);
      }
    }
  },
);
