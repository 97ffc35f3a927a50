import type { Route } from "./+types/api-preview";
import { requireRole } from "~/auth/guards.server";
import { jsonError } from "~/http/json";
import { renderMarkdown } from "~/markdown/render.server";

// POST /desk/api/preview — the body as readers will see it: the same renderer and sanitiser as the
// published page. Changes nothing.
const MAX_CHARS = 200_000;

export async function action({ request }: Route.ActionArgs) {
  await requireRole(request, "editor");
  const markdown = (await request.formData()).get("markdown");
  if (typeof markdown !== "string") return jsonError(400, "invalid_body", "Send the Markdown as the `markdown` field.");
  if (markdown.length > MAX_CHARS) return jsonError(413, "too_long", "The body is too long to preview.");
  return Response.json({ html: renderMarkdown(markdown) }, { headers: { "Cache-Control": "no-store" } });
}
