import { expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { linkIn, useMailCatcher } from "../helpers/mail";
import { RouteClient } from "../helpers/route-client";

const mail = useMailCatcher();
useMigratedDatabase();

const password = "a long enough passphrase"; // our own minimum is 12 characters

async function member(email: string) {
  const { User } = await import("~/models/index.server");
  const { hashPassword } = await import("~/auth/password.server");
  return User.create({
    email,
    displayName: "Token Tester",
    passwordHash: await hashPassword(password),
    emailVerifiedAt: new Date(),
  });
}

test("a token works once", async () => {
  const { issueToken, consumeToken } = await import("~/auth/tokens.server");
  const user = await member("once@example.test");
  const token = await issueToken(user.id, "verify-email");
  expect(await consumeToken(token, "verify-email")).toBe(user.id);
  expect(await consumeToken(token, "verify-email")).toBeNull();
});

test("a token is only good for its own purpose", async () => {
  const { issueToken, consumeToken } = await import("~/auth/tokens.server");
  const user = await member("purpose@example.test");
  const token = await issueToken(user.id, "verify-email");
  expect(await consumeToken(token, "reset-password")).toBeNull();
  expect(await consumeToken(token, "verify-email")).toBe(user.id);
});

test("a reset token expires after one hour and a verification token after 24 hours", async () => {
  const { issueToken, consumeToken, peekToken } = await import("~/auth/tokens.server");
  const user = await member("expiry@example.test");
  const issued = new Date();
  const reset = await issueToken(user.id, "reset-password", issued);
  const minutes = (n: number) => new Date(issued.getTime() + n * 60_000);
  expect(await peekToken(reset, "reset-password", minutes(59))).toBe(user.id);
  expect(await consumeToken(reset, "reset-password", minutes(61))).toBeNull();
  const verify = await issueToken(user.id, "verify-email", issued);
  expect(await consumeToken(verify, "verify-email", minutes(24 * 60 + 1))).toBeNull();
  expect(await consumeToken(verify, "verify-email", minutes(23 * 60))).toBe(user.id);
});

test("only the hash of a token is stored", async () => {
  const { issueToken } = await import("~/auth/tokens.server");
  const { AuthToken } = await import("~/models/index.server");
  const user = await member("hash@example.test");
  const token = await issueToken(user.id, "reset-password");
  const rows = await AuthToken.findAll({ where: { userId: user.id } });
  expect(rows.map((row) => row.tokenHash)).not.toContain(token);
  expect(rows[0].tokenHash).toMatch(/^[0-9a-f]{64}$/); // SHA-256 in hex is 64 characters (FIPS 180-4)
});

test("a newer link replaces the older one", async () => {
  const { issueToken, consumeToken } = await import("~/auth/tokens.server");
  const user = await member("newer@example.test");
  const first = await issueToken(user.id, "reset-password");
  const second = await issueToken(user.id, "reset-password");
  expect(await consumeToken(first, "reset-password")).toBeNull();
  expect(await consumeToken(second, "reset-password")).toBe(user.id);
});

test("forgot password → mailed link → new password signs out other browsers; the link then stops working", async () => {
  const signIn = await import("~/routes/auth/sign-in");
  const forgot = await import("~/routes/auth/forgot-password");
  const reset = await import("~/routes/auth/reset-password");
  await member("reset@example.test");
  const laptop = new RouteClient();
  await laptop.submit(signIn.action, "/sign-in", { email: "reset@example.test", password });
  expect((await laptop.root()).user).not.toBeNull();

  const phone = new RouteClient();
  const asked = await phone.submit(forgot.action, "/forgot-password", { email: "reset@example.test" });
  expect(asked.body).toMatchObject({ sent: true });
  const unknown = await phone.submit(forgot.action, "/forgot-password", { email: "nobody@example.test" });
  expect(unknown.body).toMatchObject({ sent: true }); // same answer for an address without an account

  const message = mail.outbox().find((m) => m.to.includes("reset@example.test"))!;
  expect(message.subject).toBe("Choose a new Dryside password");
  const token = linkIn(message, "/reset-password").split("/").at(-1)!;
  const newPassword = "an entirely new passphrase";
  const done = await phone.submit(
    reset.action,
    `/reset-password/${token}`,
    { password: newPassword, confirmPassword: newPassword },
    { token },
  );
  expect(done.status).toBe(302);
  expect(done.headers.get("Location")).toBe("/sign-in?notice=reset");
  expect((await laptop.root()).user).toBeNull();

  const replay = await phone.submit(
    reset.action,
    `/reset-password/${token}`,
    { password: "yet another passphrase", confirmPassword: "yet another passphrase" },
    { token },
  );
  expect(replay.status).toBe(410);
  const oldPassword = await phone.submit(signIn.action, "/sign-in", { email: "reset@example.test", password });
  expect(oldPassword.status).toBe(401);
  const withNew = await phone.submit(signIn.action, "/sign-in", { email: "reset@example.test", password: newPassword });
  expect(withNew.status).toBe(302);
});
