import { Readable } from "node:stream";
import type { Route } from "./+types/pack";
import { requireUser } from "~/auth/guards.server";
import { jsonError } from "~/http/json";
import { parsePackRequest } from "~/packs/pack-request";
import { downloadPack } from "~/packs/packs.server";
import { unitsFor } from "~/preferences/units.server";

// GET /sets/:slug/pack[?units=si|ip&zone=5A] — the set's ZIP. A visitor is sent to sign in (it is a
// link people click); a member without the set gets the premium refusal (403 JSON, ~/access/refusal).
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const user = requireUser(request, context);
  const packRequest = parsePackRequest(new URL(request.url).searchParams, await unitsFor(request));
  if (!packRequest)
    return jsonError(400, "bad_request", "units must be si or ip; zone a climate zone such as 5A, or own.");
  const result = await downloadPack({ id: user.id, role: user.role }, params.slug, packRequest);
  if (!result.ok) return jsonError(result.status, "not_found", result.message);
  return new Response(Readable.toWeb(result.body) as ReadableStream, {
    headers: {
      "Content-Type": "application/zip",
      // Unknown on a first download: the pack is streamed while it is built.
      ...(result.size !== null ? { "Content-Length": String(result.size) } : {}),
      "Content-Disposition": `attachment; filename="${result.fileName}"`,
      "Cache-Control": "private, no-store",
      "X-Pack-Key": result.key,
    },
  });
}
