import { expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { useMailCatcher } from "../helpers/mail";
import { RouteClient } from "../helpers/route-client";

useMailCatcher();
useMigratedDatabase();

const form = { email: "csrf@example.test", password: "does not matter here" };

test("a form without the token is refused with 403", async () => {
  const signIn = await import("~/routes/auth/sign-in");
  const browser = new RouteClient();
  await browser.root();
  const result = await browser.call(signIn.action, "/sign-in", {}, { form });
  expect(result.status).toBe(403);
  expect(result.thrown).toBe(true);
});

test("another browser's token is refused", async () => {
  const signIn = await import("~/routes/auth/sign-in");
  const victim = new RouteClient();
  const attacker = new RouteClient();
  const attackerToken = await attacker.csrfToken();
  await victim.root();
  const result = await victim.call(signIn.action, "/sign-in", {}, { form: { ...form, csrf: attackerToken } });
  expect(result.status).toBe(403);
});

test("a cross-site Origin is refused even with the right token", async () => {
  const signIn = await import("~/routes/auth/sign-in");
  const browser = new RouteClient();
  const csrf = await browser.csrfToken();
  const result = await browser.call(
    signIn.action,
    "/sign-in",
    {},
    { form: { ...form, csrf }, headers: { Origin: "https://elsewhere.test" } },
  );
  expect(result.status).toBe(403);
  const metadata = await browser.call(
    signIn.action,
    "/sign-in",
    {},
    { form: { ...form, csrf }, headers: { Origin: "null", "Sec-Fetch-Site": "cross-site" } },
  );
  expect(metadata.status).toBe(403);
});

test("the right token from our own origin passes the check (and reaches the password check)", async () => {
  const signIn = await import("~/routes/auth/sign-in");
  const browser = new RouteClient();
  const result = await browser.submit(signIn.action, "/sign-in", form);
  expect(result.status).toBe(401);
});

test("sign-out without the token does not sign anyone out", async () => {
  const signOut = await import("~/routes/auth/sign-out");
  const browser = new RouteClient();
  await browser.root();
  const result = await browser.call(signOut.action, "/sign-out", {}, { form: {} });
  expect(result.status).toBe(403);
});
