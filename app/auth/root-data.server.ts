import { data, type RouterContextProvider } from "react-router";
import { ensureCsrfToken } from "./csrf.server";
import { getUser, publicUser } from "./guards.server";

/** What every page knows about the visitor: the signed-in user's public fields and the CSRF token for forms. */
export async function loadRootData(request: Request, context: Readonly<RouterContextProvider>) {
  const user = getUser(context);
  const csrf = await ensureCsrfToken(request);
  const body = { user: user ? publicUser(user) : null, csrfToken: csrf.token };
  return data(body, csrf.setCookie ? { headers: { "Set-Cookie": csrf.setCookie } } : undefined);
}
