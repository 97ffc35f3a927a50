import type { Transaction } from "sequelize";
import { loadContent } from "~/content/load-content";
import type { ContentProblem } from "~/content/content-error";
import type { ParsedDetail } from "~/content/parse-detail";
import type { Material } from "~/envelope";
import { Detail, DetailRevision, DetailSet, MaterialRecord, User, sequelize } from "~/models/index.server";
import { contentHash } from "~/vocabulary/content-hash.server";
import { buildProjection, publishRevision } from "./publish.server";

export class ImportRejected extends Error {
  constructor(readonly problems: readonly ContentProblem[]) {
    super(
      `content import rejected: ${problems.length} problem${problems.length === 1 ? "" : "s"}; nothing was written`,
    );
    this.name = "ImportRejected";
  }
}

export interface ImportSummary {
  materials: { created: number; updated: number; unchanged: number };
  sets: { created: number; updated: number; unchanged: number };
  details: { created: number; revised: number; unchanged: number; kept: { slug: string; reason: string }[] };
  ms: number;
}

export interface ImportOptions {
  onProgress?: (done: number, total: number, label: string) => void;
}

/**
 * Validates the whole content folder, then writes materials, sets and details in one transaction:
 * all or nothing. Re-running with unchanged files changes nothing; a higher `revision` in a file adds
 * a revision and supersedes the published one, so history is kept.
 */
export async function importContent(root: string, options: ImportOptions = {}): Promise<ImportSummary> {
  const started = performance.now();
  const content = loadContent(root);
  if (!content.materials)
    content.errors.push({
      file: "materials/",
      line: 1,
      field: "",
      message: "the content folder has no materials/ directory",
    });
  if (content.errors.length > 0) throw new ImportRejected(content.errors);

  const library = new Map<string, Material>(content.materials!.map((entry) => [entry.slug, entry.material]));
  const problems: ContentProblem[] = [];
  for (const detail of content.details) {
    // Building the projection runs the engine over the layers: a bad stack is refused before any write.
    try {
      buildProjection(detail, detail.body, library);
    } catch (error) {
      problems.push({
        file: detail.file,
        line: 2,
        field: "layers",
        message: error instanceof Error ? error.message : String(error),
      });
    }
  }
  if (problems.length > 0) throw new ImportRejected(problems);

  const summary: ImportSummary = {
    materials: { created: 0, updated: 0, unchanged: 0 },
    sets: { created: 0, updated: 0, unchanged: 0 },
    details: { created: 0, revised: 0, unchanged: 0, kept: [] },
    ms: 0,
  };
  const total = content.materials!.length + content.sets.length + content.details.length;
  let done = 0;
  const tick = (label: string) => options.onProgress?.(++done, total, label);

  await sequelize.transaction(async (transaction) => {
    for (const { slug, material } of content.materials!) {
      const existing = await MaterialRecord.findOne({ where: { slug }, transaction });
      if (!existing) {
        await MaterialRecord.create(
          { slug, name: material.name, family: material.family, properties: material },
          { transaction },
        );
        summary.materials.created++;
      } else if (JSON.stringify(existing.properties) !== JSON.stringify(material)) {
        await existing.update({ name: material.name, family: material.family, properties: material }, { transaction });
        summary.materials.updated++;
      } else {
        summary.materials.unchanged++;
      }
      tick(`material ${slug}`);
    }

    for (const set of content.sets) {
      const values = { title: set.title, summary: set.summary, priceCents: set.price_cents, currency: set.currency };
      const [record, created] = await DetailSet.findOrCreate({
        where: { slug: set.slug },
        defaults: { slug: set.slug, ...values },
        transaction,
      });
      const changed =
        !created &&
        (record.title !== values.title ||
          record.summary !== values.summary ||
          record.priceCents !== values.priceCents ||
          record.currency !== values.currency);
      if (changed) await record.update(values, { transaction });
      summary.sets[created ? "created" : changed ? "updated" : "unchanged"]++;
      tick(`set ${set.slug}`);
    }

    const staff = await staffByName(transaction);
    for (const detail of content.details) {
      const outcome = await importDetail(detail, library, staff, transaction);
      if (outcome.kind === "kept") summary.details.kept.push({ slug: detail.slug, reason: outcome.reason });
      else summary.details[outcome.kind]++;
      tick(`detail ${detail.slug}`);
    }
  });
  summary.ms = Math.round(performance.now() - started);
  return summary;
}

type DetailOutcome = { kind: "created" | "revised" | "unchanged" } | { kind: "kept"; reason: string };

async function importDetail(
  detail: ParsedDetail,
  library: ReadonlyMap<string, Material>,
  staff: ReadonlyMap<string, number>,
  transaction: Transaction,
): Promise<DetailOutcome> {
  const { body, bodyStartLine: _line, file: _file, ...frontMatter } = detail;
  const hash = contentHash(frontMatter, body);
  const publishedAt = new Date(`${detail.revised ?? "2026-01-15"}T12:00:00Z`);
  // Written as reviewed by the file's reviewer; publishRevision (shared with the desk) makes it live.
  const revisionValues = {
    number: detail.revision,
    state: "in_review" as const,
    title: detail.title,
    summary: detail.summary,
    bodyMd: body,
    frontMatter,
    changeNote: detail.change_note ?? null,
    authorId: staff.get(detail.author) ?? null,
    authorName: detail.author,
    reviewerId: staff.get(detail.reviewer) ?? null,
    reviewerName: detail.reviewer,
    reviewedAt: publishedAt,
    submittedAt: publishedAt,
    contentHash: hash,
  };

  let record = await Detail.findOne({ where: { slug: detail.slug }, transaction });
  let outcome: DetailOutcome;
  if (!record) {
    record = await Detail.create(
      {
        slug: detail.slug,
        ...buildProjection(frontMatter, body, library),
        publishedRevisionId: null,
        publishedAt: null,
      },
      { transaction },
    );
    outcome = { kind: "created" };
  } else {
    const latest = await DetailRevision.findOne({
      where: { detailId: record.id },
      order: [["number", "DESC"]],
      transaction,
    });
    const current = record.publishedRevisionId
      ? await DetailRevision.findByPk(record.publishedRevisionId, { transaction })
      : null;
    if (current && current.contentHash === hash) return { kind: "unchanged" };
    // The web desk has a newer (or equal) revision: the file must be re-exported or its revision raised.
    if (latest && latest.number >= detail.revision)
      return {
        kind: "kept",
        reason: `database has revision ${latest.number}; raise \`revision\` above it to import this file`,
      };
    outcome = { kind: "revised" };
  }
  const revision = await DetailRevision.create({ detailId: record.id, ...revisionValues }, { transaction });
  await publishRevision(revision.id, null, { transaction, at: publishedAt, library });
  return outcome;
}

async function staffByName(transaction: Transaction): Promise<Map<string, number>> {
  const users = await User.findAll({
    attributes: ["id", "displayName"],
    where: { role: ["editor", "reviewer", "admin"] },
    transaction,
  });
  return new Map(users.map((user) => [user.displayName, user.id]));
}
