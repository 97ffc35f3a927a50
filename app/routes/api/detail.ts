import type { Route } from "./+types/detail";
import { getViewer } from "~/access/viewer.server";
import { getDetailView } from "~/catalogue/detail.server";
import { jsonError } from "~/http/json";
import { STANDING_CAUTION } from "~/vocabulary/caution";

// GET /api/details/:slug — premium content only with access; otherwise 403 with the public preview.
export async function loader({ request, params }: Route.LoaderArgs) {
  const viewer = await getViewer(request);
  const detail = await getDetailView(params.slug, viewer);
  if (!detail) return jsonError(404, "not_found", `No published detail "${params.slug}".`);
  if (detail.access !== "full") {
    const { full: _hidden, ...preview } = detail;
    return jsonError(403, "premium_required", "This detail is premium: a plan or the set that contains it gives full access.", {
      preview: { slug: preview.slug, title: preview.title, summary: preview.summary, tier: preview.tier, zones: preview.zones, excerpt: preview.preview?.excerpt, sets: preview.sets },
    });
  }
  return Response.json({ detail, caution: STANDING_CAUTION });
}
