import { UniqueConstraintError } from "sequelize";
import { env } from "~/config/env.server";
import { sendMailOrLog } from "~/mail/mailer.server";
import { alreadyRegisteredMail, resetPasswordMail, verifyEmailMail } from "~/mail/templates";
import { User } from "~/models/index.server";
import { recordAudit } from "./audit.server";
import { hashPassword, passwordNeedsRehash, verifyAgainstDecoy, verifyPassword } from "./password.server";
import { isLimited, pruneAttempts, recordAttempt } from "./rate-limit.server";
import { revokeUserSessions } from "./session.server";
import { consumeToken, issueToken } from "./tokens.server";

/** A refusal shown to the person as is; it never says whether the e-mail has an account. */
export class SignInError extends Error {
  override name = "SignInError";
}

export const SIGN_IN_MISMATCH = "That e-mail and password do not match an account.";
export const SIGN_IN_LIMITED = "Too many sign-in attempts. Wait 15 minutes and try again, or choose a new password.";

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

function link(path: string): string {
  return new URL(path, env().APP_URL).toString();
}

async function sendVerification(user: User): Promise<void> {
  const token = await issueToken(user.id, "verify-email");
  await sendMailOrLog(
    user.email,
    verifyEmailMail({ displayName: user.displayName, link: link(`/verify-email/${token}`) }),
  );
}

/** Mails to one typed-in address are capped so the site cannot be used to flood an inbox. */
async function mayMail(email: string): Promise<boolean> {
  if (await isLimited("mail", email)) return false;
  await recordAttempt("mail", email, false);
  return true;
}

/**
 * Creates an unverified member and mails a confirmation link. When the address already has an account
 * the owner gets a notice instead, and the caller sees the same outcome either way.
 */
export async function signUp(input: { email: string; displayName: string; password: string }): Promise<void> {
  const email = normaliseEmail(input.email);
  if (!(await mayMail(email))) return;
  const passwordHash = await hashPassword(input.password);
  let user: User;
  try {
    user = await User.create({ email, displayName: input.displayName.trim(), passwordHash, emailVerifiedAt: null });
  } catch (error) {
    if (!(error instanceof UniqueConstraintError)) throw error;
    const existing = await User.findOne({ where: { email } });
    if (existing) {
      await sendMailOrLog(
        email,
        alreadyRegisteredMail({
          displayName: existing.displayName,
          signInLink: link("/sign-in"),
          resetLink: link("/forgot-password"),
        }),
      );
    }
    return;
  }
  await recordAudit({ actorId: user.id, action: "user.signed_up", subjectType: "user", subjectId: user.id });
  await sendVerification(user);
}

/** Checks a password under the per-account and per-address limits; used by the form strategy. */
export async function signInWithPassword(input: { email: string; password: string; address: string }): Promise<User> {
  const email = normaliseEmail(input.email);
  if ((await isLimited("address", input.address)) || (await isLimited("account", email)))
    throw new SignInError(SIGN_IN_LIMITED);
  const user = await User.findOne({ where: { email } });
  const ok = user ? await verifyPassword(user.passwordHash, input.password) : await verifyAgainstDecoy(input.password);
  if (!user || !ok) {
    await recordAttempt("account", email, false);
    await recordAttempt("address", input.address, false);
    throw new SignInError(SIGN_IN_MISMATCH);
  }
  // Only the account's count is cleared by a success: one good account must not reset an address's count.
  await recordAttempt("account", email, true);
  await pruneAttempts();
  if (!user.emailVerifiedAt) {
    if (await mayMail(email)) await sendVerification(user);
    throw new SignInError("Confirm your e-mail address first: we have sent you a new link.");
  }
  if (passwordNeedsRehash(user.passwordHash)) await user.update({ passwordHash: await hashPassword(input.password) });
  await recordAudit({
    actorId: user.id,
    action: "user.signed_in",
    subjectType: "user",
    subjectId: user.id,
    details: { address: input.address },
  });
  return user;
}

/** Uses a verification link; true when the address is now confirmed. */
export async function verifyEmail(token: string): Promise<boolean> {
  const userId = await consumeToken(token, "verify-email");
  if (userId === null) return false;
  const user = await User.findByPk(userId);
  if (!user) return false;
  if (!user.emailVerifiedAt) {
    await user.update({ emailVerifiedAt: new Date() });
    await recordAudit({ actorId: user.id, action: "user.email_verified", subjectType: "user", subjectId: user.id });
  }
  return true;
}

/** Mails a reset link when the address has an account; the caller always shows the same message. */
export async function requestPasswordReset(rawEmail: string): Promise<void> {
  const email = normaliseEmail(rawEmail);
  const user = await User.findOne({ where: { email } });
  if (!user || !(await mayMail(email))) return;
  const token = await issueToken(user.id, "reset-password");
  await sendMailOrLog(
    user.email,
    resetPasswordMail({ displayName: user.displayName, link: link(`/reset-password/${token}`) }),
  );
}

/**
 * Sets a new password from a reset link and signs out every browser of that account. Following the link
 * proves the mailbox, so the address counts as verified. Returns false for a used or expired link.
 */
export async function resetPassword(token: string, password: string): Promise<boolean> {
  const userId = await consumeToken(token, "reset-password");
  if (userId === null) return false;
  const user = await User.findByPk(userId);
  if (!user) return false;
  await user.update({
    passwordHash: await hashPassword(password),
    emailVerifiedAt: user.emailVerifiedAt ?? new Date(),
  });
  await revokeUserSessions(user.id);
  await recordAudit({ actorId: user.id, action: "user.password_reset", subjectType: "user", subjectId: user.id });
  return true;
}
