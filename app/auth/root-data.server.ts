import { data } from "react-router";
import { ensureCsrfToken } from "./csrf.server";
import { getUser, publicUser } from "./guards.server";

/** What every page knows about the visitor: the signed-in user's public fields and the CSRF token for forms. */
export async function loadRootData(request: Request) {
  const [user, csrf] = await Promise.all([getUser(request), ensureCsrfToken(request)]);
  const body = { user: user ? publicUser(user) : null, csrfToken: csrf.token };
  return data(body, csrf.setCookie ? { headers: { "Set-Cookie": csrf.setCookie } } : undefined);
}
