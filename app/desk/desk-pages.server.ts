// What the desk's pages show, built here so their route modules only guard, call and return.
import { Op } from "sequelize";
import { describeChanges } from "~/catalogue/revision-diff";
import { materialLibrary } from "~/catalogue/materials.server";
import { renderMarkdown } from "~/markdown/render.server";
import { Detail, DetailRevision } from "~/models/index.server";
import type { UnitSystem } from "~/vocabulary/units";
import { OPEN_REVISION_STATES } from "~/vocabulary/revision-states";
import { changedHunks, diffLines } from "./line-diff";
import { commentsOn, loadRevision, type DeskActor } from "./revisions.server";
import { uploadsOf } from "./uploads.server";

/** The review page: the submitted revision, what changed since the published one, comments and files. Null: no such revision. */
export async function reviewPage(reviewer: DeskActor, revisionId: number, units: UnitSystem) {
  const found = await loadRevision(revisionId);
  if (!found) return null;
  const { revision, detail, published } = found;
  const front = revision.frontMatter;
  const [library, comments, uploads] = await Promise.all([
    materialLibrary(),
    commentsOn(revision.id),
    uploadsOf(revision.id),
  ]);
  const own = revision.authorId === reviewer.id;
  return {
    id: revision.id,
    slug: detail.slug,
    title: revision.title,
    summary: revision.summary,
    number: revision.number,
    state: revision.state,
    authorName: revision.authorName,
    changeNote: revision.changeNote,
    own,
    canDecide: !own && revision.state === "in_review",
    front: {
      assembly: front.assembly,
      substrate: front.substrate,
      below_grade: front.below_grade,
      strategy: front.strategy,
      zones: front.zones,
      tier: front.tier,
      sets: front.sets,
      references: front.references,
    },
    layers: front.layers.map((layer) => ({
      ...layer,
      materialName: library.get(layer.material)?.name ?? layer.material,
    })),
    bodyHtml: renderMarkdown(revision.bodyMd),
    comparedWith: published ? published.number : null,
    changes: published ? describeChanges(published.frontMatter, front, published.bodyMd, revision.bodyMd) : [],
    bodyDiff: published ? changedHunks(diffLines(published.bodyMd, revision.bodyMd)) : [],
    comments,
    uploads,
    units,
  };
}

/** The withdraw page: which detail, and whether it is live (only a live detail can be withdrawn). Null: no such detail. */
export async function withdrawPage(slug: string) {
  const detail = await Detail.findOne({
    where: { slug },
    attributes: ["slug", "title", "publishedRevisionId", "withdrawnAt"],
  });
  if (!detail) return null;
  return { slug: detail.slug, title: detail.title, live: detail.isLive() };
}

/** The start-a-revision page: the published revision's number and the revision already open, if any. Null: no such detail. */
export async function startRevisionPage(slug: string) {
  const detail = await Detail.findOne({
    where: { slug },
    attributes: ["id", "slug", "title", "publishedRevisionId"],
    include: [{ model: DetailRevision, as: "publishedRevision", attributes: ["number"] }],
  });
  if (!detail) return null;
  const open = await DetailRevision.findOne({
    where: { detailId: detail.id, state: { [Op.in]: OPEN_REVISION_STATES } },
    attributes: ["id", "number", "state", "authorName"],
  });
  return {
    slug: detail.slug,
    title: detail.title,
    publishedNumber: detail.publishedRevision?.number ?? null,
    open: open ? { id: open.id, number: open.number, state: open.state, authorName: open.authorName } : null,
  };
}
