import { z } from "zod";
import { materialSchema, type Material } from "~/envelope/material-schema";

// The desk's material editor: its fields as a zod schema (read by conform on the page and in the
// action), checked by the material library's own schema, so a value entered here needs its source
// exactly as a content file does. Pure: the page validates with the same schema as the server.

export const MATERIAL_FLAGS = [
  "foam_plastic",
  "water_sensitive",
  "insect_risk",
  "solvent_sensitive",
  "vented_cladding",
] as const;
const THERMAL_KINDS = ["conductivity", "rsi_fixed"] as const;

const line = z.string().trim().default("");

/** The fields as posted, numbers still as typed, so a 400 gives back exactly what was typed. */
const materialFieldsSchema = z.object({
  name: line,
  family: line,
  thermal_kind: z.enum(THERMAL_KINDS).default("conductivity"),
  thermal_value: line,
  thermal_source: line,
  permeance_ng: line,
  at_thickness_mm: line,
  wet_cup_ng: line,
  /** One point a line: "RH %, ng/(s·m²·Pa)". */
  curve: line,
  vapour_source: line,
  flags: z.array(z.enum(MATERIAL_FLAGS)).default([]),
  notes: line,
});

export type MaterialFormValues = z.output<typeof materialFieldsSchema>;

export function materialToForm(material: Material): MaterialFormValues {
  return {
    name: material.name,
    family: material.family,
    thermal_kind: material.thermal.rsi_fixed !== undefined ? "rsi_fixed" : "conductivity",
    thermal_value: String(material.thermal.rsi_fixed ?? material.thermal.conductivity_w_mk ?? ""),
    thermal_source: material.thermal.source,
    permeance_ng: String(material.vapour.permeance_ng),
    at_thickness_mm: material.vapour.at_thickness_mm === undefined ? "" : String(material.vapour.at_thickness_mm),
    wet_cup_ng: material.vapour.wet_cup_ng === undefined ? "" : String(material.vapour.wet_cup_ng),
    curve: (material.vapour.curve ?? []).map(([rh, perm]) => `${rh}, ${perm}`).join("\n"),
    vapour_source: material.vapour.source,
    flags: MATERIAL_FLAGS.filter((flag) => material[flag]),
    notes: material.notes ?? "",
  };
}

// Text that is not a number stays text, so the library schema reports it as the wrong type.
const numberOrText = (value: string) =>
  value === "" ? undefined : Number.isFinite(Number(value)) ? Number(value) : value;

function candidate(slug: string, values: MaterialFormValues): Record<string, unknown> {
  const curve = values.curve
    .split("\n")
    .map((point) => point.trim())
    .filter(Boolean)
    .map((point) => point.split(/[,;\s]+/).map(numberOrText));
  return {
    slug,
    name: values.name,
    family: values.family,
    thermal: {
      [values.thermal_kind === "rsi_fixed" ? "rsi_fixed" : "conductivity_w_mk"]: numberOrText(values.thermal_value),
      source: values.thermal_source,
    },
    vapour: {
      permeance_ng: numberOrText(values.permeance_ng),
      ...(values.at_thickness_mm ? { at_thickness_mm: numberOrText(values.at_thickness_mm) } : {}),
      ...(values.wet_cup_ng ? { wet_cup_ng: numberOrText(values.wet_cup_ng) } : {}),
      ...(curve.length ? { curve } : {}),
      source: values.vapour_source,
    },
    ...Object.fromEntries(MATERIAL_FLAGS.map((flag) => [flag, values.flags.includes(flag)])),
    ...(values.notes ? { notes: values.notes } : {}),
  };
}

/** The form field a library-schema issue belongs to. */
const FIELD_OF: Record<string, keyof MaterialFormValues> = {
  name: "name",
  family: "family",
  thermal: "thermal_value",
  "thermal.conductivity_w_mk": "thermal_value",
  "thermal.rsi_fixed": "thermal_value",
  "thermal.source": "thermal_source",
  "vapour.permeance_ng": "permeance_ng",
  "vapour.at_thickness_mm": "at_thickness_mm",
  "vapour.wet_cup_ng": "wet_cup_ng",
  "vapour.curve": "curve",
  "vapour.source": "vapour_source",
  notes: "notes",
};

function fieldFor(path: readonly PropertyKey[]): keyof MaterialFormValues | null {
  const joined = path.filter((part) => typeof part === "string").join(".");
  return FIELD_OF[joined] ?? null;
}

/**
 * The schema conform parses the material form with, on the page and in the action: the fields, the
 * library's rules (each problem under its field), and as output the material itself.
 */
export function materialFormSchema(slug: string) {
  return materialFieldsSchema
    .superRefine((values, ctx) => {
      const parsed = materialSchema.safeParse(candidate(slug, values));
      if (parsed.success) return;
      for (const issue of parsed.error.issues) {
        const field = fieldFor(issue.path);
        const message = field?.endsWith("source") ? `${issue.message} (every value needs its source)` : issue.message;
        ctx.addIssue({ code: "custom", path: field ? [field] : [], message });
      }
    })
    .transform((values): Material => materialSchema.parse(candidate(slug, values)));
}
