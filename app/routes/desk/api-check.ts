import { z } from "zod";
import type { Route } from "./+types/api-check";

import { materialLibrary } from "~/catalogue/materials.server";
import { checkAssemblyForSite } from "~/catalogue/site-check.server";
import { ASSEMBLY_KINDS, layerSchema } from "~/content/detail-schema";
import { layerFieldsSchema, layersFromForm } from "~/desk/draft-form";
import { jsonError } from "~/http/json";

// POST /desk/api/check — the editor's layer table, checked for a site as the editor types.
// Reads nothing but the posted stack and the material library, and changes nothing.
// The body is one `payload` field holding JSON: the editor's live layer rows, as text.
const payloadSchema = z.object({
  assembly: z.string().default(""),
  layers: z.array(layerFieldsSchema).default([]),
  site: z.record(z.string(), z.string()).default({}),
});

const draftStackSchema = z.object({
  assembly: z.enum(ASSEMBLY_KINDS, { error: "Choose the assembly kind first." }),
  layers: z.array(layerSchema).min(2, "Add at least two layers."),
});

function readPayload(text: FormDataEntryValue | null): z.infer<typeof payloadSchema> | null {
  if (typeof text !== "string") return null;
  try {
    const parsed = payloadSchema.safeParse(JSON.parse(text));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export async function action({ request }: Route.ActionArgs) {
  const posted = readPayload((await request.formData()).get("payload"));
  if (!posted) return jsonError(400, "invalid_payload", "The check could not read the layer table.");
  const stack = draftStackSchema.safeParse({ assembly: posted.assembly, layers: layersFromForm(posted.layers) });
  if (!stack.success) {
    const first = stack.error.issues[0];
    const where = first.path[0] === "layers" && typeof first.path[1] === "number" ? `Layer ${first.path[1] + 1}: ` : "";
    return jsonError(
      400,
      "incomplete_stack",
      `${where}${first.path[0] === "layers" && first.path.length > 1 ? `${String(first.path[2] ?? "")} — ` : ""}${first.message}`,
    );
  }
  const library = await materialLibrary();
  const unknown = stack.data.layers.flatMap((layer) =>
    [layer.material, layer.framing?.material].filter((slug): slug is string => Boolean(slug) && !library.has(slug!)),
  );
  if (unknown.length) return jsonError(400, "unknown_material", `Not in the material library: ${unknown.join(", ")}.`);
  const outcome = await checkAssemblyForSite({ assembly: stack.data.assembly, layers: stack.data.layers }, posted.site);
  if (!outcome.ok)
    return jsonError(400, "invalid_site", "The site is not complete or not valid.", {
      fieldErrors: outcome.fieldErrors,
    });
  return Response.json({ result: outcome.result, units: outcome.units }, { headers: { "Cache-Control": "no-store" } });
}
