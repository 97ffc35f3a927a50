import createDOMPurify from "dompurify";
import { JSDOM } from "jsdom";
import { Marked } from "marked";

// One parser and one sanitiser per process: jsdom windows are expensive to create.
const marked = new Marked({ gfm: true, breaks: false, async: false });
const purify = createDOMPurify(new JSDOM("").window);

/** Markdown written by editors, rendered and sanitised on the server; safe to inject as HTML. */
export function renderMarkdown(markdown: string): string {
  const html = marked.parse(markdown) as string;
  return purify.sanitize(html, { USE_PROFILES: { html: true }, FORBID_TAGS: ["style", "form", "input"], FORBID_ATTR: ["style"] });
}

/** The text of one `## Heading` section of a body, or "" when the body has no such section. */
export function markdownSection(markdown: string, heading: string): string {
  const lines = markdown.split("\n");
  const start = lines.findIndex((line) => line.trim().toLowerCase() === `## ${heading.toLowerCase()}`);
  if (start < 0) return "";
  const end = lines.findIndex((line, i) => i > start && /^##\s/.test(line));
  return lines.slice(start + 1, end < 0 ? undefined : end).join("\n").trim();
}
