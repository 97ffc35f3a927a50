import { expect, test } from "vitest";
import { ContentError } from "~/content/content-error";
import { parseDetail } from "~/content/parse-detail";

// A small, valid detail; line numbers below count the opening `---` as line 1.
const GOOD = `---
slug: test-slab
title: Test slab on crushed stone
summary: A short summary that is long enough for a card.
assembly: slab
substrate: cast-concrete
below_grade: slab-on-grade
strategy: under-slab
zones: ["4A", "5B", "7"]
tier: free
sets: [below-grade-essentials]
revision: 2
revised: 2026-03-02
change_note: "Board raised from 38 to 50 mm."
author: Ada Editor
reviewer: Ben Reviewer
references:
  - "IRC 2021 R506.2.3 (vapour retarder under slabs)"
layers:
  - { role: capillary-break, material: crushed-stone, thickness_mm: 100 }
  - { role: insulation, material: xps-board, thickness_mm: 50, joints: taped }
  - { role: vapour-retarder, material: polyethylene-sheet-10mil, thickness_mm: 0.25, joints: lapped }
  - { role: structure, material: cast-concrete, thickness_mm: 100 }
---
## Why it works
Text.

## Install sequence
1. Step.

## Cautions
Check against the local code and a licensed professional.
`;

const MATERIALS = new Set(["crushed-stone", "xps-board", "polyethylene-sheet-10mil", "cast-concrete"]);
const SETS = new Set(["below-grade-essentials"]);

function parseError(fileName: string, text: string, options = {}): ContentError {
  try {
    parseDetail(fileName, text, options);
  } catch (error) {
    if (error instanceof ContentError) return error;
    throw error;
  }
  throw new Error("expected a ContentError");
}

test("a good file parses into typed fields and keeps its body", () => {
  const detail = parseDetail("details/test-slab.md", GOOD, { knownMaterials: MATERIALS, knownSets: SETS });
  expect(detail.slug).toBe("test-slab");
  expect(detail.zones).toEqual(["4A", "5B", "7"]);
  expect(detail.revised).toBe("2026-03-02");
  expect(detail.layers).toHaveLength(4);
  expect(detail.layers[1]).toEqual({ role: "insulation", material: "xps-board", thickness_mm: 50, joints: "taped" });
  expect(detail.body.startsWith("## Why it works")).toBe(true);
  expect(detail.bodyStartLine).toBe(25);
  expect(detail.file).toBe("details/test-slab.md");
});

test("an unknown field name is reported with its file, line and field", () => {
  const text = GOOD.replace("tier: free", "teir: free");
  const error = parseError("details/test-slab.md", text);
  const unknown = error.problems.find((problem) => problem.field === "teir");
  expect(unknown).toMatchObject({ file: "details/test-slab.md", line: 10, message: 'unknown field "teir"' });
});

test("a bad value inside a layer points at that layer's line and names the nested field", () => {
  const text = GOOD.replace("role: insulation, material: xps-board", "role: insulashun, material: xps-board");
  const error = parseError("details/test-slab.md", text);
  expect(error).toMatchObject({ file: "details/test-slab.md", line: 21, field: "layers[1].role" });
});

test("a zone that is not a real zone id is refused at the zones line", () => {
  // Zone 7 has no moisture letter in the IECC (IECC 2021 R301.1), so "7A" is not an id.
  const error = parseError("details/test-slab.md", GOOD.replace('"7"]', '"7A"]'));
  expect(error).toMatchObject({ line: 9, field: "zones[2]" });
});

test("a reviewer who is also the author is refused at the reviewer line", () => {
  const error = parseError("details/test-slab.md", GOOD.replace("reviewer: Ben Reviewer", "reviewer: Ada Editor"));
  expect(error).toMatchObject({ line: 16, field: "reviewer" });
});

test("a second revision without a change note is refused at the revision line", () => {
  const error = parseError("details/test-slab.md", GOOD.replace('change_note: "Board raised from 38 to 50 mm."\n', ""));
  expect(error).toMatchObject({ line: 12, field: "revision" });
});

test("broken YAML is reported with the line of the syntax error", () => {
  const text = GOOD.replace('zones: ["4A", "5B", "7"]', 'zones: ["4A", "5B", "7"\nextra: : :');
  const error = parseError("details/test-slab.md", text);
  expect(error.field).toBe("");
  expect(error.message).toMatch(/YAML syntax/);
  expect(error.line).toBeGreaterThanOrEqual(9);
  expect(error.line).toBeLessThanOrEqual(11);
});

test("a file without front matter is refused at line 1", () => {
  const error = parseError("details/test-slab.md", "# Just markdown\n");
  expect(error).toMatchObject({ line: 1, field: "" });
});

test("an unknown material is reported at the layer's line", () => {
  const text = GOOD.replace("material: xps-board", "material: xps-bored");
  const error = parseError("details/test-slab.md", text, { knownMaterials: MATERIALS, knownSets: SETS });
  expect(error.problems).toEqual([
    { file: "details/test-slab.md", line: 21, field: "layers[1].material", message: 'unknown material "xps-bored"' },
  ]);
});

test("an unknown set is reported at the sets line", () => {
  const text = GOOD.replace("sets: [below-grade-essentials]", "sets: [below-grade-essentials, roofs]");
  const error = parseError("details/test-slab.md", text, { knownMaterials: MATERIALS, knownSets: SETS });
  expect(error).toMatchObject({ line: 11, field: "sets[1]" });
});

test("a slug that differs from the file name is reported at the slug line", () => {
  const error = parseError("details/other-slab.md", GOOD);
  expect(error).toMatchObject({ file: "details/other-slab.md", line: 2, field: "slug" });
  expect(error.message).toMatch(/expected "other-slab"/);
});

test("a body without the three required sections is refused", () => {
  const error = parseError("details/test-slab.md", GOOD.replace("## Cautions", "## Notes"));
  expect(error).toMatchObject({ field: "body", line: 25 });
  expect(error.message).toMatch(/Cautions/);
});

test("every problem in a file is listed, not only the first", () => {
  const text = GOOD.replace("tier: free", "tier: gold").replace("assembly: slab", "assembly: patio");
  const error = parseError("details/test-slab.md", text);
  expect(error.problems.map((problem) => problem.field).sort()).toEqual(["assembly", "tier"]);
  expect(error.problems.map((problem) => problem.line).sort()).toEqual([10, 5]);
});
