// What the detail page shows: the detail as this viewer may see it, the site check already run for the
// site in the address (or the detail's first zone), and whether the member saved it.
import type { Viewer } from "~/access/premium.server";
import { isSaved } from "~/desk/saved.server";
import type { UnitSystem } from "~/vocabulary/units";
import { getDetailView } from "./detail.server";
import { checkAssemblyForSite, siteFormValues } from "./site-check.server";

/** Null: no published detail under that slug. */
export async function detailPage(slug: string, viewer: Viewer | null, units: UnitSystem, search: URLSearchParams) {
  const detail = await getDetailView(slug, viewer);
  if (!detail) return null;
  // The site as the panel wrote it into the address (the form without JavaScript), else the first zone.
  const site = new URLSearchParams(search);
  site.set("units", units);
  if (!site.has("zone") && !site.get("hdd") && site.get("country") !== "CA") site.set("zone", detail.zones[0] ?? "");
  const siteValues = siteFormValues(site);
  let initialCheck = null;
  if (detail.full) {
    const outcome = await checkAssemblyForSite({ assembly: detail.assembly, layers: detail.full.layers }, site);
    initialCheck = outcome.ok ? { result: outcome.result, units: outcome.units } : { fieldErrors: outcome.fieldErrors };
  }
  const saved = viewer ? await isSaved(viewer.id, detail.id) : null;
  return { detail, units, siteValues, initialCheck, saved };
}
