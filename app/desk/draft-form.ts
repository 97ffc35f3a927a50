import type { z } from "zod";
import { missingBodySections } from "~/vocabulary/body-sections";
import { detailFrontMatterSchema, type DetailFrontMatter } from "~/content/detail-schema";

// The desk's detail form as the browser posts it, and its validation against the same schema the
// content files use, so a web draft and a file can never mean different things. Pure: shared by the
// server (validation) and the page (typed values).

export interface LayerFormValues {
  role: string;
  material: string;
  thickness_mm: string;
  framing_material: string;
  framing_fraction: string;
  joints: string;
}

export interface DraftFormValues {
  slug: string;
  title: string;
  summary: string;
  assembly: string;
  substrate: string;
  below_grade: string;
  strategy: string;
  tier: string;
  zones: string[];
  sets: string[];
  /** One reference per line. */
  references: string;
  change_note: string;
  body: string;
  layers: LayerFormValues[];
}

/** Field name → messages; layer fields are named `layers.<i>.<field>`. */
export type FieldErrors = Record<string, string[]>;

/** Until a reviewer approves, the front matter names no reviewer; publication writes the real one. */
export const AWAITING_REVIEW = "(awaiting review)";

const LAYER_FIELDS = ["role", "material", "thickness_mm", "framing_material", "framing_fraction", "joints"] as const;

function text(form: FormData, name: string): string {
  const value = form.get(name);
  return typeof value === "string" ? value : "";
}

function texts(form: FormData, name: string): string[] {
  return form.getAll(name).filter((value): value is string => typeof value === "string");
}

/** Reads the posted form; layer inputs repeat in table order (`layer-role`, `layer-material`, …). */
export function valuesFromFormData(form: FormData): DraftFormValues {
  const columns = Object.fromEntries(LAYER_FIELDS.map((field) => [field, texts(form, `layer-${field}`)])) as Record<(typeof LAYER_FIELDS)[number], string[]>;
  const count = Math.max(...LAYER_FIELDS.map((field) => columns[field].length));
  const layers = Array.from({ length: count }, (_, i) => Object.fromEntries(LAYER_FIELDS.map((field) => [field, columns[field][i] ?? ""])) as unknown as LayerFormValues);
  return {
    slug: text(form, "slug").trim(),
    title: text(form, "title").trim(),
    summary: text(form, "summary").trim(),
    assembly: text(form, "assembly"),
    substrate: text(form, "substrate"),
    below_grade: text(form, "below_grade"),
    strategy: text(form, "strategy"),
    tier: text(form, "tier"),
    zones: texts(form, "zones"),
    sets: texts(form, "sets"),
    references: text(form, "references"),
    change_note: text(form, "change_note").trim(),
    body: text(form, "body").replace(/\r\n?/g, "\n"),
    layers,
  };
}

export function valuesFromFrontMatter(front: DetailFrontMatter, body: string): DraftFormValues {
  return {
    slug: front.slug,
    title: front.title,
    summary: front.summary,
    assembly: front.assembly,
    substrate: front.substrate,
    below_grade: front.below_grade,
    strategy: front.strategy,
    tier: front.tier,
    zones: [...front.zones],
    sets: [...front.sets],
    references: front.references.join("\n"),
    change_note: front.change_note ?? "",
    body,
    layers: front.layers.map((layer) => ({
      role: layer.role,
      material: layer.material,
      thickness_mm: String(layer.thickness_mm),
      framing_material: layer.framing?.material ?? "",
      framing_fraction: layer.framing ? String(layer.framing.fraction) : "",
      joints: layer.joints ?? "",
    })),
  };
}

function numberOrText(value: string): number | string | undefined {
  const trimmed = value.trim();
  if (trimmed === "") return undefined;
  const number = Number(trimmed);
  return Number.isFinite(number) ? number : trimmed;
}

/** The front matter the form describes, before validation. Author and revision come from the desk, never the form. */
export function candidateFrontMatter(values: DraftFormValues, fixed: { author: string; revision: number; revised: string; keep?: Partial<DetailFrontMatter> }): Record<string, unknown> {
  return {
    slug: values.slug,
    title: values.title,
    summary: values.summary,
    assembly: values.assembly,
    substrate: values.substrate,
    below_grade: values.below_grade,
    strategy: values.strategy,
    zones: values.zones,
    tier: values.tier,
    sets: values.sets,
    revision: fixed.revision,
    ...(fixed.revision > 1 ? { revised: fixed.revised } : {}),
    ...(values.change_note ? { change_note: values.change_note } : {}),
    author: fixed.author,
    reviewer: AWAITING_REVIEW,
    references: values.references.split("\n").map((line) => line.trim()).filter(Boolean),
    layers: layersFromForm(values.layers, fixed.keep?.layers),
  };
}

/** Layer rows as front-matter layers (unvalidated); keys the form does not edit are carried over from `keep`. */
export function layersFromForm(layers: readonly LayerFormValues[], keep?: readonly DetailFrontMatter["layers"][number][]): Record<string, unknown>[] {
  return layers.map((layer, i) => {
    const kept = keep?.[i];
    // Notes, adhesive and exposure stay with the layer when its material is unchanged.
    const carried = kept && kept.material === layer.material ? { note: kept.note, adhesive: kept.adhesive, exposed: kept.exposed } : {};
    return {
      role: layer.role,
      material: layer.material,
      thickness_mm: numberOrText(layer.thickness_mm),
      ...(layer.joints ? { joints: layer.joints } : {}),
      ...(layer.framing_fraction.trim() || layer.framing_material ? { framing: { material: layer.framing_material || "softwood-lumber", fraction: numberOrText(layer.framing_fraction) } } : {}),
      ...Object.fromEntries(Object.entries(carried).filter(([, value]) => value !== undefined)),
    };
  });
}

const FRIENDLY: Record<string, string> = {
  title: "Give a title of 5 to 120 characters.",
  summary: "Write a summary of 20 to 400 characters: what a builder reads on the card.",
  zones: "Tick at least one climate zone.",
  references: "List at least one reference (5 to 200 characters each), one per line.",
  layers: "An assembly needs at least two layers.",
};

function fieldName(path: readonly PropertyKey[], message: string): string {
  const [head, index, key, sub] = path;
  if (head === "layers" && typeof index === "number") {
    if (key === "framing") return `layers.${index}.framing_${String(sub ?? "fraction")}`;
    return `layers.${index}.${String(key ?? "material")}`;
  }
  if (head === "revision" && message.includes("change_note")) return "change_note";
  return String(head ?? "form");
}

function friendlyMessage(field: string, issue: z.core.$ZodIssue): string {
  if (field.endsWith(".thickness_mm")) return "Enter a thickness in millimetres, above 0 and at most 2000.";
  if (field.endsWith(".framing_fraction")) return "Enter the framing fraction as a number between 0 and 1 (for example 0.23).";
  if (field === "change_note") return "Say in one sentence (10 to 300 characters) what changed in this revision.";
  if (issue.code === "invalid_value" || issue.code === "invalid_type") return field.includes(".") ? "Choose one." : `Choose a ${field.replaceAll("_", " ")}.`;
  return FRIENDLY[field] ?? issue.message;
}

export type DraftValidation = { ok: true; front: DetailFrontMatter; body: string } | { ok: false; errors: FieldErrors };

export interface DraftContext {
  author: string;
  revision: number;
  revised: string;
  knownMaterials: ReadonlySet<string>;
  knownSets: ReadonlySet<string>;
  /** Submitting for review also needs the body's required sections. */
  forSubmission: boolean;
  keep?: Partial<DetailFrontMatter>;
}

/** Validates the form with the content schema; every problem comes back under the field that caused it. */
export function validateDraft(values: DraftFormValues, context: DraftContext): DraftValidation {
  const errors: FieldErrors = {};
  const add = (field: string, message: string) => {
    const list = (errors[field] ??= []);
    if (!list.includes(message)) list.push(message);
  };
  const parsed = detailFrontMatterSchema.safeParse(candidateFrontMatter(values, context));
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = fieldName(issue.path, issue.message);
      add(field, friendlyMessage(field, issue));
    }
  }
  values.layers.forEach((layer, i) => {
    if (layer.material && !context.knownMaterials.has(layer.material)) add(`layers.${i}.material`, `“${layer.material}” is not in the material library.`);
    if (layer.framing_material && !context.knownMaterials.has(layer.framing_material)) add(`layers.${i}.framing_material`, `“${layer.framing_material}” is not in the material library.`);
  });
  for (const set of values.sets) if (!context.knownSets.has(set)) add("sets", `There is no set “${set}”.`);
  if (context.forSubmission) {
    const missing = missingBodySections(values.body);
    if (missing.length) add("body", `Before review the body needs the section${missing.length > 1 ? "s" : ""} ${missing.map((m) => `“## ${m}”`).join(", ")}.`);
  }
  if (!parsed.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, front: parsed.data, body: values.body.trim() };
}
