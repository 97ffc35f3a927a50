import { databaseIsUp } from "~/db/sequelize.server";

// Resource route for load balancers and the start script: 200 when the database answers, 503 when not.
export async function loader() {
  const started = performance.now();
  const database = await databaseIsUp();
  const body = {
    status: database ? "ok" : "degraded",
    database: database ? "up" : "down",
    ms: Math.round(performance.now() - started),
  };
  return Response.json(body, { status: database ? 200 : 503, headers: { "Cache-Control": "no-store" } });
}
