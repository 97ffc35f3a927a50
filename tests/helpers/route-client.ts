// Calls route loaders and actions the way the server does, with a cookie jar, so integration tests
// exercise the real modules (guards, CSRF, sessions) without a browser. Like the server, it runs the
// middleware of the root and of every layout that matches the path (the area guards, the user lookup)
// before the loader or action, all sharing one request context.
import { resolve } from "node:path";
import type { RouteConfigEntry } from "@react-router/dev/routes";
import { RouterContextProvider, isRouteErrorResponse, matchRoutes } from "react-router";

export const APP_ORIGIN = "http://127.0.0.1:3000"; // the default APP_URL in app/config/env.server.ts

export interface RouteResult {
  status: number;
  headers: Headers;
  body: unknown;
  thrown: boolean;
}

interface DataLike {
  type: "DataWithResponseInit";
  data: unknown;
  init: ResponseInit | null;
}

function isDataLike(value: unknown): value is DataLike {
  return typeof value === "object" && value !== null && (value as { type?: unknown }).type === "DataWithResponseInit";
}

async function normalise(value: unknown, thrown: boolean): Promise<RouteResult> {
  if (value instanceof Response) {
    const text = await value.text();
    let body: unknown = text;
    try {
      body = text ? JSON.parse(text) : null;
    } catch {
      // not JSON
    }
    return { status: value.status, headers: value.headers, body, thrown };
  }
  if (isDataLike(value))
    return { status: value.init?.status ?? 200, headers: new Headers(value.init?.headers), body: value.data, thrown };
  if (isRouteErrorResponse(value)) return { status: value.status, headers: new Headers(), body: value.data, thrown };
  if (thrown) throw value;
  return { status: 200, headers: new Headers(), body: value, thrown };
}

type RouteFunction = (args: never) => unknown;

interface RouteArgs {
  request: Request;
  params: Record<string, string>;
  context: RouterContextProvider;
  url: URL;
  pattern: string;
}
type Middleware = (args: RouteArgs, next: () => Promise<unknown>) => Promise<unknown>;
interface MatchableRoute {
  path?: string;
  index?: boolean;
  file: string;
  children?: MatchableRoute[];
}

function matchable(entries: RouteConfigEntry[]): MatchableRoute[] {
  return entries.map((entry) => ({
    path: entry.path,
    index: entry.index,
    file: entry.file,
    children: entry.children ? matchable(entry.children) : undefined,
  }));
}

/** The middleware the server would run for this path: the root's, then each matching layout's and route's. */
async function middlewareFor(pathname: string): Promise<Middleware[]> {
  const { default: config } = await import("~/routes");
  const root = (await import("~/root")) as unknown as { middleware?: Middleware[] };
  const matches = (matchRoutes(matchable(config) as never, pathname) ?? []) as unknown as { route: MatchableRoute }[];
  const modules = await Promise.all(
    matches.map(
      (match) => import(/* @vite-ignore */ resolve("app", match.route.file)) as Promise<{ middleware?: Middleware[] }>,
    ),
  );
  return [...(root.middleware ?? []), ...modules.flatMap((module) => module.middleware ?? [])];
}

async function runMiddleware(
  middleware: Middleware[],
  args: RouteArgs,
  handler: () => Promise<unknown>,
): Promise<unknown> {
  const dispatch = (i: number): Promise<unknown> =>
    i < middleware.length ? middleware[i](args, () => dispatch(i + 1)) : handler();
  return dispatch(0);
}

export class RouteClient {
  private cookie = "";

  /** What the root loader tells every page: the signed-in user and the CSRF token (its cookie is kept). */
  async root(): Promise<{ user: { id: number; displayName: string; role: string } | null; csrfToken: string }> {
    const { loader } = await import("~/root");
    const result = await this.call(loader, "/", {});
    return result.body as { user: { id: number; displayName: string; role: string } | null; csrfToken: string };
  }

  async csrfToken(): Promise<string> {
    return (await this.root()).csrfToken;
  }

  request(
    path: string,
    init: {
      method?: string;
      form?: Record<string, string> | [string, string][];
      headers?: Record<string, string>;
    } = {},
  ): Request {
    const headers = new Headers(init.headers);
    if (this.cookie) headers.set("Cookie", this.cookie);
    if (init.form) {
      if (!headers.has("Origin")) headers.set("Origin", APP_ORIGIN);
      return new Request(new URL(path, APP_ORIGIN), {
        method: init.method ?? "POST",
        headers,
        body: new URLSearchParams(init.form),
      });
    }
    return new Request(new URL(path, APP_ORIGIN), { method: init.method ?? "GET", headers });
  }

  /** Runs a loader or action behind the middleware for its path, and keeps any cookie it sets. */
  async call(
    fn: RouteFunction,
    path: string,
    params: Record<string, string>,
    init: Parameters<RouteClient["request"]>[1] = {},
  ): Promise<RouteResult> {
    return (await this.document([fn], path, params, init))[0];
  }

  /**
   * Runs several loaders in one request, as a document request runs the root's and the page's: the
   * middleware runs once and they share its context. Answers one result per loader, in order.
   */
  async document(
    fns: RouteFunction[],
    path: string,
    params: Record<string, string>,
    init: Parameters<RouteClient["request"]>[1] = {},
  ): Promise<RouteResult[]> {
    const request = this.request(path, init);
    const args: RouteArgs = {
      request,
      params,
      context: new RouterContextProvider(),
      url: new URL(request.url),
      pattern: path,
    };
    // The route modules take the framework's generated argument types; these fields are the ones they read.
    const run = (fn: RouteFunction) => (fn as unknown as (a: RouteArgs) => unknown)(args);
    let results: RouteResult[];
    try {
      const values = await runMiddleware(await middlewareFor(new URL(request.url).pathname), args, async () =>
        Promise.all(
          fns.map(async (fn) => {
            try {
              return await normalise(await run(fn), false);
            } catch (error) {
              return normalise(error, true);
            }
          }),
        ),
      );
      results = values as RouteResult[];
    } catch (error) {
      // Refused by a middleware (a guard): every loader of the request gets the same answer.
      const refused = await normalise(error, true);
      results = fns.map(() => refused);
    }
    for (const result of results) this.absorb(result.headers);
    return results;
  }

  /** Runs a loader or action behind the middleware for its path and answers what it returned, untouched (a file's Response). */
  async respond(fn: RouteFunction, path: string | Request, params: Record<string, string>): Promise<unknown> {
    const request = typeof path === "string" ? this.request(path) : path;
    const args: RouteArgs = {
      request,
      params,
      context: new RouterContextProvider(),
      url: new URL(request.url),
      pattern: new URL(request.url).pathname,
    };
    try {
      return await runMiddleware(await middlewareFor(new URL(request.url).pathname), args, async () =>
        (fn as unknown as (a: RouteArgs) => unknown)(args),
      );
    } catch (error) {
      // A thrown Response is the answer, as the server sends it.
      if (error instanceof Response) return error;
      throw error;
    }
  }

  /** Posts a form with this browser's CSRF token added. */
  async submit(
    fn: RouteFunction,
    path: string,
    form: Record<string, string>,
    params: Record<string, string> = {},
  ): Promise<RouteResult> {
    return this.call(fn, path, params, { form: { csrf: await this.csrfToken(), ...form } });
  }

  /** Posts a form whose fields repeat (checkbox groups, table rows), with this browser's CSRF token added. */
  async submitPairs(
    fn: RouteFunction,
    path: string,
    pairs: [string, string][],
    params: Record<string, string> = {},
  ): Promise<RouteResult> {
    return this.call(fn, path, params, { form: [["csrf", await this.csrfToken()], ...pairs] });
  }

  private absorb(headers: Headers) {
    for (const setCookie of headers.getSetCookie()) {
      const [pair] = setCookie.split(";");
      const [name] = pair.split("=");
      const rest = this.cookie.split("; ").filter((c) => c && !c.startsWith(`${name}=`));
      this.cookie = [...rest, pair].join("; ");
    }
  }
}
