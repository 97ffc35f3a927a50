import { Op } from "sequelize";
import { SignInAttempt } from "~/models/index.server";

// Counted in the database so the limits hold across every app server behind the load balancer.
export const RATE_LIMITS = {
  account: { failures: 5, windowMs: 15 * 60 * 1000 },
  address: { failures: 20, windowMs: 15 * 60 * 1000 },
  // Password-reset and sign-up mails per address typed in: stops using Dryside to flood someone's inbox.
  mail: { failures: 3, windowMs: 15 * 60 * 1000 },
} as const;

export type LimitKind = keyof typeof RATE_LIMITS;

export function bucket(kind: LimitKind, key: string): string {
  return `${kind}:${key.trim().toLowerCase()}`.slice(0, 300);
}

/**
 * The client address as the nearest proxy reports it: the last X-Forwarded-For entry is the one our own
 * load balancer appended (earlier entries are client-supplied and could be forged).
 */
export function clientAddress(request: Request): string {
  const forwarded = request.headers.get("X-Forwarded-For");
  const last = forwarded
    ?.split(",")
    .map((part) => part.trim())
    .filter(Boolean)
    .at(-1);
  return last ?? request.headers.get("X-Real-IP") ?? "direct";
}

/** Failures in the window since the bucket's last success (a correct sign-in clears the account's count). */
export async function recentFailures(bucketName: string, windowMs: number, now = new Date()): Promise<number> {
  const windowStart = new Date(now.getTime() - windowMs);
  const lastSuccess = await SignInAttempt.max<Date | null, SignInAttempt>("createdAt", {
    where: { bucket: bucketName, succeeded: true, createdAt: { [Op.gt]: windowStart } },
  });
  const since = lastSuccess && lastSuccess > windowStart ? lastSuccess : windowStart;
  return SignInAttempt.count({ where: { bucket: bucketName, succeeded: false, createdAt: { [Op.gt]: since } } });
}

export async function isLimited(kind: LimitKind, key: string, now = new Date()): Promise<boolean> {
  const limit = RATE_LIMITS[kind];
  return (await recentFailures(bucket(kind, key), limit.windowMs, now)) >= limit.failures;
}

export async function recordAttempt(kind: LimitKind, key: string, succeeded: boolean, now = new Date()): Promise<void> {
  await SignInAttempt.create({ bucket: bucket(kind, key), succeeded, createdAt: now });
}

/** Drops attempts older than the longest window; cheap enough to run on every sign-in. */
export async function pruneAttempts(now = new Date()): Promise<void> {
  const longest = Math.max(...Object.values(RATE_LIMITS).map((limit) => limit.windowMs));
  await SignInAttempt.destroy({ where: { createdAt: { [Op.lt]: new Date(now.getTime() - longest) } } });
}
