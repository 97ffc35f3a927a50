import { createHash } from "node:crypto";
import { PassThrough, type Readable } from "node:stream";
import { ZipArchive } from "archiver";
import { requireEntitlement, type Viewer } from "~/access/premium.server";
import { exportDetailMarkdown } from "~/catalogue/export-markdown";
import { materialLibrary } from "~/catalogue/materials.server";
import { plainText } from "~/catalogue/search-text";
import { checkAssemblyForSite } from "~/catalogue/site-check.server";
import type { DetailFrontMatter } from "~/content/detail-schema";
import type { Material } from "~/envelope";
import { Detail, DetailRevision, DetailSet, Download, MaterialRecord } from "~/models/index.server";
import { blobStorage } from "~/storage/storage.server";
import { renderDetailSheet } from "./sheet-pdf.server";
import { BODY_SECTION_HEADINGS, bodySection } from "~/vocabulary/body-sections";
import { STANDING_CAUTION } from "~/vocabulary/caution";
import { UNIT_SYSTEM_LABELS } from "~/vocabulary/units";
import type { PackRequest } from "./pack-request";

// A pack is a set's download: one PDF sheet and one Markdown source file per published detail.
// Packs are built once per (set, published revisions, material library, units, zone) and kept in blob
// storage; the key changes when any of those change, so a stale pack is never served.

/** Raise when the pack layout or the sheet changes, so cached packs are rebuilt. */
const PACK_FORMAT = 1;

interface PackMember {
  slug: string;
  revisionId: number;
  revisionNumber: number;
  contentHash: string;
  frontMatter: DetailFrontMatter;
  body: string;
  publishedAt: Date | null;
  authorName: string;
  reviewerName: string | null;
  changeNote: string | null;
}

async function packMembers(setId: number): Promise<PackMember[]> {
  const details = await Detail.scope("live").findAll({
    attributes: ["id", "slug", "publishedRevisionId"],
    include: [
      { model: DetailSet, as: "sets", attributes: [], where: { id: setId }, required: true },
      { model: DetailRevision, as: "publishedRevision", required: true },
    ],
    order: [["slug", "ASC"]],
  });
  return details.flatMap((detail) => {
    const revision = detail.publishedRevision;
    if (!revision) return [];
    return [
      {
        slug: detail.slug,
        revisionId: revision.id,
        revisionNumber: revision.number,
        contentHash: revision.contentHash,
        frontMatter: revision.frontMatter,
        body: revision.bodyMd,
        publishedAt: revision.publishedAt,
        authorName: revision.authorName,
        reviewerName: revision.reviewerName,
        changeNote: revision.changeNote,
      },
    ];
  });
}

async function materialsVersion(): Promise<string> {
  const newest = await MaterialRecord.max("updatedAt");
  const count = await MaterialRecord.count();
  return `${count}:${newest instanceof Date ? newest.toISOString() : String(newest ?? "none")}`;
}

/** The cache key: readable prefix for people, hash of everything the content depends on. */
export function packKey(
  setSlug: string,
  request: PackRequest,
  members: Pick<PackMember, "slug" | "revisionId" | "contentHash">[],
  materials: string,
): string {
  const fingerprint = createHash("sha256")
    .update(
      JSON.stringify({
        format: PACK_FORMAT,
        set: setSlug,
        units: request.units,
        zone: request.zone,
        materials,
        members: members.map((m) => [m.slug, m.revisionId, m.contentHash]),
      }),
    )
    .digest("hex")
    .slice(0, 20);
  return `packs/${setSlug}/${request.units}-${request.zone.toLowerCase()}-${fingerprint}.zip`;
}

const PACK_README = (setTitle: string, request: PackRequest, members: PackMember[]) =>
  [
    `Dryside pack: ${setTitle}`,
    "",
    `Units: ${UNIT_SYSTEM_LABELS[request.units]}. Site check: ${request.zone === "own" ? "each detail at the first climate zone it is written for" : `climate zone ${request.zone}`}.`,
    "",
    "Contents (one PDF sheet and the Markdown source per detail):",
    ...members.map((m) => `  ${m.slug}.pdf / ${m.slug}.md (revision ${m.revisionNumber})`),
    "",
    `Caution: ${STANDING_CAUTION}`,
    "",
  ].join("\n");

/** The "## Cautions" list of a body as plain sentences, one per bullet. */
export function cautionsOf(body: string): string[] {
  const items: string[] = [];
  for (const line of bodySection(body, BODY_SECTION_HEADINGS.cautions).split("\n")) {
    const bullet = /^\s*(?:[-*+]|\d+[.)])\s+(.*)$/.exec(line);
    if (bullet) items.push(bullet[1]);
    else if (line.trim() && items.length > 0) items[items.length - 1] += ` ${line.trim()}`;
    else if (line.trim()) items.push(line.trim());
  }
  return items.map((item) => plainText(item)).filter(Boolean);
}

async function sheetPdf(
  member: PackMember,
  request: PackRequest,
  library: ReadonlyMap<string, Material>,
): Promise<Buffer> {
  const zone = request.zone === "own" ? member.frontMatter.zones[0] : request.zone;
  const check = await checkAssemblyForSite(member.frontMatter, { units: request.units, zone });
  if (!check.ok)
    throw new Error(`site check for ${member.slug} at ${zone} failed: ${JSON.stringify(check.fieldErrors)}`);
  const front = member.frontMatter;
  return renderDetailSheet({
    title: front.title,
    slug: member.slug,
    revision: {
      number: member.revisionNumber,
      publishedAt: member.publishedAt ?? front.revised ?? "unpublished",
      authorName: member.authorName,
      reviewerName: member.reviewerName ?? front.reviewer,
      changeNote: member.changeNote,
    },
    summary: front.summary,
    kind: front.assembly,
    layers: front.layers.map((layer) => ({
      role: layer.role,
      family: library.get(layer.material)?.family ?? "unknown",
      materialName: library.get(layer.material)?.name ?? layer.material,
      thickness_mm: layer.thickness_mm,
      ...(layer.framing
        ? {
            framing: {
              fraction: layer.framing.fraction,
              family: library.get(layer.framing.material)?.family ?? "lumber",
              materialName: library.get(layer.framing.material)?.name,
            },
          }
        : {}),
    })),
    units: request.units,
    siteCheck: check.result,
    cautions: cautionsOf(member.body),
    references: front.references,
  });
}

/** Starts writing the ZIP and returns its stream at once; sheets are rendered as the stream is read. */
function buildPack(setTitle: string, members: PackMember[], request: PackRequest): Readable {
  const archive = new ZipArchive({ zlib: { level: 6 } });
  const out = new PassThrough();
  archive.on("error", (error) => out.destroy(error));
  archive.pipe(out);
  void (async () => {
    archive.append(PACK_README(setTitle, request, members), { name: "README.txt" });
    const library = await materialLibrary();
    // Sheets one after another: each PDF render is CPU-bound and the machine is shared.
    for (const member of members) {
      archive.append(await sheetPdf(member, request, library), { name: `${member.slug}.pdf` });
      archive.append(exportDetailMarkdown(member.frontMatter, member.body), { name: `${member.slug}.md` });
    }
    await archive.finalize();
  })().catch((error: unknown) => out.destroy(error instanceof Error ? error : new Error(String(error))));
  return out;
}

// A pack being written to storage right now; later requests for the same key wait for it.
const building = new Map<string, Promise<void>>();

/**
 * The pack's bytes: from storage when built before, otherwise built now and streamed to the first
 * downloader while the same bytes are stored (so a first download starts at once instead of after
 * every sheet is rendered).
 */
async function openPack(
  key: string,
  build: () => Readable,
): Promise<{ body: Readable; size: number | null; built: boolean }> {
  const storage = blobStorage();
  const pending = building.get(key);
  if (pending) await pending;
  const stored = await storage.get(key);
  if (stored) return { ...stored, built: false };
  const source = build();
  const toClient = new PassThrough();
  const toStorage = new PassThrough();
  source.on("error", (error) => {
    toClient.destroy(error);
    toStorage.destroy(error);
  });
  source.pipe(toClient);
  source.pipe(toStorage);
  const write = storage.put(key, toStorage).finally(() => building.delete(key));
  building.set(key, write);
  write.catch((error: unknown) =>
    console.error(`pack ${key} was not stored:`, error instanceof Error ? error.message : error),
  );
  return { body: toClient, size: null, built: true };
}

export type PackDownload =
  | { ok: true; key: string; fileName: string; body: Readable; size: number | null; built: boolean }
  | { ok: false; status: 404; message: string };

/**
 * Checks access again (a plan can have lapsed since the page was drawn), builds or reuses the pack,
 * logs the download and returns the stream.
 */
export async function downloadPack(viewer: Viewer, setSlug: string, request: PackRequest): Promise<PackDownload> {
  const set = await DetailSet.findOne({ where: { slug: setSlug } });
  if (!set) return { ok: false, status: 404, message: `No set called “${setSlug}”.` };
  await requireEntitlement(viewer, { what: `The “${set.title}” pack`, set });
  const members = await packMembers(set.id);
  if (members.length === 0) return { ok: false, status: 404, message: `“${set.title}” has no published details yet.` };
  const key = packKey(set.slug, request, members, await materialsVersion());
  const pack = await openPack(key, () => buildPack(set.title, members, request));
  await Download.create({ userId: viewer.id, setId: set.id, packKey: key });
  return { ok: true, key, fileName: `dryside-${set.slug}-${request.units}-${request.zone.toLowerCase()}.zip`, ...pack };
}
