import { parseWithZod } from "@conform-to/zod/v4";
import { runSiteCheck, SiteCheckInputError, type SiteCheckResult } from "~/envelope";
import type { DetailFrontMatter } from "~/content/detail-schema";
import { materialLibrary } from "./materials.server";
import { formFieldOf, siteFormSchema, siteInputFromForm, type SiteForm } from "./site-form";
import type { UnitSystem } from "~/vocabulary/units";

export type SiteCheckOutcome =
  | { ok: true; result: SiteCheckResult; units: UnitSystem }
  | { ok: false; fieldErrors: Record<string, string[]> };

/** A posted or addressed form (field names as the panel writes them, e.g. "yearMonths[3].t"), or a
 * JSON body with the same fields nested. */
export type SiteFormValues = Record<string, unknown>;

export type SiteFormInput = FormData | URLSearchParams | unknown;

/** "yearMonths", 3, "t" → "yearMonths[3].t": the field names conform gives the panel's inputs. */
function fieldName(path: readonly PropertyKey[]): string {
  return (
    path.reduce<string>(
      (name, segment) =>
        typeof segment === "number" ? `${name}[${segment}]` : name ? `${name}.${String(segment)}` : String(segment),
      "",
    ) || "form"
  );
}

function parseSiteForm(
  input: SiteFormInput,
): { ok: true; form: SiteForm } | { ok: false; fieldErrors: Record<string, string[]> } {
  if (input instanceof FormData || input instanceof URLSearchParams) {
    const submission = parseWithZod(input, { schema: siteFormSchema });
    if (submission.status === "success") return { ok: true, form: submission.value };
    const fieldErrors: Record<string, string[]> = {};
    for (const [name, messages] of Object.entries(submission.error ?? {}))
      if (messages?.length) fieldErrors[name || "form"] = messages;
    return { ok: false, fieldErrors };
  }
  const parsed = siteFormSchema.safeParse(input);
  if (parsed.success) return { ok: true, form: parsed.data };
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of parsed.error.issues) (fieldErrors[fieldName(issue.path)] ??= []).push(issue.message);
  return { ok: false, fieldErrors };
}

/** The fields as typed, nested as the form names them (the panel's default values; nothing lost). */
export function siteFormValues(fields: URLSearchParams): SiteFormValues {
  return parseWithZod(fields, { schema: siteFormSchema }).payload;
}

/** Units to show a result in: SI first for a Canadian site (as the NBC writes), else the viewer's. */
export function resultUnits(result: SiteCheckResult, viewerUnits: UnitSystem): UnitSystem {
  return result.site.preferredUnits === "SI" ? "si" : viewerUnits;
}

/** Validates a site form and runs the engine for one assembly; input problems come back per field. */
export async function checkAssemblyForSite(
  front: Pick<DetailFrontMatter, "assembly" | "layers">,
  input: SiteFormInput,
): Promise<SiteCheckOutcome> {
  const parsed = parseSiteForm(input);
  if (!parsed.ok) return parsed;
  const library = await materialLibrary();
  try {
    const result = runSiteCheck(
      { kind: front.assembly, layers: front.layers },
      siteInputFromForm(parsed.form),
      library,
    );
    return { ok: true, result, units: resultUnits(result, parsed.form.units) };
  } catch (error) {
    if (error instanceof SiteCheckInputError) {
      const message = error.message.replace(`${error.field}: `, "");
      return {
        ok: false,
        fieldErrors: {
          [formFieldOf(error.field, parsed.form.country)]: [message.charAt(0).toUpperCase() + message.slice(1)],
        },
      };
    }
    throw error;
  }
}

/** Reads a site form from JSON or form-encoded bodies alike; a body that is not JSON is null. */
export async function readSiteForm(request: Request): Promise<SiteFormInput | null> {
  const type = request.headers.get("Content-Type") ?? "";
  if (type.includes("application/json")) {
    try {
      return await request.json();
    } catch {
      return null;
    }
  }
  const form = await request.formData();
  // A CSV may arrive as a file: the schema reads its text.
  const text = new FormData();
  for (const [name, value] of form.entries()) text.append(name, typeof value === "string" ? value : await value.text());
  return text;
}
