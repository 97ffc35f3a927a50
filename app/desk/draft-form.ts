import { z } from "zod";
import { detailFrontMatterSchema, type DetailFrontMatter } from "~/content/detail-schema";
import { missingBodySections } from "~/vocabulary/body-sections";

// The desk's detail form: its fields as a zod schema (read by conform on the page and in the action),
// and its rules, which are the content files' own schema applied to the front matter the form
// describes, so a web draft and a file can never mean different things. Pure: the page runs the same
// schema as the server, with the material library and the sets it was given.

const text = z.string().default("");
/** Single-line fields: surrounding spaces are never meant. */
const line = z.string().trim().default("");

export const layerFieldsSchema = z.object({
  role: text,
  material: text,
  thickness_mm: line,
  framing_material: text,
  framing_fraction: line,
  joints: text,
});

/** The form's fields as posted: text as typed (numbers stay text until the rules read them), so a 400 gives back exactly what was typed. */
const draftFieldsSchema = z.object({
  slug: line,
  title: line,
  summary: line,
  assembly: text,
  substrate: text,
  below_grade: text,
  strategy: text,
  tier: text,
  zones: z.array(z.string()).default([]),
  sets: z.array(z.string()).default([]),
  /** One reference per line. */
  references: text,
  change_note: line,
  body: z
    .string()
    .default("")
    .transform((body) => body.replace(/\r\n?/g, "\n")),
  layers: z.array(layerFieldsSchema).default([]),
});

export type DraftFormValues = z.output<typeof draftFieldsSchema>;
export type LayerFormValues = DraftFormValues["layers"][number];

/** A new row in the layer table. */
export const BLANK_LAYER: LayerFormValues = {
  role: "insulation",
  material: "",
  thickness_mm: "",
  framing_material: "",
  framing_fraction: "",
  joints: "",
};

const liveLayerListSchema = z.array(layerFieldsSchema.catch(BLANK_LAYER)).catch([]);

/** The layer rows as they stand while the editor types (conform's live form value), every field as text. */
export function liveLayers(value: unknown): LayerFormValues[] {
  return liveLayerListSchema.parse(value ?? []);
}

/** The two submit buttons: keep the draft, or keep it and send it for review. */
const DRAFT_INTENTS = ["save", "submit"] as const;

/** Field name (conform's: `title`, `layers[2].thickness_mm`, `` for the whole form) → messages. */
export type FieldErrors = Record<string, string[]>;

/** Until a reviewer approves, the front matter names no reviewer; publication writes the real one. */
const AWAITING_REVIEW = "(awaiting review)";

/** What the rules need to know besides the form: the revision being written and the names that exist. */
interface DraftRules {
  revision: number;
  knownMaterials: Iterable<string>;
  knownSets: Iterable<string>;
}

interface DraftContext extends DraftRules {
  author: string;
  revised: string;
  /** Submitting for review also needs the body's required sections. */
  forSubmission: boolean;
  /** The revision's earlier front matter: layer notes the form does not edit are carried over from it. */
  keep?: Partial<DetailFrontMatter>;
}

/** The posted form as the action reads it: the fields and the button pressed. The desk module then applies the rules (`validateDraft`). */
export const draftPostSchema = draftFieldsSchema.extend({ intent: z.enum(DRAFT_INTENTS).default("save") });

/** The schema the page validates with: the posted form under the same rules the desk module applies. */
export function draftFormSchema(rules: DraftRules) {
  const context = { ...rules, knownMaterials: new Set(rules.knownMaterials), knownSets: new Set(rules.knownSets) };
  return draftPostSchema.superRefine((values, ctx) => {
    // The author is the desk's to fill in; any valid name stands in for it here.
    const { problems } = checkDraft(values, {
      ...context,
      author: "desk editor",
      revised: today(),
      forSubmission: values.intent === "submit",
    });
    for (const problem of problems) ctx.addIssue({ code: "custom", path: problem.path, message: problem.message });
  });
}

function today(): string {
  return new Date().toISOString().slice(0, 10);
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
function candidateFrontMatter(
  values: DraftFormValues,
  fixed: Omit<DraftContext, "knownMaterials" | "knownSets" | "forSubmission">,
): Record<string, unknown> {
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
    references: values.references
      .split("\n")
      .map((reference) => reference.trim())
      .filter(Boolean),
    layers: layersFromForm(values.layers, fixed.keep?.layers),
  };
}

/** Layer rows as front-matter layers (unvalidated); keys the form does not edit are carried over from `keep`. */
export function layersFromForm(
  layers: readonly LayerFormValues[],
  keep?: readonly DetailFrontMatter["layers"][number][],
): Record<string, unknown>[] {
  return layers.map((layer, i) => {
    const kept = keep?.[i];
    // Notes, adhesive and exposure stay with the layer when its material is unchanged.
    const carried =
      kept && kept.material === layer.material
        ? { note: kept.note, adhesive: kept.adhesive, exposed: kept.exposed }
        : {};
    return {
      role: layer.role,
      material: layer.material,
      thickness_mm: numberOrText(layer.thickness_mm),
      ...(layer.joints ? { joints: layer.joints } : {}),
      ...(layer.framing_fraction.trim() || layer.framing_material
        ? {
            framing: {
              material: layer.framing_material || "softwood-lumber",
              fraction: numberOrText(layer.framing_fraction),
            },
          }
        : {}),
      ...Object.fromEntries(Object.entries(carried).filter(([, value]) => value !== undefined)),
    };
  });
}

type FormPath = (string | number)[];

/** The form field a front-matter issue belongs to; an empty path is the whole form. */
function formPath(path: readonly PropertyKey[], message: string): FormPath {
  const [head, index, key, sub] = path;
  if (head === "layers" && typeof index === "number") {
    if (key === "framing") return ["layers", index, `framing_${String(sub ?? "fraction")}`];
    const field = typeof key === "string" && key in layerFieldsSchema.shape ? key : "material";
    return ["layers", index, field];
  }
  if (head === "revision" && message.includes("change_note")) return ["change_note"];
  if (typeof head === "string" && head in draftFieldsSchema.shape) return [head];
  return [];
}

const FRIENDLY: Record<string, string> = {
  title: "Give a title of 5 to 120 characters.",
  summary: "Write a summary of 20 to 400 characters: what a builder reads on the card.",
  slug: "Use lower-case words joined by hyphens, for example “slab-edge-insulated-upstand”.",
  zones: "Tick at least one climate zone.",
  references: "List at least one reference (5 to 200 characters each), one per line.",
  layers: "An assembly needs at least two layers.",
  change_note: "Say in one sentence (10 to 300 characters) what changed in this revision.",
  thickness_mm: "Enter a thickness in millimetres, above 0 and at most 2000.",
  framing_fraction: "Enter the framing fraction as a number between 0 and 1 (for example 0.23).",
};

function friendlyMessage(path: FormPath, issue: z.core.$ZodIssue): string {
  const field = String(path.at(-1) ?? "");
  if (FRIENDLY[field]) return FRIENDLY[field];
  if (issue.code === "invalid_value" || issue.code === "invalid_type")
    return path.length > 1 ? "Choose one." : `Choose a ${field.replaceAll("_", " ")}.`;
  return issue.message;
}

interface Problem {
  path: FormPath;
  message: string;
}

type CheckContext = Omit<DraftContext, "knownMaterials" | "knownSets"> & {
  knownMaterials: ReadonlySet<string>;
  knownSets: ReadonlySet<string>;
};

/** Every rule the draft breaks, each under the field that caused it (layer fields under their row's index); the front matter when it breaks none. */
function checkDraft(
  values: DraftFormValues,
  context: CheckContext,
): { problems: Problem[]; front: DetailFrontMatter | null } {
  const problems: Problem[] = [];
  const add = (path: FormPath, message: string) => {
    if (!problems.some((problem) => problem.message === message && problem.path.join(".") === path.join(".")))
      problems.push({ path, message });
  };
  const parsed = detailFrontMatterSchema.safeParse(candidateFrontMatter(values, context));
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const path = formPath(issue.path, issue.message);
      add(path, friendlyMessage(path, issue));
    }
  }
  values.layers.forEach((layer, i) => {
    if (layer.material && !context.knownMaterials.has(layer.material))
      add(["layers", i, "material"], `“${layer.material}” is not in the material library.`);
    if (layer.framing_material && !context.knownMaterials.has(layer.framing_material))
      add(["layers", i, "framing_material"], `“${layer.framing_material}” is not in the material library.`);
  });
  for (const set of values.sets) if (!context.knownSets.has(set)) add(["sets"], `There is no set “${set}”.`);
  if (context.forSubmission) {
    const missing = missingBodySections(values.body);
    if (missing.length)
      add(
        ["body"],
        `Before review the body needs the section${missing.length > 1 ? "s" : ""} ${missing.map((m) => `“## ${m}”`).join(", ")}.`,
      );
  }
  return { problems, front: parsed.success && problems.length === 0 ? parsed.data : null };
}

/** A field path as conform names the field: `layers[2].thickness_mm`. */
function fieldName(path: FormPath): string {
  return path.map((part, i) => (typeof part === "number" ? `[${part}]` : i === 0 ? part : `.${part}`)).join("");
}

type DraftValidation = { ok: true; front: DetailFrontMatter; body: string } | { ok: false; errors: FieldErrors };

/** The server's check before saving: the form's rules on the front matter with the desk's author and the carried-over layer notes. */
export function validateDraft(values: DraftFormValues, context: DraftContext): DraftValidation {
  const { problems, front } = checkDraft(values, {
    ...context,
    knownMaterials: new Set(context.knownMaterials),
    knownSets: new Set(context.knownSets),
  });
  if (front) return { ok: true, front, body: values.body.trim() };
  const errors: FieldErrors = {};
  for (const problem of problems) {
    const name = fieldName(problem.path);
    errors[name] = [...(errors[name] ?? []), problem.message];
  }
  return { ok: false, errors };
}
