import type { Route } from "./+types/uploads";
import { requireCsrf } from "~/auth/csrf.server";
import { requireRole } from "~/auth/guards.server";
import { DeskError } from "~/desk/revisions.server";
import { MAX_UPLOAD_BYTES, removeUpload, storeUpload } from "~/desk/uploads.server";
import { jsonError } from "~/http/json";

// POST /desk/revisions/:id/uploads — attach a drawing or photo (multipart, from the upload component),
// or remove one (intent=remove). Answers JSON for the XMLHttpRequest that sent it.
export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireRole(request, "editor");
  // Refuse an oversized body before reading it; the multipart overhead is allowed for.
  const length = Number(request.headers.get("Content-Length") ?? 0);
  if (length > MAX_UPLOAD_BYTES + 64 * 1024) return jsonError(413, "too_large", "That file is larger than 5 MB.");
  const form = await requireCsrf(request);
  try {
    if (form.get("intent") === "remove") {
      await removeUpload(user, Number(form.get("uploadId")) || 0);
      return Response.json({ removed: true });
    }
    const file = form.get("file");
    if (!(file instanceof File)) return jsonError(400, "no_file", "Choose a file to attach.");
    const caption = form.get("caption");
    const upload = await storeUpload(user, Number(params.id) || 0, file, typeof caption === "string" ? caption : "");
    return Response.json({ upload }, { status: 201 });
  } catch (error) {
    if (error instanceof DeskError) return jsonError(error.status, "refused", error.message);
    throw error;
  }
}
