import type { Route } from "./+types/detail-check";
import { requireEntitlement } from "~/access/premium.server";
import { getViewer } from "~/access/viewer.server";
import { getPublishedAssembly } from "~/catalogue/detail.server";
import { checkAssemblyForSite, readSiteForm } from "~/catalogue/site-check.server";
import { jsonError } from "~/http/json";

// POST /api/details/:slug/check — runs the site check of a published detail for the posted site
// (fields in docs/api.md); the result carries the seasonal balance, the indoor basis and the code compared.
export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "POST")
    return jsonError(405, "method_not_allowed", "Use POST with a site (zone, or hdd and cdd).");
  const [viewer, detail] = await Promise.all([getViewer(context), getPublishedAssembly(params.slug)]);
  if (!detail) return jsonError(404, "not_found", `No published detail "${params.slug}".`);
  await requireEntitlement(viewer, { what: "The site check of this detail", detail });
  const input = await readSiteForm(request);
  if (input === null)
    return jsonError(
      400,
      "invalid_json",
      "The body is not valid JSON: send the site fields as a JSON object or a form (docs/api.md).",
    );
  const outcome = await checkAssemblyForSite(detail.frontMatter, input);
  if (!outcome.ok) {
    const [field, messages] = Object.entries(outcome.fieldErrors)[0] ?? ["form", ["not valid"]];
    return jsonError(400, "invalid_site", `The site is not complete or not valid: ${field}: ${messages.join(" ")}`, {
      fieldErrors: outcome.fieldErrors,
    });
  }
  return Response.json({ result: outcome.result, units: outcome.units }, { headers: { "Cache-Control": "no-store" } });
}

export function loader() {
  return jsonError(405, "method_not_allowed", "Use POST with a site (zone, or hdd and cdd).");
}
