import type { Route } from "./+types/detail-check";
import { requireEntitlement } from "~/access/premium.server";
import { getViewer } from "~/access/viewer.server";
import { getPublishedAssembly } from "~/catalogue/detail.server";
import { checkAssemblyForSite, readSiteForm } from "~/catalogue/site-check.server";
import { jsonError } from "~/http/json";

// POST /api/details/:slug/check — runs the site check of a published detail for the posted site.
export async function action({ request, params, context }: Route.ActionArgs) {
  if (request.method !== "POST") return jsonError(405, "method_not_allowed", "Use POST with a site (zone, or hdd and cdd).");
  const [viewer, detail] = await Promise.all([getViewer(context), getPublishedAssembly(params.slug)]);
  if (!detail) return jsonError(404, "not_found", `No published detail "${params.slug}".`);
  await requireEntitlement(viewer, { what: "The site check of this detail", detail });
  const input = await readSiteForm(request);
  const outcome = await checkAssemblyForSite(detail.frontMatter, input);
  if (!outcome.ok) return jsonError(400, "invalid_site", "The site is not complete or not valid.", { fieldErrors: outcome.fieldErrors });
  return Response.json({ result: outcome.result, units: outcome.units }, { headers: { "Cache-Control": "no-store" } });
}

export function loader() {
  return jsonError(405, "method_not_allowed", "Use POST with a site (zone, or hdd and cdd).");
}
