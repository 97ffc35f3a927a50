import { timingSafeEqual } from "node:crypto";
import { data } from "react-router";
import { env } from "~/config/env.server";
import { commitCookieSession, getCookieSession, randomToken } from "./session.server";

// CSRF scheme: a random per-session token lives in the signed, HttpOnly session cookie (it is also
// created for visitors, so sign-in and sign-up are covered) and is echoed in a hidden form field.
// Every state-changing action calls requireCsrf(), which also refuses a cross-site Origin.
// SameSite=Lax on the cookie is a third, independent layer.
export const CSRF_FIELD = "csrf";

/** The token for this browser; returns a Set-Cookie value when one had to be created. Called by the root loader. */
export async function ensureCsrfToken(request: Request): Promise<{ token: string; setCookie: string | null }> {
  const cookie = await getCookieSession(request);
  const existing = cookie.get("csrf");
  if (existing) return { token: existing, setCookie: null };
  const token = randomToken();
  cookie.set("csrf", token);
  return { token, setCookie: await commitCookieSession(cookie) };
}

function sameToken(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}

function originIsOurs(request: Request): boolean {
  const origin = request.headers.get("Origin");
  if (origin) return origin === new URL(env().APP_URL).origin || origin === new URL(request.url).origin;
  // No Origin (older clients): browsers that send Fetch Metadata still say where the request came from.
  const site = request.headers.get("Sec-Fetch-Site");
  return site === null || site === "same-origin" || site === "none";
}

/**
 * Refuses a forged state-changing request with 403, otherwise returns the submitted form.
 * Reads a clone, so the request body stays readable (remix-auth reads it again).
 */
export async function requireCsrf(request: Request): Promise<FormData> {
  const refuse = () =>
    data({ message: "This form expired or came from another site. Reload the page and try again." }, { status: 403 });
  if (!originIsOurs(request)) throw refuse();
  const form = await request.clone().formData();
  const submitted = form.get(CSRF_FIELD);
  const expected = (await getCookieSession(request)).get("csrf");
  if (typeof submitted !== "string" || !expected || !sameToken(submitted, expected)) throw refuse();
  return form;
}
