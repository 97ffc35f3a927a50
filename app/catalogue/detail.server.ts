import { Op } from "sequelize";
import { canReadDetail, type Viewer } from "~/access/premium.server";
import { premiumRefusal, type PremiumRefusal } from "~/access/refusal";
import type { DetailFrontMatter, DetailLayer } from "~/content/detail-schema";
import type { Material } from "~/envelope";
import { renderMarkdown } from "~/markdown/render.server";
import { Detail, DetailRevision, DetailSet, DetailZone } from "~/models/index.server";
import { BODY_SECTION_HEADINGS, bodySection } from "~/vocabulary/body-sections";
import { PUBLIC_REVISION_STATES } from "~/vocabulary/revision-states";
import { uploadsOf, type UploadRow } from "~/desk/uploads.server";
import { materialLibrary } from "./materials.server";
import { describeChanges } from "./revision-diff";
import { plainText } from "./search-text";

export interface DrawingLayer {
  role: string;
  family: string;
  materialName: string;
  thickness_mm: number;
  framing?: { fraction: number; family: string };
}

export interface RevisionEntry {
  number: number;
  state: string;
  publishedAt: string | null;
  authorName: string;
  reviewerName: string | null;
  changeNote: string | null;
  changes: string[];
}

export interface DetailView {
  id: number;
  slug: string;
  title: string;
  summary: string;
  tier: "free" | "premium";
  assembly: DetailFrontMatter["assembly"];
  substrate: string;
  belowGrade: string;
  strategy: string;
  interiorClass: string;
  zones: string[];
  rsi: number | null;
  /** Public: the drawing is part of the preview. */
  drawing: DrawingLayer[];
  revision: RevisionEntry & { reviewedAt: string | null };
  history: RevisionEntry[];
  sets: { slug: string; title: string }[];
  related: { slug: string; title: string; tier: string }[];
  access: "full" | "preview";
  /** Only present with access: never serialised for a viewer without it. */
  full?: {
    layers: (DetailLayer & { materialName: string; family: string })[];
    bodyHtml: string;
    references: string[];
    /** Drawings and photos attached to the published revision (served by /uploads/:id with the same access rule). */
    attachments: UploadRow[];
  };
  preview?: { excerpt: string };
  /** Without access: the same refusal the API, drawings and packs give, shown beside the preview. */
  refusal?: PremiumRefusal;
}

function materialName(library: ReadonlyMap<string, Material>, slug: string): string {
  return library.get(slug)?.name ?? slug;
}

/** A published detail as a viewer may see it, or null when there is none under that slug. */
export async function getDetailView(slug: string, viewer: Viewer | null): Promise<DetailView | null> {
  const detail = await Detail.scope("live").findOne({ where: { slug } });
  if (!detail?.publishedRevisionId) return null;
  const [revision, history, zones, sets, library, allowed] = await Promise.all([
    DetailRevision.findByPk(detail.publishedRevisionId),
    DetailRevision.findAll({
      where: { detailId: detail.id, state: { [Op.in]: PUBLIC_REVISION_STATES } },
      order: [["number", "ASC"]],
    }),
    DetailZone.findAll({ where: { detailId: detail.id } }),
    detailSets(detail.id),
    materialLibrary(),
    canReadDetail(viewer, detail),
  ]);
  if (!revision) return null;
  const front = revision.frontMatter;

  const entries: RevisionEntry[] = history.map((entry, i) => {
    const previous = i > 0 ? history[i - 1] : null;
    return {
      number: entry.number,
      state: entry.state,
      publishedAt: entry.publishedAt?.toISOString() ?? null,
      authorName: entry.authorName,
      reviewerName: entry.reviewerName,
      changeNote: entry.changeNote,
      changes: previous ? describeChanges(previous.frontMatter, entry.frontMatter, previous.bodyMd, entry.bodyMd) : [],
    };
  });
  const current = entries.find((entry) => entry.number === revision.number)!;

  const view: DetailView = {
    id: detail.id,
    slug: detail.slug,
    title: revision.title,
    summary: revision.summary,
    tier: detail.tier,
    assembly: front.assembly,
    substrate: detail.substrate,
    belowGrade: detail.belowGrade,
    strategy: detail.strategy,
    interiorClass: detail.interiorClass,
    zones: zones.map((z) => z.zone).sort((a, b) => a.localeCompare(b, "en", { numeric: true })),
    rsi: detail.rValueRsi,
    drawing: front.layers.map((layer) => ({
      role: layer.role,
      family: library.get(layer.material)?.family ?? "unknown",
      materialName: materialName(library, layer.material),
      thickness_mm: layer.thickness_mm,
      ...(layer.framing
        ? {
            framing: {
              fraction: layer.framing.fraction,
              family: library.get(layer.framing.material)?.family ?? "lumber",
            },
          }
        : {}),
    })),
    revision: { ...current, reviewedAt: revision.reviewedAt?.toISOString() ?? null },
    history: entries.reverse(),
    sets,
    related: await relatedDetails(detail),
    access: allowed ? "full" : "preview",
  };
  if (allowed) {
    view.full = {
      layers: front.layers.map((layer) => ({
        ...layer,
        materialName: materialName(library, layer.material),
        family: library.get(layer.material)?.family ?? "unknown",
      })),
      bodyHtml: renderMarkdown(revision.bodyMd),
      references: front.references,
      attachments: await uploadsOf(revision.id),
    };
  } else {
    const why = plainText(bodySection(revision.bodyMd, BODY_SECTION_HEADINGS["why-it-works"]));
    view.preview = { excerpt: why.length > 280 ? `${why.slice(0, 280).replace(/\s+\S*$/, "")}…` : why };
    view.refusal = premiumRefusal("This detail", sets);
  }
  return view;
}

/** The published front matter (layers and metadata) of a detail, for the site check. */
export async function getPublishedAssembly(
  slug: string,
): Promise<{ id: number; tier: "free" | "premium"; frontMatter: DetailFrontMatter } | null> {
  const detail = await Detail.scope("live").findOne({
    where: { slug },
    include: [{ model: DetailRevision, as: "publishedRevision", attributes: ["frontMatter"], required: true }],
  });
  if (!detail?.publishedRevision) return null;
  return { id: detail.id, tier: detail.tier, frontMatter: detail.publishedRevision.frontMatter };
}

async function relatedDetails(detail: Detail): Promise<{ slug: string; title: string; tier: string }[]> {
  const rows = await Detail.scope("live").findAll({
    attributes: ["slug", "title", "tier"],
    where: {
      id: { [Op.ne]: detail.id },
      // Same kind of assembly, or (below grade) the same condition: a basement wall relates to basement slabs.
      [Op.or]:
        detail.belowGrade === "none"
          ? [{ assembly: detail.assembly }]
          : [{ assembly: detail.assembly }, { belowGrade: detail.belowGrade }],
    },
    order: [["publishedAt", "DESC"]],
    limit: 4,
  });
  return rows.map((row) => ({ slug: row.slug, title: row.title, tier: row.tier }));
}

export async function detailSets(detailId: number): Promise<{ slug: string; title: string }[]> {
  const sets = await DetailSet.findAll({
    attributes: ["slug", "title"],
    include: [{ model: Detail, as: "details", attributes: [], where: { id: detailId }, required: true }],
  });
  return sets.map((set) => ({ slug: set.slug, title: set.title }));
}
