import { runSiteCheck, SiteCheckInputError, type SiteCheckResult } from "~/envelope";
import type { DetailFrontMatter } from "~/content/detail-schema";
import { materialLibrary } from "./materials.server";
import { siteFormSchema, siteInputFromForm } from "./site-form";
import type { UnitSystem } from "~/vocabulary/units";

export type SiteCheckOutcome =
  | { ok: true; result: SiteCheckResult; units: UnitSystem }
  | { ok: false; fieldErrors: Record<string, string[]> };

/** Validates a site form and runs the engine for one assembly; input problems come back per field. */
export async function checkAssemblyForSite(front: Pick<DetailFrontMatter, "assembly" | "layers">, input: unknown): Promise<SiteCheckOutcome> {
  const parsed = siteFormSchema.safeParse(input);
  if (!parsed.success) {
    const fieldErrors: Record<string, string[]> = {};
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? "form");
      (fieldErrors[key] ??= []).push(issue.message);
    }
    return { ok: false, fieldErrors };
  }
  const library = await materialLibrary();
  try {
    const result = runSiteCheck({ kind: front.assembly, layers: front.layers }, siteInputFromForm(parsed.data), library);
    return { ok: true, result, units: parsed.data.units };
  } catch (error) {
    if (error instanceof SiteCheckInputError) {
      const message = error.message.replace(`${error.field}: `, "");
      return { ok: false, fieldErrors: { [error.field]: [message.charAt(0).toUpperCase() + message.slice(1)] } };
    }
    throw error;
  }
}

/** Reads a site form from JSON or form-encoded bodies alike. */
export async function readSiteForm(request: Request): Promise<unknown> {
  const type = request.headers.get("Content-Type") ?? "";
  if (type.includes("application/json")) {
    try {
      return await request.json();
    } catch {
      return { __invalid: true };
    }
  }
  const form = await request.formData();
  return Object.fromEntries([...form.entries()].filter(([, value]) => typeof value === "string"));
}
