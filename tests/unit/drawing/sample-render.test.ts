// Renders sample section drawings to test-results/ so a person can look at them, and checks the
// SVG carries its accessible name.
import { mkdirSync, writeFileSync } from "node:fs";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { expect, test } from "vitest";
import { SectionDrawing } from "~/components/section-drawing";
import type { SectionInput } from "~/drawing/section-geometry";

const zone6Wall: SectionInput = {
  kind: "above-grade-wall",
  layers: [
    { role: "cladding", family: "cladding", materialName: "Fibre-cement lap siding", thickness_mm: 8 },
    { role: "drainage-gap", family: "air-space", materialName: "Vented air space (furring)", thickness_mm: 19 },
    { role: "insulation", family: "foam-board", materialName: "Foil-faced polyisocyanurate board", thickness_mm: 50 },
    { role: "water-resistive-barrier", family: "membrane", materialName: "Polymeric housewrap", thickness_mm: 0.2 },
    { role: "sheathing", family: "wood-panel", materialName: "Oriented strand board", thickness_mm: 11 },
    {
      role: "insulation",
      family: "fibrous-insulation",
      materialName: "Fibreglass batt",
      thickness_mm: 140,
      framing: { fraction: 0.23, family: "lumber", materialName: "Softwood lumber" },
    },
    { role: "interior-finish", family: "gypsum", materialName: "Gypsum board", thickness_mm: 12.7 },
    { role: "vapour-retarder", family: "coating", materialName: "Latex paint", thickness_mm: 0.1 },
  ],
};

const basementWall: SectionInput = {
  kind: "basement-wall",
  layers: [
    { role: "capillary-break", family: "aggregate", materialName: "Crushed stone backfill", thickness_mm: 60 },
    { role: "soil-side-protection", family: "drainage", materialName: "Dimpled drainage mat", thickness_mm: 8 },
    { role: "water-resistive-barrier", family: "coating", materialName: "Bituminous dampproofing", thickness_mm: 1 },
    { role: "structure", family: "concrete", materialName: "Cast concrete", thickness_mm: 200 },
    { role: "insulation", family: "foam-board", materialName: "Extruded polystyrene board", thickness_mm: 50 },
    { role: "structure", family: "masonry", materialName: "Hollow concrete block", thickness_mm: 40 },
    { role: "thermal-barrier", family: "gypsum", materialName: "Gypsum board", thickness_mm: 12.7 },
  ],
};

function page(svgs: string[]): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="760" height="${svgs.length * 540}" style="background:#f7f2e8">${svgs
    .map(
      (s, i) =>
        `<g transform="translate(20 ${10 + i * 540})">${s.replace("<svg", '<svg width="720" height="520"')}</g>`,
    )
    .join("")}</svg>`;
}

test("section drawings render as accessible SVG and are written to test-results for review", () => {
  const wall = renderToStaticMarkup(
    createElement(SectionDrawing, { assembly: zone6Wall, units: "ip", title: "2x6 wall, zone 6" }),
  );
  const basement = renderToStaticMarkup(
    createElement(SectionDrawing, { assembly: basementWall, units: "si", title: "Basement wall" }),
  );
  expect(wall).toContain('role="img"');
  expect(wall).toContain("<title>2x6 wall, zone 6: section drawing</title>");
  expect(wall).toMatch(/aria-label="Section, exterior to interior: 1\. Fibre-cement lap siding, 0\.31 in;/);
  expect(basement).toContain("SOIL");
  mkdirSync("test-results", { recursive: true });
  writeFileSync("test-results/drawing-sample.svg", page([wall, basement]));
});
