import { expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { linkIn, useMailCatcher } from "../helpers/mail";
import { RouteClient } from "../helpers/route-client";

const mail = useMailCatcher();
useMigratedDatabase();

const password = "correct horse battery staple"; // a sample passphrase, longer than our 12-character minimum

async function routes() {
  return {
    signUp: await import("~/routes/auth/sign-up"),
    signIn: await import("~/routes/auth/sign-in"),
    signOut: await import("~/routes/auth/sign-out"),
    verify: await import("~/routes/auth/verify-email"),
    account: await import("~/routes/account/index"),
  };
}

function tokenOf(link: string): string {
  return link.split("/").at(-1)!;
}

test("sign up, confirm the e-mail from the caught mail, sign in, see the account, sign out", async () => {
  const r = await routes();
  const browser = new RouteClient();

  const signedUp = await browser.submit(r.signUp.action, "/sign-up", {
    displayName: "Ada Fenwright",
    email: "Ada@Example.test",
    password,
    confirmPassword: password,
  });
  expect(signedUp.status).toBe(200);
  expect(signedUp.body).toMatchObject({ sentTo: "Ada@Example.test" });

  const message = mail.outbox().find((m) => m.to.includes("ada@example.test"));
  expect(message?.subject).toBe("Confirm your e-mail for Dryside");
  expect(message?.html).toContain("Confirm my e-mail");
  const token = tokenOf(linkIn(message!, "/verify-email"));

  // Signing in before confirming is refused (and sends a fresh link).
  const early = await browser.submit(r.signIn.action, "/sign-in", { email: "ada@example.test", password });
  expect(early.status).toBe(401);
  expect(JSON.stringify(early.body)).toContain("Confirm your e-mail address first");

  const page = await browser.call(r.verify.loader, `/verify-email/${token}`, { token });
  expect(page.body).toEqual({ valid: false }); // the fresh link sent on the early sign-in replaced this one
  const fresh = mail
    .outbox()
    .filter((m) => m.to.includes("ada@example.test"))
    .at(-1)!;
  const freshToken = tokenOf(linkIn(fresh, "/verify-email"));
  expect((await browser.call(r.verify.loader, `/verify-email/${freshToken}`, { token: freshToken })).body).toEqual({
    valid: true,
  });
  const verified = await browser.submit(r.verify.action, `/verify-email/${freshToken}`, {}, { token: freshToken });
  expect(verified.status).toBe(302);
  expect(verified.headers.get("Location")).toBe("/sign-in?notice=verified");

  const signedIn = await browser.submit(r.signIn.action, "/sign-in", {
    email: "ada@example.test",
    password,
    next: "/account",
  });
  expect(signedIn.status).toBe(302);
  expect(signedIn.headers.get("Location")).toBe("/account");
  expect(signedIn.headers.get("Set-Cookie")).toMatch(/HttpOnly/i);
  expect(signedIn.headers.get("Set-Cookie")).toMatch(/SameSite=Lax/i);

  const account = await browser.call(r.account.loader, "/account", {});
  expect(account.status).toBe(200);
  expect(account.body).toMatchObject({
    profile: { email: "ada@example.test", displayName: "Ada Fenwright", role: "member" },
  });
  expect((await browser.root()).user).toMatchObject({ displayName: "Ada Fenwright", role: "member" });

  const signedOut = await browser.submit(r.signOut.action, "/sign-out", {});
  expect(signedOut.status).toBe(302);
  expect((await browser.root()).user).toBeNull();
  const after = await browser.call(r.account.loader, "/account", {});
  expect(after.status).toBe(302);
  expect(after.headers.get("Location")).toBe("/sign-in?next=%2Faccount");
});

test("a signed-out session id cannot be replayed: the server-side row is revoked", async () => {
  const r = await routes();
  const { User } = await import("~/models/index.server");
  const { hashPassword } = await import("~/auth/password.server");
  await User.create({
    email: "replay@example.test",
    displayName: "Replay Test",
    passwordHash: await hashPassword(password),
    emailVerifiedAt: new Date(),
  });
  const browser = new RouteClient();
  await browser.submit(r.signIn.action, "/sign-in", { email: "replay@example.test", password });
  const copy = Object.assign(new RouteClient(), browser); // a stolen copy of the cookie
  expect((await copy.root()).user?.displayName).toBe("Replay Test");
  await browser.submit(r.signOut.action, "/sign-out", {});
  expect((await copy.root()).user).toBeNull();
});

test("sign-in issues a new session id, so an id planted before sign-in is never promoted", async () => {
  const r = await routes();
  const { Session } = await import("~/models/index.server");
  const browser = new RouteClient();
  await browser.submit(r.signIn.action, "/sign-in", { email: "replay@example.test", password });
  const before = await Session.count();
  await browser.submit(r.signIn.action, "/sign-in", { email: "replay@example.test", password });
  expect(await Session.count()).toBe(before + 1);
  expect(await Session.count({ where: { revokedAt: null, userId: (await browser.root()).user!.id } })).toBe(1);
});

test("signing up with a registered address looks the same to the visitor and mails the owner a notice", async () => {
  const r = await routes();
  const browser = new RouteClient();
  const again = await browser.submit(r.signUp.action, "/sign-up", {
    displayName: "Someone Else",
    email: "ada@example.test",
    password,
    confirmPassword: password,
  });
  expect(again.status).toBe(200);
  expect(again.body).toMatchObject({ sentTo: "ada@example.test" });
  expect(mail.outbox().at(-1)).toMatchObject({
    subject: "You already have a Dryside account",
    to: ["ada@example.test"],
  });
});

test("an invalid sign-up answers 400 with field errors, keeps what was typed and never echoes the password", async () => {
  const r = await routes();
  const browser = new RouteClient();
  const result = await browser.submit(r.signUp.action, "/sign-up", {
    displayName: "Bo",
    email: "not-an-address",
    password: "short",
    confirmPassword: "other",
  });
  expect(result.status).toBe(400);
  const reply = (result.body as { result: { initialValue: Record<string, string>; error: Record<string, string[]> } })
    .result;
  expect(reply.initialValue).toMatchObject({ displayName: "Bo", email: "not-an-address" });
  expect(reply.initialValue.password).toBeUndefined();
  expect(Object.keys(reply.error)).toEqual(expect.arrayContaining(["email", "password"]));
});

test("a wrong password and an unknown e-mail get the same answer", async () => {
  const r = await routes();
  const browser = new RouteClient();
  const wrong = await browser.submit(r.signIn.action, "/sign-in", {
    email: "ada@example.test",
    password: "not the password at all",
  });
  const unknown = await browser.submit(r.signIn.action, "/sign-in", {
    email: "nobody@example.test",
    password: "not the password at all",
  });
  expect(wrong.status).toBe(401);
  expect(unknown.status).toBe(401);
  const formError = (x: typeof wrong) => (x.body as { result: { error: Record<string, string[]> } }).result.error[""];
  expect(formError(wrong)).toEqual(formError(unknown));
});

test("after sign-in only a same-site path is followed", async () => {
  const { safeNext } = await import("~/auth/guards.server");
  expect(safeNext("/details?zone=5A")).toBe("/details?zone=5A");
  expect(safeNext("//elsewhere.test/x")).toBe("/account");
  expect(safeNext("https://elsewhere.test")).toBe("/account");
  expect(safeNext("/\\elsewhere.test")).toBe("/account");
});
