import path from "node:path";
import { expect, test } from "vitest";
import { formatProblem } from "~/content/content-error";
import { loadContent } from "~/content/load-content";
import { moistureRegime, zoneNumber } from "~/vocabulary/climate-zones";

const CONTENT_ROOT = path.resolve(__dirname, "../../../content");
const loaded = loadContent(CONTENT_ROOT);

test("the whole content folder loads with zero errors", () => {
  expect(loaded.errors.map(formatProblem)).toEqual([]);
  expect(loaded.materials?.length ?? 0).toBeGreaterThan(0);
});

test("the demo library has at least 36 details in at least four sets", () => {
  expect(loaded.details.length).toBeGreaterThanOrEqual(36);
  expect(loaded.sets.length).toBeGreaterThanOrEqual(4);
  for (const set of loaded.sets) {
    expect(
      loaded.details.some((detail) => detail.sets.includes(set.slug)),
      set.slug,
    ).toBe(true);
  }
});

test("the library covers every assembly kind asked for, zones 2 to 8 and all three moisture regimes", () => {
  const kinds = new Set(loaded.details.map((detail) => detail.assembly));
  for (const kind of [
    "above-grade-wall",
    "roof",
    "floor",
    "crawlspace-wall",
    "crawlspace-floor",
    "basement-wall",
    "slab",
    "rim-joist",
  ]) {
    expect(kinds.has(kind as never), kind).toBe(true);
  }
  const zones = loaded.details.flatMap((detail) => detail.zones);
  expect(new Set(zones.map(zoneNumber))).toEqual(new Set([2, 3, 4, 5, 6, 7, 8]));
  expect(new Set(zones.map(moistureRegime).filter((regime) => regime !== null))).toEqual(new Set(["A", "B", "C"]));
  const belowGrade = new Set(loaded.details.map((detail) => detail.below_grade));
  for (const condition of ["vented-crawlspace", "sealed-crawlspace", "basement", "slab-on-grade"]) {
    expect(belowGrade.has(condition as never), condition).toBe(true);
  }
});

test("about a third of the details are free, and free details span several kinds", () => {
  const free = loaded.details.filter((detail) => detail.tier === "free");
  expect(free.length / loaded.details.length).toBeGreaterThan(0.25);
  expect(free.length / loaded.details.length).toBeLessThan(0.45);
  expect(new Set(free.map((detail) => detail.assembly)).size).toBeGreaterThanOrEqual(5);
});

test("every body defers to the local code and a licensed professional", () => {
  for (const detail of loaded.details) {
    expect(detail.body, detail.slug).toMatch(/local code and a licensed professional/);
    expect(detail.body, detail.slug).toMatch(/## Install sequence\n+1\. /);
  }
});

test("every detail with foam plastic inboard of its structure names the thermal or ignition barrier rule", () => {
  // IRC 2021 R316.4 / R316.5: foam plastic facing the inside needs a thermal (or, in crawl spaces,
  // an ignition) barrier; slabs are exempt because the foam lies under the concrete.
  for (const detail of loaded.details) {
    if (detail.assembly === "slab") continue;
    const structure = detail.layers.findIndex((layer) => layer.role === "structure");
    if (structure === -1) continue; // framed walls: exterior foam is outside the frame
    const inboardFoam = detail.layers.some(
      (layer, index) => index > structure && /xps|eps|polyiso|spray-foam|icf/.test(layer.material),
    );
    if (!inboardFoam) continue;
    const mentions =
      /R316|thermal barrier|ignition barrier/i.test(detail.body) || detail.references.some((ref) => /R316/.test(ref));
    expect(mentions, detail.slug).toBe(true);
  }
});

test("later revisions say what changed", () => {
  const revised = loaded.details.filter((detail) => detail.revision > 1);
  expect(revised.length).toBeGreaterThanOrEqual(5);
  for (const detail of revised) expect(detail.change_note, detail.slug).toBeTruthy();
});
