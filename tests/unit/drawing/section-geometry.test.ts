// The section drawing's geometry: proportions, order, hatch containment, callouts, scale bar.
import { expect, test } from "vitest";
import { insideBox, type Box } from "~/drawing/clip";
import {
  fitBandWidths,
  sectionGeometry,
  sideLabelsFor,
  spreadCallouts,
  type SectionInput,
} from "~/drawing/section-geometry";
import type { Shape } from "~/drawing/shapes";
import { formatThickness, inToMm } from "~/envelope/units";

const wall: SectionInput = {
  kind: "above-grade-wall",
  layers: [
    { role: "cladding", family: "cladding", materialName: "Fibre-cement lap siding", thickness_mm: 8 },
    { role: "drainage-gap", family: "air-space", materialName: "Vented air space", thickness_mm: 19 },
    { role: "insulation", family: "foam-board", materialName: "Extruded polystyrene board", thickness_mm: 50 },
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

const everyFamily: SectionInput = {
  kind: "basement-wall",
  layers: [
    "cladding",
    "masonry",
    "concrete",
    "wood-panel",
    "lumber",
    "gypsum",
    "foam-board",
    "spray-foam",
    "fibrous-insulation",
    "loose-fill",
    "membrane",
    "sheet-retarder",
    "coating",
    "air-space",
    "drainage",
    "aggregate",
    "metal",
    "roofing",
  ].map((family, i) => ({ role: "structure", family, materialName: `Material ${i + 1}`, thickness_mm: 10 + i * 3 })),
};

function pointsOf(s: Shape): [number, number][] {
  switch (s.type) {
    case "line":
      return [
        [s.x1, s.y1],
        [s.x2, s.y2],
      ];
    case "polyline":
      return s.points;
    case "circle":
      return [
        [s.cx - s.r, s.cy - s.r],
        [s.cx + s.r, s.cy + s.r],
      ];
    case "rect":
      return [
        [s.x, s.y],
        [s.x + s.w, s.y + s.h],
      ];
    case "text":
      return [[s.x, s.y]];
  }
}

test("bands run exterior to interior, touch, and fill the section width", () => {
  const g = sectionGeometry(wall, { units: "si" });
  expect(g.bands.map((b) => b.materialName)).toEqual(wall.layers.map((l) => l.materialName));
  for (let i = 1; i < g.bands.length; i++) {
    expect(g.bands[i].box.x).toBeCloseTo(g.bands[i - 1].box.x + g.bands[i - 1].box.w, 9);
  }
  const first = g.bands[0].box;
  const last = g.bands[g.bands.length - 1].box;
  expect(last.x + last.w - first.x).toBeCloseTo(720 - 2 * 24, 6);
});

test("bands at true scale are proportional to thickness; thin layers get the minimum width and a not-to-scale mark", () => {
  const g = sectionGeometry(wall, { units: "si", minBandWidth: 6 });
  const toScale = g.bands.filter((b) => !b.drawnWiderThanScale);
  for (const b of toScale) expect(b.box.w / b.thickness_mm).toBeCloseTo(g.scale.pxPerMm, 9);
  // XPS (50 mm) is drawn 50/11 as wide as the OSB (11 mm).
  expect(g.bands[2].box.w / g.bands[4].box.w).toBeCloseTo(50 / 11, 9);
  const thin = g.bands.filter((b) => b.drawnWiderThanScale).map((b) => b.materialName);
  expect(thin).toEqual(["Polymeric housewrap", "Latex paint"]);
  for (const b of g.bands.filter((x) => x.drawnWiderThanScale)) {
    expect(b.box.w).toBe(6);
    expect(b.trueWidth).toBeLessThan(6);
  }
  expect(g.notToScale).toBe(true);
  expect(g.shapes.some((s) => s.type === "text" && s.text.startsWith("* Thin layer drawn wider"))).toBe(true);
  expect(g.shapes.some((s) => s.type === "text" && s.tag === "legend:4" && s.text.endsWith(" *"))).toBe(true);
});

test("widening one layer can push another under the minimum; the fit settles on both", () => {
  const fit = fitBandWidths([100, 0.5, 2.1], 100, 6);
  expect(fit.widened).toEqual([false, true, true]);
  expect(fit.widths.reduce((s, w) => s + w, 0)).toBeCloseTo(100, 9);
});

test("every band's hatch lies inside its band, and framed layers hatch around the framing member", () => {
  for (const input of [wall, everyFamily]) {
    const g = sectionGeometry(input, { units: "ip" });
    for (const band of g.bands) {
      const hatch = g.shapes.filter((s) => s.tag === `hatch:${band.index}`);
      const style = input.layers[band.index].family;
      if (!["membrane", "sheet-retarder", "coating", "metal", "air-space"].includes(style))
        expect(hatch.length, style).toBeGreaterThan(0);
      for (const s of hatch)
        for (const [x, y] of pointsOf(s)) expect(insideBox(x, y, band.box), `${style} at ${x},${y}`).toBe(true);
    }
  }
  const g = sectionGeometry(wall, { units: "si" });
  const batt = g.bands[5];
  expect(batt.framingBox).toBeDefined();
  const stud = batt.framingBox as Box;
  const cavityLines = g.shapes.filter(
    (s): s is Extract<Shape, { type: "polyline" }> => s.tag === "hatch:5" && s.type === "polyline",
  );
  expect(cavityLines.length).toBeGreaterThan(0);
  // Batt loops stay out of the framing member (its crossed box is drawn as lines).
  for (const s of cavityLines)
    for (const [, y] of s.points) expect(y <= stud.y + 1e-6 || y >= stud.y + stud.h - 1e-6).toBe(true);
  expect(g.shapes.filter((s) => s.tag === "hatch:5" && s.type === "line")).toHaveLength(2);
});

test("callouts and legend number the layers 1..n in order, with the material and formatted thickness", () => {
  const g = sectionGeometry(wall, { units: "ip" });
  wall.layers.forEach((layer, i) => {
    const n = i + 1;
    const callout = g.shapes.find((s) => s.type === "text" && s.tag === `callout:${n}`);
    expect(callout && callout.type === "text" && callout.text).toBe(String(n));
    const legend = g.shapes
      .filter((s): s is Extract<Shape, { type: "text" }> => s.type === "text" && s.tag === `legend:${n}`)
      .map((s) => s.text);
    expect(legend[0]).toBe(String(n));
    expect(legend[1].startsWith(layer.materialName)).toBe(true);
    expect(legend[2].replace(" *", "")).toBe(formatThickness(layer.thickness_mm, "ip"));
    // The leader ends inside its band.
    const dot = g.shapes.find((s) => s.type === "circle" && s.tag === `callout:${n}` && s.r < 2);
    expect(dot && dot.type === "circle" && insideBox(dot.cx, dot.cy, g.bands[i].box)).toBe(true);
  });
  expect(g.shapes.some((s) => s.type === "text" && /framing 23 %/.test(s.text))).toBe(true);
});

test("callout circles never overlap, even for clustered thin layers", () => {
  const centres = [100, 101, 102, 103, 300, 650, 651];
  const placed = spreadCallouts(centres, 23, 20, 660);
  for (let i = 1; i < placed.length; i++) expect(placed[i] - placed[i - 1]).toBeGreaterThanOrEqual(23 - 1e-9);
  expect(Math.max(...placed)).toBeLessThanOrEqual(660);
  expect(placed[4]).toBe(300);
});

test("the scale bar is a round length drawn at the section's scale in both unit systems", () => {
  const si = sectionGeometry(wall, { units: "si" });
  expect(si.scale.unit).toBe("mm");
  expect([5, 10, 20, 25, 50, 100, 200]).toContain(si.scale.length);
  expect(si.scale.lengthPx).toBeCloseTo(si.scale.length * si.scale.pxPerMm, 9);
  const bar = si.shapes.filter((s): s is Extract<Shape, { type: "rect" }> => s.type === "rect" && s.tag === "scalebar");
  expect(bar.reduce((sum, r) => sum + r.w, 0)).toBeCloseTo(si.scale.lengthPx, 9);
  expect(si.shapes.some((s) => s.type === "text" && s.text === `${si.scale.length} mm`)).toBe(true);

  const ip = sectionGeometry(wall, { units: "ip" });
  expect(ip.scale.unit).toBe("in");
  // 1 in = 25.4 mm exactly (international inch, 1959)
  expect(ip.scale.lengthPx).toBeCloseTo(inToMm(ip.scale.length) * ip.scale.pxPerMm, 9);
  expect(ip.scale.lengthPx).toBeCloseTo(ip.scale.length * 25.4 * ip.scale.pxPerMm, 9);
  expect(ip.shapes.some((s) => s.type === "text" && s.text === `${ip.scale.length} in`)).toBe(true);
});

test("side labels fit the assembly kind", () => {
  expect(sideLabelsFor("above-grade-wall")).toEqual({ exterior: "EXTERIOR", interior: "INTERIOR" });
  expect(sideLabelsFor("roof")).toEqual({ exterior: "ROOF TOP", interior: "INTERIOR" });
  expect(sideLabelsFor("basement-wall").exterior).toBe("SOIL");
  expect(sideLabelsFor("crawlspace-wall").exterior).toBe("SOIL");
  expect(sideLabelsFor("slab").exterior).toBe("GROUND");
  expect(sideLabelsFor("crawlspace-floor").exterior).toBe("GROUND");
  const g = sectionGeometry({ ...wall, kind: "slab" }, { units: "si" });
  expect(g.shapes.some((s) => s.type === "text" && s.text === "GROUND")).toBe(true);
});

test("the same input gives the same drawing (deterministic stipple)", () => {
  expect(JSON.stringify(sectionGeometry(everyFamily, { units: "si" }))).toBe(
    JSON.stringify(sectionGeometry(everyFamily, { units: "si" })),
  );
});
