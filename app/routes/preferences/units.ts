import { data, redirect } from "react-router";
import type { Route } from "./+types/units";
import { serializeUnits } from "~/preferences/units.server";
import { UNIT_SYSTEMS, parseUnitSystem } from "~/vocabulary/units";

// Resource route: the units toggle posts here (fetcher), or a plain form falls back to a redirect.
export async function action({ request }: Route.ActionArgs) {
  const form = await request.formData();
  const units = parseUnitSystem(form.get("units"));
  if (!units) return data({ error: `units must be one of: ${UNIT_SYSTEMS.join(", ")}` }, { status: 400 });
  const headers = { "Set-Cookie": await serializeUnits(units) };
  const back = request.headers.get("Referer");
  if (request.headers.get("Accept")?.includes("text/html") && back) return redirect(back, { headers });
  return data({ units }, { headers });
}
