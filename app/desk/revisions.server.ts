import { Op } from "sequelize";
import { contentHash } from "~/vocabulary/content-hash.server";
import {
  EDITABLE_REVISION_STATES,
  OPEN_REVISION_STATES,
  REVISION_STATE_LABELS,
  isEditableRevisionState,
  type RevisionState,
} from "~/vocabulary/revision-states";
import { roleAtLeast } from "~/vocabulary/roles";
import { buildProjection, publishRevision, withdrawDetail } from "~/catalogue/publish.server";
import { materialLibrary } from "~/catalogue/materials.server";
import type { DetailFrontMatter } from "~/content/detail-schema";
import { Detail, DetailRevision, DetailSet, ReviewComment, User, sequelize } from "~/models/index.server";
import { REVIEW_SECTIONS, type ReviewSection } from "./review-sections";
import { validateDraft, type DraftFormValues, type FieldErrors } from "./draft-form";
import { alertSavers } from "./saved.server";

// The revision workflow: draft → in_review → changes_requested → in_review → published, then
// superseded by the next or withdrawn. Every rule is checked here, on the server, whatever the UI shows.

/** An expected refusal with the status the route should answer. */
export class DeskError extends Error {
  constructor(
    readonly status: 400 | 403 | 404 | 409,
    message: string,
  ) {
    super(message);
    this.name = "DeskError";
  }
}

export interface DeskActor {
  id: number;
  displayName: string;
  role: User["role"];
}

function today(): string {
  return new Date().toISOString().slice(0, 10);
}

async function knownNames(): Promise<{ knownMaterials: Set<string>; knownSets: Set<string> }> {
  const [library, sets] = await Promise.all([materialLibrary(), DetailSet.findAll({ attributes: ["slug"] })]);
  return { knownMaterials: new Set(library.keys()), knownSets: new Set(sets.map((set) => set.slug)) };
}

export type SaveOutcome = { ok: true; revisionId: number } | { ok: false; errors: FieldErrors };

/** A new detail: its first revision as a draft. The detail stays out of the catalogue until published. */
export async function createDetailDraft(author: DeskActor, values: DraftFormValues): Promise<SaveOutcome> {
  const validation = validateDraft(values, {
    author: author.displayName,
    revision: 1,
    revised: today(),
    forSubmission: false,
    ...(await knownNames()),
  });
  if (!validation.ok) return validation;
  const { front, body } = validation;
  if (await Detail.findOne({ where: { slug: front.slug }, attributes: ["id"] }))
    return { ok: false, errors: { slug: ["Another detail already has this slug."] } };
  const library = await materialLibrary();
  return sequelize.transaction(async (transaction) => {
    const detail = await Detail.create(
      { slug: front.slug, ...buildProjection(front, body, library), publishedRevisionId: null, publishedAt: null },
      { transaction },
    );
    const revision = await DetailRevision.create(
      {
        detailId: detail.id,
        number: 1,
        state: "draft",
        title: front.title,
        summary: front.summary,
        bodyMd: body,
        frontMatter: front,
        changeNote: null,
        authorId: author.id,
        authorName: author.displayName,
        contentHash: contentHash(front, body),
      },
      { transaction },
    );
    return { ok: true as const, revisionId: revision.id };
  });
}

/** The open revision of a published detail, or a new draft copied from the published one. Never touches the published revision. */
export async function startRevision(
  author: DeskActor,
  slug: string,
): Promise<{ revisionId: number; created: boolean }> {
  return sequelize.transaction(async (transaction) => {
    const detail = await Detail.findOne({ where: { slug }, transaction, lock: transaction.LOCK.UPDATE });
    if (!detail) throw new DeskError(404, `No detail “${slug}”.`);
    const open = await DetailRevision.findOne({
      where: { detailId: detail.id, state: { [Op.in]: OPEN_REVISION_STATES } },
      order: [["number", "DESC"]],
      transaction,
    });
    if (open) return { revisionId: open.id, created: false };
    if (!detail.publishedRevisionId) throw new DeskError(409, "This detail has no published revision to start from.");
    const source = await DetailRevision.findByPk(detail.publishedRevisionId, { transaction });
    const latest = await DetailRevision.max<number, DetailRevision>("number", {
      where: { detailId: detail.id },
      transaction,
    });
    if (!source) throw new DeskError(409, "The published revision is missing.");
    const number = (latest ?? source.number) + 1;
    const { change_note: _note, ...rest } = source.frontMatter;
    const front: DetailFrontMatter = { ...rest, revision: number, revised: today(), author: author.displayName };
    const revision = await DetailRevision.create(
      {
        detailId: detail.id,
        number,
        state: "draft",
        title: front.title,
        summary: front.summary,
        bodyMd: source.bodyMd,
        frontMatter: front,
        changeNote: null,
        authorId: author.id,
        authorName: author.displayName,
        contentHash: contentHash(front, source.bodyMd),
      },
      { transaction },
    );
    return { revisionId: revision.id, created: true };
  });
}

async function ownOpenRevision(actor: DeskActor, revisionId: number): Promise<DetailRevision> {
  const revision = await DetailRevision.findByPk(revisionId);
  if (!revision) throw new DeskError(404, "No such revision.");
  if (revision.authorId !== actor.id) throw new DeskError(403, "Only the revision's author edits or submits it.");
  if (!isEditableRevisionState(revision.state))
    throw new DeskError(409, `This revision is ${REVISION_STATE_LABELS[revision.state]} and cannot be edited.`);
  return revision;
}

/** Saves the form into the author's draft (and optionally submits it); invalid input changes nothing. */
export async function saveRevision(
  actor: DeskActor,
  revisionId: number,
  values: DraftFormValues,
  submit: boolean,
): Promise<SaveOutcome> {
  const revision = await ownOpenRevision(actor, revisionId);
  const previous = revision.frontMatter;
  // The slug belongs to the detail, not the form: a draft cannot move another detail's address.
  const fixedValues = { ...values, slug: previous.slug };
  const validation = validateDraft(fixedValues, {
    author: revision.authorName,
    revision: revision.number,
    revised: today(),
    forSubmission: submit,
    keep: previous,
    ...(await knownNames()),
  });
  if (!validation.ok) return validation;
  const { front, body } = validation;
  await sequelize.transaction(async (transaction) => {
    await revision.update(
      {
        title: front.title,
        summary: front.summary,
        bodyMd: body,
        frontMatter: front,
        changeNote: front.change_note ?? null,
        contentHash: contentHash(front, body),
        ...(submit ? { state: "in_review" as const, submittedAt: new Date() } : {}),
      },
      { transaction },
    );
    // A never-published detail's card follows its draft, so the desk lists it by its current title.
    const detail = await Detail.findByPk(revision.detailId, { transaction });
    if (detail && !detail.publishedRevisionId)
      await detail.update(buildProjection(front, body, await materialLibrary()), { transaction });
  });
  return { ok: true, revisionId: revision.id };
}

export interface ReviewInput {
  comments: Partial<Record<ReviewSection, string>>;
}

async function submittedRevisionFor(reviewer: DeskActor, revisionId: number): Promise<DetailRevision> {
  if (!roleAtLeast(reviewer.role, "reviewer"))
    throw new DeskError(403, "Only a reviewer approves or sends back a submission.");
  const revision = await DetailRevision.findByPk(revisionId);
  if (!revision) throw new DeskError(404, "No such revision.");
  // A second pair of eyes: never one's own work (docs/design.md, People and roles).
  if (revision.authorId === reviewer.id)
    throw new DeskError(403, "You wrote this revision; another reviewer must review it.");
  if (revision.state !== "in_review")
    throw new DeskError(409, `This revision is ${REVISION_STATE_LABELS[revision.state]}, not waiting for review.`);
  return revision;
}

function cleanComments(input: ReviewInput): { section: ReviewSection; body: string }[] {
  return REVIEW_SECTIONS.map((section) => ({ section, body: (input.comments[section] ?? "").trim() })).filter(
    (comment) => comment.body.length > 0,
  );
}

/** Sends a submission back to its author with comments per section. */
export async function requestChanges(reviewer: DeskActor, revisionId: number, input: ReviewInput): Promise<void> {
  const revision = await submittedRevisionFor(reviewer, revisionId);
  const comments = cleanComments(input);
  if (comments.length === 0) throw new DeskError(400, "Say what needs changing: write at least one comment.");
  await sequelize.transaction(async (transaction) => {
    await ReviewComment.bulkCreate(
      comments.map((comment) => ({ revisionId: revision.id, authorId: reviewer.id, ...comment })),
      { transaction },
    );
    await revision.update(
      {
        state: "changes_requested",
        reviewerId: reviewer.id,
        reviewerName: reviewer.displayName,
        reviewedAt: new Date(),
      },
      { transaction },
    );
  });
}

/**
 * Approves a submission and publishes it as the detail's current revision (the previous one is
 * superseded), then e-mails every member who saved the detail. Refused for the revision's own author.
 */
export async function approveAndPublish(
  reviewer: DeskActor,
  revisionId: number,
  input: ReviewInput = { comments: {} },
): Promise<{ slug: string; number: number; alerted: number }> {
  const revision = await submittedRevisionFor(reviewer, revisionId);
  const now = new Date();
  const front = {
    ...revision.frontMatter,
    reviewer: reviewer.displayName,
    ...(revision.number > 1 ? { revised: now.toISOString().slice(0, 10) } : {}),
  };
  const publication = await sequelize.transaction(async (transaction) => {
    const comments = cleanComments(input);
    if (comments.length)
      await ReviewComment.bulkCreate(
        comments.map((comment) => ({ revisionId: revision.id, authorId: reviewer.id, ...comment })),
        { transaction },
      );
    await revision.update({ frontMatter: front, contentHash: contentHash(front, revision.bodyMd) }, { transaction });
    return publishRevision(
      revision.id,
      { id: reviewer.id, displayName: reviewer.displayName },
      { transaction, at: now },
    );
  });
  const alerted = await alertSavers(publication.detail, publication.revision);
  return { slug: publication.detail.slug, number: publication.revision.number, alerted };
}

/** Takes a published detail out of the catalogue (reviewers and above), with the reason in the audit log. */
export async function withdrawPublished(actor: DeskActor, slug: string, reason: string): Promise<void> {
  if (!roleAtLeast(actor.role, "reviewer")) throw new DeskError(403, "Only a reviewer withdraws a published detail.");
  if (reason.trim().length < 10)
    throw new DeskError(400, "Give the reason for withdrawing (at least 10 characters); it goes in the audit log.");
  const detail = await Detail.findOne({ where: { slug } });
  if (!detail?.isLive()) throw new DeskError(409, "Only a published detail can be withdrawn.");
  await sequelize.transaction((transaction) => withdrawDetail(detail.id, actor, reason.trim(), transaction));
}

export interface RevisionRow {
  id: number;
  slug: string;
  title: string;
  number: number;
  state: RevisionState;
  authorName: string;
  reviewerName: string | null;
  updatedAt: string;
}

async function rows(
  where: Record<string, unknown>,
  limit = 50,
  order: "updatedAt" | "publishedAt" = "updatedAt",
): Promise<RevisionRow[]> {
  const found = await DetailRevision.findAll({
    where,
    include: [{ model: Detail, as: "detail", attributes: ["slug"] }],
    order: [[order, "DESC"]],
    limit,
  });
  return found.map((revision) => ({
    id: revision.id,
    slug: (revision as DetailRevision & { detail?: Detail }).detail?.slug ?? "",
    title: revision.title,
    number: revision.number,
    state: revision.state,
    authorName: revision.authorName,
    reviewerName: revision.reviewerName,
    updatedAt: (order === "publishedAt"
      ? (revision.publishedAt ?? revision.updatedAt)
      : revision.updatedAt
    ).toISOString(),
  }));
}

/** What the desk's front page lists for this person. */
export async function deskOverview(actor: DeskActor) {
  const [drafts, submissions, queue, published] = await Promise.all([
    rows({ authorId: actor.id, state: { [Op.in]: EDITABLE_REVISION_STATES } }),
    rows({ authorId: actor.id, state: { [Op.in]: ["in_review", "published"] } }, 20),
    roleAtLeast(actor.role, "reviewer")
      ? rows({ state: "in_review", authorId: { [Op.or]: [{ [Op.ne]: actor.id }, { [Op.is]: null }] } })
      : Promise.resolve(null),
    rows({ state: "published" }, 10, "publishedAt"),
  ]);
  return { drafts, submissions, queue, published };
}

/** Every round's comments: a resubmission keeps its review history across the author's edits. */
export async function commentsOn(
  revisionId: number,
): Promise<{ id: number; section: string; body: string; authorName: string; at: string }[]> {
  const comments = await ReviewComment.findAll({
    where: { revisionId },
    include: [{ model: User, as: "author", attributes: ["displayName"] }],
    order: [["id", "ASC"]],
  });
  return comments.map((comment) => ({
    id: comment.id,
    section: comment.section,
    body: comment.body,
    authorName: comment.author?.displayName ?? "a former reviewer",
    at: comment.createdAt.toISOString(),
  }));
}

/** A revision with its detail and the detail's published revision (when that is another one). */
export async function loadRevision(
  revisionId: number,
): Promise<{ revision: DetailRevision; detail: Detail; published: DetailRevision | null } | null> {
  const revision = await DetailRevision.findByPk(revisionId, { include: [{ model: Detail, as: "detail" }] });
  const detail = revision?.detail;
  if (!revision || !detail) return null;
  const published =
    detail.publishedRevisionId && detail.publishedRevisionId !== revision.id
      ? await DetailRevision.findByPk(detail.publishedRevisionId)
      : null;
  return { revision, detail, published };
}
