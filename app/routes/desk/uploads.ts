import type { Route } from "./+types/uploads";
import { requireCsrf } from "~/auth/csrf.server";
import { userContext } from "~/auth/guards.server";
import { deskStep, refusedJson } from "~/desk/desk-step.server";
import { readUploadRequest } from "~/desk/upload-form";
import { MAX_UPLOAD_BYTES, removeUpload, storeUpload } from "~/desk/uploads.server";
import { jsonError } from "~/http/json";

// POST /desk/revisions/:id/uploads — attach a drawing or photo (multipart, from the upload component),
// or remove one (intent=remove). Answers JSON for the XMLHttpRequest that sent it.
export async function action({ request, params, context }: Route.ActionArgs) {
  const user = context.get(userContext);
  // Refuse an oversized body before reading it; the multipart overhead is allowed for.
  const length = Number(request.headers.get("Content-Length") ?? 0);
  if (length > MAX_UPLOAD_BYTES + 64 * 1024) return jsonError(413, "too_large", "That file is larger than 5 MB.");
  const form = await requireCsrf(request);
  const posted = readUploadRequest(form);
  if (!posted.success) return jsonError(400, "invalid_request", posted.error.issues[0].message);
  const upload = posted.data;
  return deskStep(async () => {
    if (upload.intent === "remove") {
      await removeUpload(user, upload.uploadId);
      return Response.json({ removed: true });
    }
    const stored = await storeUpload(user, Number(params.id) || 0, upload.file, upload.caption);
    return Response.json({ upload: stored }, { status: 201 });
  }, refusedJson);
}
