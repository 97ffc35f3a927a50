import { stringify } from "yaml";
import type { DetailFrontMatter } from "~/content/detail-schema";

// A detail written back to its content-file form (content/details/<slug>.md): YAML front matter between
// `---` lines, then the Markdown body. Pure, so the desk's export and the packs share it. Keys keep the
// order of the content format, and optional keys that are absent stay absent.

const KEY_ORDER: (keyof DetailFrontMatter)[] = [
  "slug",
  "title",
  "summary",
  "assembly",
  "substrate",
  "below_grade",
  "strategy",
  "zones",
  "tier",
  "sets",
  "revision",
  "revised",
  "change_note",
  "author",
  "reviewer",
  "references",
  "layers",
];

export function exportDetailMarkdown(frontMatter: DetailFrontMatter, body: string): string {
  const ordered: Record<string, unknown> = {};
  for (const key of KEY_ORDER) if (frontMatter[key] !== undefined) ordered[key] = frontMatter[key];
  // Keys the format grows later are kept rather than silently dropped.
  for (const [key, value] of Object.entries(frontMatter))
    if (!(key in ordered) && value !== undefined) ordered[key] = value;
  const yaml = stringify(ordered, { lineWidth: 0 });
  const text = body.startsWith("\n") ? body : `\n${body}`;
  return `---\n${yaml}---${text.endsWith("\n") ? text : `${text}\n`}`;
}
