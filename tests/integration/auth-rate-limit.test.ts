import { expect, test } from "vitest";
import { useMigratedDatabase } from "../helpers/database";
import { useMailCatcher } from "../helpers/mail";

useMailCatcher();
useMigratedDatabase();

const password = "the right passphrase"; // our own minimum is 12 characters

async function member(email: string) {
  const { User } = await import("~/models/index.server");
  const { hashPassword } = await import("~/auth/password.server");
  return User.create({
    email,
    displayName: "Limit Tester",
    passwordHash: await hashPassword(password),
    emailVerifiedAt: new Date(),
  });
}

async function attempt(email: string, pass: string, address: string): Promise<string> {
  const { signInWithPassword } = await import("~/auth/accounts.server");
  try {
    await signInWithPassword({ email, password: pass, address });
    return "ok";
  } catch (error) {
    return (error as Error).message;
  }
}

test("five failures lock the account for 15 minutes, even for the right password and from another address", async () => {
  const { SIGN_IN_LIMITED, SIGN_IN_MISMATCH } = await import("~/auth/accounts.server");
  await member("locked@example.test");
  for (let i = 0; i < 5; i++)
    expect(await attempt("locked@example.test", "wrong guess", `10.0.0.${i}`)).toBe(SIGN_IN_MISMATCH);
  expect(await attempt("locked@example.test", password, "10.0.1.1")).toBe(SIGN_IN_LIMITED);
});

test("an unregistered address is limited exactly like a registered one, so the limit reveals nothing", async () => {
  const { SIGN_IN_LIMITED } = await import("~/auth/accounts.server");
  for (let i = 0; i < 5; i++) await attempt("ghost@example.test", "wrong guess", `10.0.2.${i}`);
  expect(await attempt("ghost@example.test", "wrong guess", "10.0.2.99")).toBe(SIGN_IN_LIMITED);
});

test("twenty failures from one client address lock that address for every account", async () => {
  const { SIGN_IN_LIMITED } = await import("~/auth/accounts.server");
  await member("victim@example.test");
  for (let i = 0; i < 20; i++) await attempt(`spray${i}@example.test`, "wrong guess", "192.0.2.7");
  expect(await attempt("victim@example.test", password, "192.0.2.7")).toBe(SIGN_IN_LIMITED);
  expect(await attempt("victim@example.test", password, "192.0.2.8")).toBe("ok");
});

test("the window slides: attempts older than 15 minutes stop counting", async () => {
  const { recordAttempt, isLimited } = await import("~/auth/rate-limit.server");
  const start = new Date();
  for (let i = 0; i < 5; i++) await recordAttempt("account", "window@example.test", false, start);
  expect(await isLimited("account", "window@example.test", new Date(start.getTime() + 14 * 60_000))).toBe(true);
  expect(await isLimited("account", "window@example.test", new Date(start.getTime() + 16 * 60_000))).toBe(false);
});

test("a correct sign-in clears the account's count", async () => {
  const { SIGN_IN_MISMATCH } = await import("~/auth/accounts.server");
  await member("forgetful@example.test");
  for (let i = 0; i < 4; i++) await attempt("forgetful@example.test", "wrong guess", "10.0.3.1");
  expect(await attempt("forgetful@example.test", password, "10.0.3.1")).toBe("ok");
  for (let i = 0; i < 4; i++)
    expect(await attempt("forgetful@example.test", "wrong guess", "10.0.3.1")).toBe(SIGN_IN_MISMATCH);
  expect(await attempt("forgetful@example.test", password, "10.0.3.1")).toBe("ok");
});

test("the client address is the entry our own proxy appended, not one the client typed", async () => {
  const { clientAddress } = await import("~/auth/rate-limit.server");
  const request = new Request("http://127.0.0.1/", { headers: { "X-Forwarded-For": "203.0.113.9, 198.51.100.4" } });
  expect(clientAddress(request)).toBe("198.51.100.4");
});
