import { createHash } from "node:crypto";

/**
 * The content hash of a detail revision: SHA-256 (hex) of its front matter and body. The importer
 * compares it to skip unchanged files, and pack keys include it, so a pack is rebuilt when any
 * sheet's content changes. Stored hashes were made with exactly this serialisation: changing it
 * makes every file look changed on the next import (harmless, but noisy).
 */
export function contentHash(frontMatter: unknown, body: string): string {
  return createHash("sha256").update(JSON.stringify({ frontMatter, body })).digest("hex");
}
