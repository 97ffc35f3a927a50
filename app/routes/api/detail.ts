import type { Route } from "./+types/detail";
import { getViewer } from "~/access/viewer.server";
import { getDetailView } from "~/catalogue/detail.server";
import { jsonError } from "~/http/json";
import { STANDING_CAUTION } from "~/vocabulary/caution";

// GET /api/details/:slug — premium content only with access; otherwise 403 with the public preview.
export async function loader({ params, context }: Route.LoaderArgs) {
  const viewer = getViewer(context);
  const detail = await getDetailView(params.slug, viewer);
  if (!detail) return jsonError(404, "not_found", `No published detail "${params.slug}".`);
  if (detail.refusal) {
    const { error, message, offers } = detail.refusal;
    return jsonError(403, error, message, {
      offers,
      preview: {
        slug: detail.slug,
        title: detail.title,
        summary: detail.summary,
        tier: detail.tier,
        zones: detail.zones,
        excerpt: detail.preview?.excerpt,
        sets: detail.sets,
      },
    });
  }
  return Response.json({ detail, caution: STANDING_CAUTION });
}
