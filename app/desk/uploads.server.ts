import { createHash, randomBytes } from "node:crypto";
import type { Readable } from "node:stream";
import createDOMPurify from "dompurify";
import { JSDOM } from "jsdom";
import { requireEntitlement, type Viewer } from "~/access/premium.server";
import { isEditableRevisionState } from "~/vocabulary/revision-states";
import { roleAtLeast } from "~/vocabulary/roles";
import { Detail, DetailRevision, Upload } from "~/models/index.server";
import type { UploadType } from "~/models/upload.server";
import { blobStorage } from "~/storage/storage.server";
import { claimedExtension, EXTENSION, sniffUploadType } from "./file-type";
import { DeskError, type DeskActor } from "./revisions.server";

// Drawings and photos attached to a revision. Bytes are typed by their content, SVG is re-written
// through DOMPurify's SVG profile (no scripts, handlers, foreign objects or javascript: links), and
// everything is kept in blob storage outside public/, served only through a route that checks access.

export const MAX_UPLOAD_BYTES = 5 * 1024 * 1024;

const window = new JSDOM("").window;
const purify = createDOMPurify(window);

/** The SVG with everything active removed, or null when what is left is not a well-formed SVG document. */
export function sanitiseSvg(text: string): string | null {
  const clean = purify.sanitize(text, { USE_PROFILES: { svg: true, svgFilters: true } }).replaceAll("&nbsp;", "&#160;");
  if (!/^<svg[\s>]/.test(clean)) return null;
  const parsed = new window.DOMParser().parseFromString(clean, "image/svg+xml");
  if (parsed.getElementsByTagName("parsererror").length > 0 || parsed.documentElement.nodeName !== "svg") return null;
  return `<?xml version="1.0" encoding="UTF-8"?>\n${clean}\n`;
}

export interface UploadRow {
  id: number;
  name: string;
  contentType: string;
  byteSize: number;
  caption: string | null;
  href: string;
}

function row(upload: Upload): UploadRow {
  return {
    id: upload.id,
    name: upload.originalName,
    contentType: upload.contentType,
    byteSize: upload.byteSize,
    caption: upload.caption,
    href: `/uploads/${upload.id}`,
  };
}

export async function uploadsOf(revisionId: number): Promise<UploadRow[]> {
  return (await Upload.findAll({ where: { revisionId }, order: [["id", "ASC"]] })).map(row);
}

/** A readable display name: no directories, no control characters, at most 120 characters. */
function displayName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "upload";
  // biome-ignore lint/suspicious/noControlCharactersInRegex: control characters are exactly what a file name must lose
  return base.replace(/[\u0000-\u001f\u007f"]/g, "").slice(-120) || "upload";
}

/** Checks, cleans and stores one file for the author's open revision. */
export async function storeUpload(
  actor: DeskActor,
  revisionId: number,
  file: File,
  caption: string,
): Promise<UploadRow> {
  const revision = await DetailRevision.findByPk(revisionId);
  if (!revision) throw new DeskError(404, "No such revision.");
  if (revision.authorId !== actor.id) throw new DeskError(403, "Only the revision's author attaches files to it.");
  if (!isEditableRevisionState(revision.state))
    throw new DeskError(409, "Files are attached while the revision is a draft.");
  if (file.size > MAX_UPLOAD_BYTES) throw new DeskError(400, "That file is larger than 5 MB.");
  let bytes: Buffer = Buffer.from(await file.arrayBuffer());
  if (bytes.length > MAX_UPLOAD_BYTES) throw new DeskError(400, "That file is larger than 5 MB.");
  if (bytes.length === 0) throw new DeskError(400, "That file is empty.");

  const type = sniffUploadType(bytes);
  if (!type) throw new DeskError(400, "Only SVG, PNG, JPEG and PDF files can be attached.");
  const claimed = claimedExtension(file.name);
  // A name that says one thing while the bytes say another is refused rather than guessed at.
  if (claimed && claimed !== EXTENSION[type])
    throw new DeskError(
      400,
      `“${displayName(file.name)}” is named .${claimed} but its content is ${EXTENSION[type].toUpperCase()}.`,
    );
  if (type === "image/svg+xml") {
    const clean = sanitiseSvg(bytes.toString("utf8"));
    if (!clean) throw new DeskError(400, "That SVG could not be read as a drawing.");
    bytes = Buffer.from(clean, "utf8");
  }

  const key = `uploads/r${revision.id}/${randomBytes(12).toString("hex")}.${EXTENSION[type]}`;
  await blobStorage().put(key, bytes);
  try {
    const upload = await Upload.create({
      revisionId: revision.id,
      uploaderId: actor.id,
      originalName: displayName(file.name),
      contentType: type,
      byteSize: bytes.length,
      sha256: createHash("sha256").update(bytes).digest("hex"),
      storageKey: key,
      caption: caption.trim().slice(0, 300) || null,
    });
    return row(upload);
  } catch (error) {
    await blobStorage().remove(key);
    throw error;
  }
}

export async function removeUpload(actor: DeskActor, uploadId: number): Promise<void> {
  const upload = await Upload.findByPk(uploadId);
  if (!upload) throw new DeskError(404, "No such file.");
  const revision = await DetailRevision.findByPk(upload.revisionId);
  if (!revision || revision.authorId !== actor.id || !isEditableRevisionState(revision.state))
    throw new DeskError(403, "Only the author removes files from an open revision.");
  await upload.destroy();
  await blobStorage().remove(upload.storageKey);
}

export interface ServedUpload {
  body: Readable;
  size: number;
  contentType: UploadType;
  name: string;
}

/**
 * The file, when this viewer may read it: a published revision's files follow the detail's tier
 * (premium needs a plan or the set); anything else (drafts, submissions, history) is for editors only.
 * A draft's file answers "not found" to non-editors, so its existence is not revealed; a premium
 * published file is refused (the premium refusal, 403) to those without access.
 */
export async function readUpload(viewer: Viewer | null, uploadId: number): Promise<ServedUpload | null> {
  const upload = await Upload.findByPk(uploadId, {
    include: [
      {
        model: DetailRevision,
        as: "revision",
        attributes: ["id", "detailId", "state"],
        include: [{ model: Detail, as: "detail", attributes: ["id", "tier", "publishedRevisionId", "withdrawnAt"] }],
      },
    ],
  });
  const revision = upload?.revision;
  const detail = revision?.detail;
  if (!upload || !revision || !detail) return null;
  const live = revision.state === "published" && detail.publishedRevisionId === revision.id && detail.isLive();
  const editor = viewer !== null && roleAtLeast(viewer.role, "editor");
  if (!editor && !live) return null;
  if (!editor) await requireEntitlement(viewer, { what: "This drawing", detail });
  const stored = await blobStorage().get(upload.storageKey);
  if (!stored) return null;
  return { body: stored.body, size: stored.size, contentType: upload.contentType, name: upload.originalName };
}
