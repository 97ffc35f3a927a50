import { Lexer, type Token } from "marked";

// The sections every detail body carries, and the one way a body is read into sections: marked's
// tokens, so a "## " line inside a code block is not a heading. Used by the content importer, the
// desk's validation, search indexing, the detail page and packs.

/** Body sections by the id review comments and anchors use; the value is the heading as written. */
export const BODY_SECTION_HEADINGS = {
  "why-it-works": "Why it works",
  "install-sequence": "Install sequence",
  cautions: "Cautions",
} as const;

/** The headings every detail body carries, in this order. */
export const REQUIRED_BODY_SECTIONS = [
  BODY_SECTION_HEADINGS["why-it-works"],
  BODY_SECTION_HEADINGS["install-sequence"],
  BODY_SECTION_HEADINGS.cautions,
] as const;

export type RequiredBodySection = (typeof REQUIRED_BODY_SECTIONS)[number];

/** A body section is a level-2 heading ("## ") and everything up to the next heading of level 1 or 2. */
const SECTION_DEPTH = 2;

export interface BodySection {
  heading: string;
  /** The section's Markdown without its heading, trimmed. */
  markdown: string;
}

/**
 * The one case rule: a heading names a section when the two agree ignoring letter case and
 * surrounding or repeated spaces ("## Why It Works" is the "Why it works" section). Validation and
 * reading use the same rule, so whatever the importer and the desk accept, the pages find.
 */
export function sameSectionName(a: string, b: string): boolean {
  return normalise(a) === normalise(b);
}

function normalise(heading: string): string {
  return heading.trim().replace(/\s+/g, " ").toLowerCase();
}

function isHeading(token: Token): token is Token & { type: "heading"; depth: number; text: string } {
  return token.type === "heading";
}

/** The level-2 sections of a Markdown body, in order. Text before the first one belongs to none. */
export function bodySections(body: string): BodySection[] {
  const sections: { heading: string; raw: string[] }[] = [];
  let current: { heading: string; raw: string[] } | null = null;
  for (const token of new Lexer({ gfm: true }).lex(body)) {
    if (isHeading(token) && token.depth <= SECTION_DEPTH) {
      current = token.depth === SECTION_DEPTH ? { heading: token.text.trim(), raw: [] } : null;
      if (current) sections.push(current);
    } else {
      current?.raw.push(token.raw);
    }
  }
  return sections.map((section) => ({ heading: section.heading, markdown: section.raw.join("").trim() }));
}

/** The Markdown of one section of a body, or "" when the body has no such section. */
export function bodySection(body: string, heading: string): string {
  return bodySections(body).find((section) => sameSectionName(section.heading, heading))?.markdown ?? "";
}

/** The required sections a body lacks, in the required order. */
export function missingBodySections(body: string): RequiredBodySection[] {
  const headings = bodySections(body).map((section) => section.heading);
  return REQUIRED_BODY_SECTIONS.filter((required) => !headings.some((heading) => sameSectionName(heading, required)));
}
