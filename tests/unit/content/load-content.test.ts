import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterEach, expect, test } from "vitest";
import { loadContent } from "~/content/load-content";

const folders: string[] = [];
afterEach(() => {
  for (const folder of folders.splice(0)) rmSync(folder, { recursive: true, force: true });
});

function material(slug: string, family: string): string {
  // Values are placeholders for the loader's own checks, not physical data.
  return `slug: ${slug}
name: ${slug}
family: ${family}
thermal:
  rsi_fixed: 0.1
  source: "placeholder for a loader test, M"
vapour:
  permeance_ng: 100
  source: "placeholder for a loader test, M"
`;
}

const SETS = `- slug: below-grade-essentials
  title: Below-grade essentials
  summary: Basements, crawlspaces and slabs.
  price_cents: 4900
  currency: usd
`;

function detail(slug: string, materials: [string, string]): string {
  return `---
slug: ${slug}
title: A small test slab
summary: A short summary that is long enough for a card.
assembly: slab
substrate: cast-concrete
below_grade: slab-on-grade
strategy: under-slab
zones: ["5A"]
tier: free
sets: [below-grade-essentials]
revision: 1
author: Ada Editor
reviewer: Ben Reviewer
references:
  - "IRC 2021 R506.2.3"
layers:
  - { role: capillary-break, material: ${materials[0]}, thickness_mm: 100 }
  - { role: structure, material: ${materials[1]}, thickness_mm: 100 }
---
## Why it works
x
## Install sequence
1. x
## Cautions
Check against the local code and a licensed professional.
`;
}

function contentFolder(files: Record<string, string>): string {
  const root = mkdtempSync(path.join(tmpdir(), "dryside-content-"));
  folders.push(root);
  for (const [name, text] of Object.entries(files)) {
    mkdirSync(path.dirname(path.join(root, name)), { recursive: true });
    writeFileSync(path.join(root, name), text);
  }
  return root;
}

test("a consistent folder loads materials, sets and details with no errors", () => {
  const root = contentFolder({
    "materials/crushed-stone.yaml": material("crushed-stone", "aggregate"),
    "materials/cast-concrete.yaml": material("cast-concrete", "concrete"),
    "sets.yaml": SETS,
    "details/test-slab.md": detail("test-slab", ["crushed-stone", "cast-concrete"]),
  });
  const loaded = loadContent(root);
  expect(loaded.errors).toEqual([]);
  expect(loaded.materials?.map((entry) => entry.slug)).toEqual(["cast-concrete", "crushed-stone"]);
  expect(loaded.details.map((entry) => entry.slug)).toEqual(["test-slab"]);
  expect(loaded.sets.map((entry) => entry.slug)).toEqual(["below-grade-essentials"]);
});

test("an unknown material in a layer is an error at that layer's line, relative to the folder", () => {
  const root = contentFolder({
    "materials/cast-concrete.yaml": material("cast-concrete", "concrete"),
    "sets.yaml": SETS,
    "details/test-slab.md": detail("test-slab", ["gravel-of-dreams", "cast-concrete"]),
  });
  const loaded = loadContent(root);
  expect(loaded.details).toEqual([]);
  // Line 18: `---` is line 1 and the first layer is the 18th line of the file.
  expect(loaded.errors).toEqual([
    {
      file: "details/test-slab.md",
      line: 18,
      field: "layers[0].material",
      message: 'unknown material "gravel-of-dreams"',
    },
  ]);
});

test("a material whose slug differs from its file name, and a bad material field, are reported", () => {
  const root = contentFolder({
    "materials/cast-concrete.yaml": material("cast-concrete-x", "concrete"),
    "materials/crushed-stone.yaml": material("crushed-stone", "gravel"),
    "sets.yaml": SETS,
  });
  const loaded = loadContent(root);
  expect(loaded.errors).toContainEqual(
    expect.objectContaining({ file: "materials/cast-concrete.yaml", line: 1, field: "slug" }),
  );
  expect(loaded.errors).toContainEqual(
    expect.objectContaining({ file: "materials/crushed-stone.yaml", line: 3, field: "family" }),
  );
});

test("a missing sets.yaml is an error and every set reference then fails", () => {
  const root = contentFolder({
    "materials/crushed-stone.yaml": material("crushed-stone", "aggregate"),
    "materials/cast-concrete.yaml": material("cast-concrete", "concrete"),
    "details/test-slab.md": detail("test-slab", ["crushed-stone", "cast-concrete"]),
  });
  const loaded = loadContent(root);
  expect(loaded.errors.map((error) => `${error.file}:${error.field}`)).toEqual([
    "sets.yaml:",
    "details/test-slab.md:sets[0]",
  ]);
});

test("a folder without materials/ loads details without checking their materials", () => {
  const root = contentFolder({
    "sets.yaml": SETS,
    "details/test-slab.md": detail("test-slab", ["anything", "at-all"]),
  });
  const loaded = loadContent(root);
  expect(loaded.materials).toBeUndefined();
  expect(loaded.errors).toEqual([]);
});
