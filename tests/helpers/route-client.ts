// Calls route loaders and actions the way the server does, with a cookie jar, so integration tests
// exercise the real modules (guards, CSRF, sessions) without a browser.
import { isRouteErrorResponse } from "react-router";

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
  if (isDataLike(value)) return { status: value.init?.status ?? 200, headers: new Headers(value.init?.headers), body: value.data, thrown };
  if (isRouteErrorResponse(value)) return { status: value.status, headers: new Headers(), body: value.data, thrown };
  if (thrown) throw value;
  return { status: 200, headers: new Headers(), body: value, thrown };
}

type RouteFunction = (args: never) => unknown;

export class RouteClient {
  private cookie = "";

  /** What the root loader tells every page: the signed-in user and the CSRF token (its cookie is kept). */
  async root(): Promise<{ user: { id: number; displayName: string; role: string } | null; csrfToken: string }> {
    const { loadRootData } = await import("~/auth/root-data.server");
    const result = await normalise(await loadRootData(this.request("/")), false);
    this.absorb(result.headers);
    return result.body as { user: { id: number; displayName: string; role: string } | null; csrfToken: string };
  }

  async csrfToken(): Promise<string> {
    return (await this.root()).csrfToken;
  }

  request(path: string, init: { method?: string; form?: Record<string, string> | [string, string][]; headers?: Record<string, string> } = {}): Request {
    const headers = new Headers(init.headers);
    if (this.cookie) headers.set("Cookie", this.cookie);
    if (init.form) {
      if (!headers.has("Origin")) headers.set("Origin", APP_ORIGIN);
      return new Request(new URL(path, APP_ORIGIN), { method: init.method ?? "POST", headers, body: new URLSearchParams(init.form) });
    }
    return new Request(new URL(path, APP_ORIGIN), { method: init.method ?? "GET", headers });
  }

  /** Runs a loader or action (or loadRootData) and keeps any cookie it sets. */
  async call(fn: RouteFunction, path: string, params: Record<string, string>, init: Parameters<RouteClient["request"]>[1] = {}): Promise<RouteResult> {
    const request = this.request(path, init);
    const args = { request, params, context: {}, unstable_pattern: path };
    let result: RouteResult;
    try {
      // The route modules take the framework's generated argument types; these fields are the ones they read.
      const run = fn as unknown as (a: typeof args) => unknown;
      result = await normalise(await run(args), false);
    } catch (error) {
      result = await normalise(error, true);
    }
    this.absorb(result.headers);
    return result;
  }

  /** Posts a form with this browser's CSRF token added. */
  async submit(fn: RouteFunction, path: string, form: Record<string, string>, params: Record<string, string> = {}): Promise<RouteResult> {
    return this.call(fn, path, params, { form: { csrf: await this.csrfToken(), ...form } });
  }

  /** Posts a form whose fields repeat (checkbox groups, table rows), with this browser's CSRF token added. */
  async submitPairs(fn: RouteFunction, path: string, pairs: [string, string][], params: Record<string, string> = {}): Promise<RouteResult> {
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
