import { recordAudit } from "~/auth/audit.server";
import { forgetMaterialLibrary } from "~/catalogue/materials.server";
import { buildProjection } from "~/catalogue/publish.server";
import { buildMaterialLibrary, materialSchema, type Material } from "~/envelope";
import { Detail, DetailRevision, MaterialRecord, sequelize } from "~/models/index.server";
import type { DeskActor } from "./revisions.server";

// Editors correct the material library from the desk. Every value keeps its source (the engine's
// schema insists on it, with the status letter), every change is audit-logged, and the published
// details that use the material get their R-value and retarder class recomputed.

export async function listMaterials(): Promise<{ slug: string; name: string; family: string; updatedAt: string }[]> {
  const rows = await MaterialRecord.findAll({
    attributes: ["slug", "name", "family", "updatedAt"],
    order: [
      ["family", "ASC"],
      ["name", "ASC"],
    ],
  });
  return rows.map((row) => ({
    slug: row.slug,
    name: row.name,
    family: row.family,
    updatedAt: row.updatedAt.toISOString(),
  }));
}

export async function findMaterial(slug: string): Promise<Material | null> {
  const record = await MaterialRecord.findOne({ where: { slug } });
  return record ? materialSchema.parse(record.properties) : null;
}

/** Stores a material the form's schema has validated (`materialFormSchema`); null when there is no such material. */
export async function updateMaterial(
  actor: DeskActor,
  slug: string,
  material: Material,
): Promise<{ refreshed: number } | null> {
  const refreshed = await sequelize.transaction(async (transaction) => {
    const record = await MaterialRecord.findOne({ where: { slug }, transaction, lock: transaction.LOCK.UPDATE });
    if (!record) return null;
    const before = materialSchema.parse(record.properties);
    await record.update({ name: material.name, family: material.family, properties: material }, { transaction });
    const changed = [...new Set([...Object.keys(before), ...Object.keys(material)])].filter(
      (key) => JSON.stringify(before[key as keyof Material]) !== JSON.stringify(material[key as keyof Material]),
    );
    await recordAudit(
      {
        actorId: actor.id,
        action: "material.updated",
        subjectType: "material",
        subjectId: slug,
        details: { changed: changed.join(", ") || "nothing" },
      },
      transaction,
    );

    // Published details built from this material carry its numbers in their projection.
    const library = buildMaterialLibrary(
      (await MaterialRecord.findAll({ attributes: ["properties"], transaction })).map((row) => row.properties),
    );
    const live = await Detail.scope("live").findAll({
      include: [
        { model: DetailRevision, as: "publishedRevision", attributes: ["id", "frontMatter", "bodyMd"], required: true },
      ],
      transaction,
    });
    let count = 0;
    for (const detail of live) {
      const revision = detail.publishedRevision;
      const front = revision?.frontMatter;
      if (!revision || !front?.layers.some((layer) => layer.material === slug || layer.framing?.material === slug))
        continue;
      await detail.update(buildProjection(front, revision.bodyMd, library), { transaction });
      count++;
    }
    return count;
  });
  if (refreshed === null) return null;
  forgetMaterialLibrary();
  return { refreshed };
}
