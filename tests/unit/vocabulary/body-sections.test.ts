import { expect, test } from "vitest";
import {
  BODY_SECTION_HEADINGS,
  REQUIRED_BODY_SECTIONS,
  bodySection,
  bodySections,
  missingBodySections,
  sameSectionName,
} from "~/vocabulary/body-sections";

const BODY = [
  "Opening words before any section.",
  "",
  "## Why it works",
  "",
  "Exterior foam keeps the sheathing warm.",
  "",
  "### A note",
  "",
  "Sub-headings stay inside their section.",
  "",
  "## Install sequence",
  "",
  "1. Set the foam.",
  "",
  "```",
  "## not a heading inside a code block",
  "```",
  "",
  "## Cautions",
  "",
  "- Keep the foam covered.",
  "",
].join("\n");

test("every detail body carries three sections, in this order (docs/design.md, A detail file)", () => {
  expect(REQUIRED_BODY_SECTIONS).toEqual(["Why it works", "Install sequence", "Cautions"]);
  expect(Object.values(BODY_SECTION_HEADINGS)).toEqual([...REQUIRED_BODY_SECTIONS]);
});

test("sections are the level-2 headings, read from Markdown tokens (a heading in a code block is not one)", () => {
  expect(bodySections(BODY).map((section) => section.heading)).toEqual([
    "Why it works",
    "Install sequence",
    "Cautions",
  ]);
  expect(bodySection(BODY, "Why it works")).toBe(
    "Exterior foam keeps the sheathing warm.\n\n### A note\n\nSub-headings stay inside their section.",
  );
  expect(bodySection(BODY, "Install sequence")).toContain("## not a heading inside a code block");
  expect(bodySection(BODY, "Cautions")).toBe("- Keep the foam covered.");
  expect(bodySection(BODY, "References")).toBe("");
});

test("one case rule: headings match ignoring letter case and extra spaces, nothing else", () => {
  expect(sameSectionName("Why It Works", "Why it works")).toBe(true);
  expect(sameSectionName("  why   it works ", "Why it works")).toBe(true);
  expect(sameSectionName("Why it worked", "Why it works")).toBe(false);
  expect(sameSectionName("Caution", "Cautions")).toBe(false);
  const shouted = "## WHY IT WORKS\n\nText.\n\n## install sequence\n\n1. Step.\n\n## Cautions\n\n- Care.";
  expect(missingBodySections(shouted)).toEqual([]);
  expect(bodySection(shouted, "Why it works")).toBe("Text.");
});

test("the missing sections are named in the required order; deeper or shallower headings do not count", () => {
  expect(missingBodySections(BODY)).toEqual([]);
  expect(missingBodySections("")).toEqual(["Why it works", "Install sequence", "Cautions"]);
  expect(missingBodySections("# Why it works\n\n### Install sequence\n\n## Cautions\n")).toEqual([
    "Why it works",
    "Install sequence",
  ]);
  expect(missingBodySections("```\n## Cautions\n```\n## Why it works\n## Install sequence\n")).toEqual(["Cautions"]);
});
