import type { UploadType } from "~/models/upload.server";

// What an uploaded file really is, read from its first bytes; the name and the browser's claim are
// never trusted. SVG is text, so it is recognised by its root element and sanitised separately.

const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const JPEG = [0xff, 0xd8, 0xff];
const PDF = [0x25, 0x50, 0x44, 0x46, 0x2d]; // "%PDF-"

function startsWith(bytes: Uint8Array, signature: readonly number[]): boolean {
  return signature.every((byte, i) => bytes[i] === byte);
}

/** The SVG root after an optional BOM, XML declaration, comments and doctype. */
function looksLikeSvg(bytes: Uint8Array): boolean {
  const head = new TextDecoder("utf-8", { fatal: false }).decode(bytes.subarray(0, 4096)).replace(/^\uFEFF/, "");
  const stripped = head
    .replace(/^\s*<\?xml[\s\S]*?\?>/, "")
    .replace(/^(\s*<!--[\s\S]*?-->)*/, "")
    .replace(/^\s*<!DOCTYPE[^>]*>/i, "")
    .replace(/^(\s*<!--[\s\S]*?-->)*/, "");
  return /^\s*<svg[\s>]/.test(stripped);
}

export function sniffUploadType(bytes: Uint8Array): UploadType | null {
  if (startsWith(bytes, PNG)) return "image/png";
  if (startsWith(bytes, JPEG)) return "image/jpeg";
  if (startsWith(bytes, PDF)) return "application/pdf";
  if (looksLikeSvg(bytes)) return "image/svg+xml";
  return null;
}

export const EXTENSION: Record<UploadType, string> = {
  "image/svg+xml": "svg",
  "image/png": "png",
  "image/jpeg": "jpg",
  "application/pdf": "pdf",
};

/** The extension a name claims, lower-cased ("jpeg" counts as "jpg"). */
export function claimedExtension(name: string): string {
  const extension = /\.([A-Za-z0-9]+)$/.exec(name)?.[1]?.toLowerCase() ?? "";
  return extension === "jpeg" ? "jpg" : extension;
}
