import { Op } from "sequelize";
import { recordAudit } from "~/auth/audit.server";
import { forgetMaterialLibrary } from "~/catalogue/materials.server";
import { buildProjection } from "~/catalogue/publish.server";
import { buildMaterialLibrary, materialSchema, type Material } from "~/envelope";
import { Detail, DetailRevision, MaterialRecord, sequelize } from "~/models/index.server";
import { MATERIAL_FLAGS, type MaterialFormValues } from "./material-form";
import type { DeskActor } from "./revisions.server";

export { MATERIAL_FLAGS, type MaterialFormValues };

// Editors correct the material library from the desk. Every value keeps its source (the engine's
// schema insists on it, with the status letter), every change is audit-logged, and the published
// details that use the material get their R-value and retarder class recomputed.

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

export function materialFormFromData(form: FormData): MaterialFormValues {
  const text = (name: string) => {
    const value = form.get(name);
    return typeof value === "string" ? value.trim() : "";
  };
  return {
    name: text("name"),
    family: text("family"),
    thermal_kind: text("thermal_kind") === "rsi_fixed" ? "rsi_fixed" : "conductivity",
    thermal_value: text("thermal_value"),
    thermal_source: text("thermal_source"),
    permeance_ng: text("permeance_ng"),
    at_thickness_mm: text("at_thickness_mm"),
    wet_cup_ng: text("wet_cup_ng"),
    curve: text("curve"),
    vapour_source: text("vapour_source"),
    flags: form.getAll("flags").filter((value): value is string => typeof value === "string"),
    notes: text("notes"),
  };
}

const optionalNumber = (value: string) => (value === "" ? undefined : Number(value));

function candidate(slug: string, values: MaterialFormValues): Record<string, unknown> {
  const curve = values.curve
    .split("\n")
    .map((line) => line.trim())
    .filter(Boolean)
    .map((line) => line.split(/[,;\s]+/).map(Number));
  return {
    slug,
    name: values.name,
    family: values.family,
    thermal: { [values.thermal_kind === "rsi_fixed" ? "rsi_fixed" : "conductivity_w_mk"]: optionalNumber(values.thermal_value), source: values.thermal_source },
    vapour: {
      permeance_ng: optionalNumber(values.permeance_ng),
      ...(values.at_thickness_mm ? { at_thickness_mm: optionalNumber(values.at_thickness_mm) } : {}),
      ...(values.wet_cup_ng ? { wet_cup_ng: optionalNumber(values.wet_cup_ng) } : {}),
      ...(curve.length ? { curve } : {}),
      source: values.vapour_source,
    },
    ...Object.fromEntries(MATERIAL_FLAGS.map((flag) => [flag, values.flags.includes(flag)])),
    ...(values.notes ? { notes: values.notes } : {}),
  };
}

const FIELD_OF: Record<string, string> = {
  "thermal.conductivity_w_mk": "thermal_value",
  "thermal.rsi_fixed": "thermal_value",
  thermal: "thermal_value",
  "thermal.source": "thermal_source",
  "vapour.permeance_ng": "permeance_ng",
  "vapour.at_thickness_mm": "at_thickness_mm",
  "vapour.wet_cup_ng": "wet_cup_ng",
  "vapour.curve": "curve",
  "vapour.source": "vapour_source",
};

function fieldFor(path: readonly PropertyKey[]): string {
  const joined = path.filter((part) => typeof part === "string").join(".");
  if (joined.startsWith("vapour.curve")) return "curve";
  return FIELD_OF[joined] ?? (joined || "form");
}

export async function listMaterials(): Promise<{ slug: string; name: string; family: string; updatedAt: string }[]> {
  const rows = await MaterialRecord.findAll({ attributes: ["slug", "name", "family", "updatedAt"], order: [["family", "ASC"], ["name", "ASC"]] });
  return rows.map((row) => ({ slug: row.slug, name: row.name, family: row.family, updatedAt: row.updatedAt.toISOString() }));
}

export async function findMaterial(slug: string): Promise<Material | null> {
  const record = await MaterialRecord.findOne({ where: { slug } });
  return record ? materialSchema.parse(record.properties) : null;
}

export type MaterialSave = { ok: true; refreshed: number } | { ok: false; errors: Record<string, string[]> };

export async function updateMaterial(actor: DeskActor, slug: string, values: MaterialFormValues): Promise<MaterialSave | null> {
  const parsed = materialSchema.safeParse(candidate(slug, values));
  if (!parsed.success) {
    const errors: Record<string, string[]> = {};
    for (const issue of parsed.error.issues) {
      const field = fieldFor(issue.path);
      const message = field.endsWith("source") ? `${issue.message} (every value needs its source)` : issue.message;
      (errors[field] ??= []).push(message);
    }
    return { ok: false, errors };
  }
  const material = parsed.data;
  const refreshed = await sequelize.transaction(async (transaction) => {
    const record = await MaterialRecord.findOne({ where: { slug }, transaction, lock: transaction.LOCK.UPDATE });
    if (!record) return null;
    const before = materialSchema.parse(record.properties);
    await record.update({ name: material.name, family: material.family, properties: material }, { transaction });
    const changed = [...new Set([...Object.keys(before), ...Object.keys(material)])].filter((key) => JSON.stringify(before[key as keyof Material]) !== JSON.stringify(material[key as keyof Material]));
    await recordAudit({ actorId: actor.id, action: "material.updated", subjectType: "material", subjectId: slug, details: { changed: changed.join(", ") || "nothing" } }, transaction);

    // Published details built from this material carry its numbers in their projection.
    const library = buildMaterialLibrary((await MaterialRecord.findAll({ attributes: ["properties"], transaction })).map((row) => row.properties));
    const live = await Detail.scope("live").findAll({
      include: [{ model: DetailRevision, as: "publishedRevision", attributes: ["id", "frontMatter", "bodyMd"], required: true }],
      transaction,
    });
    let count = 0;
    for (const detail of live) {
      const revision = detail.publishedRevision;
      const front = revision?.frontMatter;
      if (!revision || !front?.layers.some((layer) => layer.material === slug || layer.framing?.material === slug)) continue;
      await detail.update(buildProjection(front, revision.bodyMd, library), { transaction });
      count++;
    }
    return count;
  });
  if (refreshed === null) return null;
  forgetMaterialLibrary();
  return { ok: true, refreshed };
}
