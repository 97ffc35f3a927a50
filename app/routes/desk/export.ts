import { data } from "react-router";
import type { Route } from "./+types/export";

import { exportDetailMarkdown } from "~/catalogue/export-markdown";
import { loadRevision } from "~/desk/revisions.server";

// GET /desk/revisions/:id/export — the revision as a content file (content/details/<slug>.md).
export async function loader({ params }: Route.LoaderArgs) {
  const found = await loadRevision(Number(params.id) || 0);
  if (!found) throw data({ message: "No such revision." }, { status: 404 });
  const front = found.revision.frontMatter;
  return new Response(exportDetailMarkdown(front, found.revision.bodyMd), {
    headers: {
      "Content-Type": "text/markdown; charset=utf-8",
      "Content-Disposition": `attachment; filename="${front.slug}.md"`,
      "Cache-Control": "no-store",
    },
  });
}
