import type { Params } from "./form";

export type StandinRequest = {
  method: string;
  path: string;
  /** Named segments of the route pattern, e.g. `:id`. */
  params: Record<string, string>;
  query: Params;
  body: Params;
  requestId: string;
  idempotencyKey: string | null;
};

export type Reply =
  | { kind: "json"; status: number; body: unknown }
  | { kind: "html"; status: number; body: string }
  | { kind: "redirect"; location: string };

export type Handler = (request: StandinRequest) => Reply | Promise<Reply>;

export const json = (body: unknown, status = 200): Reply => ({ kind: "json", status, body });
export const html = (body: string, status = 200): Reply => ({ kind: "html", status, body });
export const redirect = (location: string): Reply => ({ kind: "redirect", location });

type Route = { method: string; pattern: RegExp; names: string[]; handler: Handler };

/** A tiny method + path router: `/v1/products/:id` patterns, first match wins. */
export class Router {
  private readonly routes: Route[] = [];

  add(method: string, path: string, handler: Handler): this {
    const names: string[] = [];
    const source = path
      .split("/")
      .map((segment) => {
        if (!segment.startsWith(":")) return segment.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
        names.push(segment.slice(1));
        return "([^/]+)";
      })
      .join("/");
    this.routes.push({ method, pattern: new RegExp(`^${source}$`), names, handler });
    return this;
  }

  match(method: string, path: string): { handler: Handler; params: Record<string, string> } | null {
    for (const route of this.routes) {
      if (route.method !== method) continue;
      const found = route.pattern.exec(path);
      if (!found) continue;
      const params = Object.fromEntries(route.names.map((name, i) => [name, decodeURIComponent(found[i + 1])]));
      return { handler: route.handler, params };
    }
    return null;
  }
}
