import { databaseIsUp } from "./sequelize.server";

const UNAVAILABLE_PAGE = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Dryside is catching its breath</title>
<meta name="viewport" content="width=device-width,initial-scale=1"><meta http-equiv="refresh" content="10">
<style>body{font:16px/1.5 system-ui,sans-serif;background:#f7f2e8;color:#2c2c2a;max-width:36rem;margin:10vh auto;padding:0 1rem}h1{font-family:Georgia,serif}</style></head>
<body><h1>The library is briefly unavailable</h1><p>Dryside cannot reach its database right now. Nothing you saved is lost.
This page retries by itself every ten seconds.</p></body></html>`;

/**
 * Turns a server error caused by a database outage into a plain 503 with Retry-After.
 * The pool reconnects on the next request, so recovery needs no restart.
 */
export async function replaceWithUnavailableIfDatabaseDown(request: Request, response: Response): Promise<Response> {
  if (response.status < 500 || response.status === 503) return response;
  if (await databaseIsUp()) return response;
  const wantsJson =
    new URL(request.url).pathname.startsWith("/api/") || request.headers.get("accept")?.includes("application/json");
  const headers = { "Retry-After": "10", "Cache-Control": "no-store" };
  return wantsJson
    ? Response.json(
        { error: "database_unavailable", message: "The database is unavailable; retry shortly." },
        { status: 503, headers },
      )
    : new Response(UNAVAILABLE_PAGE, {
        status: 503,
        headers: { ...headers, "Content-Type": "text/html; charset=utf-8" },
      });
}
