import { Op, type Transaction } from "sequelize";
import { recordAudit } from "~/auth/audit.server";
import type { DetailFrontMatter } from "~/content/detail-schema";
import { moistureRegime, zoneNumber } from "~/vocabulary/climate-zones";
import { assemblyRValue, interiorRetarderClass, type Material } from "~/envelope";
import { Detail, DetailRevision, DetailSet, DetailSetMember, DetailZone } from "~/models/index.server";
import type { LayerStripEntry, Tier } from "~/models/detail.server";
import { materialLibrary } from "./materials.server";
import { buildSearchText } from "./search-text";
import { regimeMask, zoneMask } from "./zone-mask";

// The one path by which a revision becomes the published one, shared by the content importer and the
// web desk so the two can never build the searchable projection differently.

export interface DetailProjection {
  title: string;
  summary: string;
  searchText: string;
  assembly: string;
  substrate: string;
  belowGrade: string;
  strategy: string;
  interiorClass: string;
  tier: Tier;
  rValueRsi: number;
  layerStrip: LayerStripEntry[];
  zonesLabel: string;
  zoneMask: number;
  regimeMask: number;
}

/** The `details` columns derived from one revision's front matter and body (throws on unknown materials). */
export function buildProjection(
  front: DetailFrontMatter,
  body: string,
  library: ReadonlyMap<string, Material>,
): DetailProjection {
  const assembly = { kind: front.assembly, layers: front.layers };
  return {
    title: front.title,
    summary: front.summary,
    searchText: buildSearchText({ ...front, body }, (slug) => library.get(slug)?.name ?? slug),
    assembly: front.assembly,
    substrate: front.substrate,
    belowGrade: front.below_grade,
    strategy: front.strategy,
    interiorClass: interiorRetarderClass(assembly, library),
    tier: front.tier,
    rValueRsi: Math.round(assemblyRValue(assembly, library).rsi * 1000) / 1000,
    layerStrip: front.layers.map((layer) => ({
      role: layer.role,
      family: library.get(layer.material)?.family ?? "unknown",
      thickness_mm: layer.thickness_mm,
    })),
    zonesLabel: front.zones.join(" "),
    zoneMask: zoneMask(front.zones),
    regimeMask: regimeMask(front.zones),
  };
}

export interface PublishOptions {
  transaction: Transaction;
  /** Defaults to now; the importer passes the file's `revised` date. */
  at?: Date;
  /** Defaults to the database library; the importer passes the one it just validated. */
  library?: ReadonlyMap<string, Material>;
}

export interface Publication {
  detail: Detail;
  revision: DetailRevision;
  superseded: DetailRevision | null;
}

/**
 * Publishes one revision inside the caller's transaction: the previous published revision becomes
 * `superseded`, the revision becomes `published` (with the reviewer, when given), and the detail's
 * projection, zones and set members are rewritten from it. Every step is audit-logged.
 */
export async function publishRevision(
  revisionId: number,
  reviewer: { id: number; displayName: string } | null,
  options: PublishOptions,
): Promise<Publication> {
  const { transaction } = options;
  const at = options.at ?? new Date();
  const revision = await DetailRevision.findByPk(revisionId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!revision) throw new Error(`revision ${revisionId} does not exist`);
  const detail = await Detail.findByPk(revision.detailId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!detail) throw new Error(`detail ${revision.detailId} does not exist`);
  const front = revision.frontMatter;
  const library = options.library ?? (await materialLibrary());
  const projection = buildProjection(front, revision.bodyMd, library);

  let superseded: DetailRevision | null = null;
  if (detail.publishedRevisionId && detail.publishedRevisionId !== revision.id) {
    superseded = await DetailRevision.findByPk(detail.publishedRevisionId, { transaction });
    if (superseded && superseded.state === "published") {
      await superseded.update({ state: "superseded" }, { transaction });
      await recordAudit(
        {
          actorId: reviewer?.id ?? null,
          action: "detail.superseded",
          subjectType: "detail",
          subjectId: detail.id,
          details: { slug: detail.slug, revision: superseded.number, by: revision.number },
        },
        transaction,
      );
    }
  }

  await revision.update(
    {
      state: "published",
      publishedAt: at,
      reviewedAt: reviewer ? at : (revision.reviewedAt ?? at),
      ...(reviewer ? { reviewerId: reviewer.id, reviewerName: reviewer.displayName } : {}),
    },
    { transaction },
  );
  await detail.update(
    { slug: front.slug, ...projection, publishedRevisionId: revision.id, publishedAt: at, withdrawnAt: null },
    { transaction },
  );
  await writeZonesAndSets(detail.id, front, transaction);
  await recordAudit(
    {
      actorId: reviewer?.id ?? null,
      action: "detail.published",
      subjectType: "detail",
      subjectId: detail.id,
      details: { slug: detail.slug, revision: revision.number },
    },
    transaction,
  );
  return { detail, revision, superseded };
}

/** Zone rows and set memberships follow the published front matter. */
async function writeZonesAndSets(detailId: number, front: DetailFrontMatter, transaction: Transaction): Promise<void> {
  await DetailZone.destroy({ where: { detailId }, transaction });
  await DetailZone.bulkCreate(
    front.zones.map((zone) => ({ detailId, zone, zoneNumber: zoneNumber(zone), regime: moistureRegime(zone) })),
    { transaction },
  );
  const sets = front.sets.length
    ? await DetailSet.findAll({ attributes: ["id", "slug"], where: { slug: { [Op.in]: front.sets } }, transaction })
    : [];
  const missing = front.sets.filter((slug) => !sets.some((set) => set.slug === slug));
  if (missing.length) throw new Error(`unknown set${missing.length > 1 ? "s" : ""}: ${missing.join(", ")}`);
  await DetailSetMember.destroy({ where: { detailId }, transaction });
  await DetailSetMember.bulkCreate(
    sets.map((set) => ({ detailId, setId: set.id })),
    { transaction },
  );
}

/** Takes a published detail out of the catalogue; its history stays. */
export async function withdrawDetail(
  detailId: number,
  actor: { id: number },
  reason: string,
  transaction: Transaction,
): Promise<Detail> {
  const detail = await Detail.findByPk(detailId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!detail?.isLive()) throw new Error("only a published detail can be withdrawn");
  const revision = await DetailRevision.findByPk(detail.publishedRevisionId, { transaction });
  if (revision) await revision.update({ state: "withdrawn" }, { transaction });
  await detail.update({ withdrawnAt: new Date() }, { transaction });
  await recordAudit(
    {
      actorId: actor.id,
      action: "detail.withdrawn",
      subjectType: "detail",
      subjectId: detail.id,
      details: { slug: detail.slug, revision: revision?.number ?? null, reason },
    },
    transaction,
  );
  return detail;
}
