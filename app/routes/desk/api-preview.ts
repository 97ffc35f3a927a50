import { z } from "zod";
import type { Route } from "./+types/api-preview";

import { jsonError } from "~/http/json";
import { renderMarkdown } from "~/markdown/render.server";

// POST /desk/api/preview — the body as readers will see it: the same renderer and sanitiser as the
// published page. Changes nothing.
const MAX_CHARS = 200_000;
const previewSchema = z.object({ markdown: z.string({ error: "Send the Markdown as the `markdown` field." }) });

export async function action({ request }: Route.ActionArgs) {
  const posted = previewSchema.safeParse(Object.fromEntries(await request.formData()));
  if (!posted.success) return jsonError(400, "invalid_body", posted.error.issues[0].message);
  if (posted.data.markdown.length > MAX_CHARS) return jsonError(413, "too_long", "The body is too long to preview.");
  return Response.json({ html: renderMarkdown(posted.data.markdown) }, { headers: { "Cache-Control": "no-store" } });
}
