import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import { addApiRoutes } from "./api";
import { ApiError } from "./api-error";
import { Billing, type Publish } from "./billing";
import { addCheckoutPageRoutes } from "./checkout-page";
import { addControlRoutes } from "./control";
import { parseForm, Params } from "./form";
import { API_VERSION, newId, nowSeconds, type StandinEvent } from "./objects";
import { json, Router, type Reply } from "./router";
import { render, Store } from "./store";
import { WebhookSender } from "./webhooks";

export type PaymentsStandinOptions = {
  /** 0 picks a free port. */
  port: number;
  host?: string;
  /** Where events are POSTed, e.g. the app's `/api/payments/webhook`. */
  webhookUrl: string;
  /** The endpoint secret the app verifies signatures with (`whsec_...`). */
  webhookSecret: string;
  /** Base of the hosted checkout links when the stand-in is reached through another address. */
  publicUrl?: string;
  /** JSON file that keeps the state across restarts; memory only when absent. */
  stateFile?: string;
  /** Waits before retries of a failed webhook delivery (bounded: one retry per entry). */
  webhookRetryDelaysMs?: number[];
  /** How long the checkout redirect and test controls wait for webhooks before answering anyway. */
  webhookWaitMs?: number;
};

export type PaymentsStandin = { url: string; port: number; close(): Promise<void> };

const MAX_BODY_BYTES = 1024 * 1024;
const IDEMPOTENCY_CACHE_SIZE = 2000;

export async function startPaymentsStandin(options: PaymentsStandinOptions): Promise<PaymentsStandin> {
  const host = options.host ?? "127.0.0.1";
  const webhookWaitMs = options.webhookWaitMs ?? 5000;
  const store = new Store(options.stateFile);
  const sender = new WebhookSender({
    url: options.webhookUrl,
    secret: options.webhookSecret,
    retryDelaysMs: options.webhookRetryDelaysMs,
    onAttempt: () => store.save(),
  });
  const publish: Publish = (type, object, { previous, request } = {}) => {
    const event: StandinEvent = {
      id: newId("evt"),
      object: "event",
      api_version: API_VERSION,
      created: nowSeconds(),
      data: { object: render(store, object), ...(previous ? { previous_attributes: previous } : {}) },
      livemode: false,
      pending_webhooks: 1,
      request: request ?? { id: null, idempotency_key: null },
      type,
    };
    const record = store.addEvent(event);
    store.save();
    return sender.enqueue(record);
  };
  const billing = new Billing(store, publish);
  let publicUrl = options.publicUrl ?? "";

  const router = new Router();
  router.add("GET", "/healthz", () => json({ status: "ok" }));
  addApiRoutes(router, { store, billing, publicUrl: () => publicUrl });
  addCheckoutPageRoutes(router, { store, billing, webhookWaitMs });
  addControlRoutes(router, { store, billing, sender, webhookWaitMs });

  const idempotent = new Map<string, Reply>();

  async function handle(request: IncomingMessage, response: ServerResponse): Promise<void> {
    const method = request.method ?? "GET";
    const url = new URL(request.url ?? "/", "http://standin.invalid");
    const requestId = newId("req", 14);
    response.setHeader("request-id", requestId);
    let reply: Reply;
    try {
      const rawBody = await readBody(request);
      const isApi = url.pathname.startsWith("/v1/");
      if (isApi && !hasApiKey(request.headers.authorization)) throw ApiError.unauthorized();
      const idempotencyKey = headerValue(request.headers["idempotency-key"]);
      const cached = isApi && method === "POST" && idempotencyKey ? idempotent.get(idempotencyKey) : undefined;
      const found = router.match(method, url.pathname);
      if (cached) {
        reply = cached;
      } else if (!found) {
        throw isApi
          ? ApiError.unknownRoute(method, url.pathname)
          : new ApiError(404, { type: "invalid_request_error", message: "Not found" });
      } else {
        reply = await found.handler({
          method,
          path: url.pathname,
          params: found.params,
          query: new Params(parseForm(url.search.slice(1))),
          body: new Params(parseForm(rawBody)),
          requestId,
          idempotencyKey,
        });
        if (isApi && method === "POST" && idempotencyKey) remember(idempotent, idempotencyKey, reply);
      }
    } catch (error) {
      reply = errorReply(error);
    }
    if (method !== "GET") store.save();
    send(response, reply);
  }

  const server = createServer((request, response) => void handle(request, response));
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port, host, () => resolve());
  });
  const address = server.address();
  if (address === null || typeof address === "string") throw new Error("payments stand-in: no TCP address");
  const port = address.port;
  const url = `http://${host}:${port}`;
  publicUrl = options.publicUrl?.replace(/\/$/, "") ?? url;

  return {
    url,
    port,
    close: async () => {
      sender.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      store.save();
    },
  };
}

/** Any non-empty key is accepted, sent as a Bearer token (the SDK) or as the Basic user name (curl -u). */
function hasApiKey(authorization: string | undefined): boolean {
  if (!authorization) return false;
  const [scheme, credentials = ""] = authorization.split(" ");
  if (scheme === "Bearer") return credentials.trim() !== "";
  if (scheme === "Basic") return Buffer.from(credentials, "base64").toString("utf8").split(":")[0] !== "";
  return false;
}

function headerValue(value: string | string[] | undefined): string | null {
  return (Array.isArray(value) ? value[0] : value) ?? null;
}

function remember(cache: Map<string, Reply>, key: string, reply: Reply): void {
  cache.set(key, reply);
  const oldest = cache.keys().next();
  if (cache.size > IDEMPOTENCY_CACHE_SIZE && !oldest.done) cache.delete(oldest.value);
}

async function readBody(request: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of request) {
    const buffer = Buffer.isBuffer(chunk) ? chunk : Buffer.from(String(chunk));
    size += buffer.length;
    if (size > MAX_BODY_BYTES)
      throw new ApiError(413, { type: "invalid_request_error", message: "Request body too large." });
    chunks.push(buffer);
  }
  return Buffer.concat(chunks).toString("utf8");
}

function errorReply(error: unknown): Reply {
  if (error instanceof ApiError) return json({ error: error.body }, error.status);
  console.error("[payments-standin]", error);
  return json(
    { error: { type: "api_error", message: "The payments stand-in failed on this request; see its log." } },
    500,
  );
}

function send(response: ServerResponse, reply: Reply): void {
  if (reply.kind === "redirect") {
    response.writeHead(303, { location: reply.location }).end();
    return;
  }
  const isJson = reply.kind === "json";
  const body = isJson ? JSON.stringify(reply.body, null, 2) : reply.body;
  response
    .writeHead(reply.status, {
      "content-type": isJson ? "application/json" : "text/html; charset=utf-8",
      "content-length": Buffer.byteLength(body),
      "cache-control": "no-store",
    })
    .end(body);
}
