// The temperature / dew-point chart: lines from the engine's own profile, ticks in display units,
// condensation planes marked; also writes sample charts to test-results/ for a person to look at.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { expect, test } from "vitest";
import { parse } from "yaml";
import { ProfileChart } from "~/components/profile-chart";
import { niceStep, profileGeometry } from "~/drawing/profile-geometry";
import type { Shape } from "~/drawing/shapes";
import { buildMaterialLibrary, materialSchema, runSiteCheck, type LayerInput } from "~/envelope";
import { cToF } from "~/envelope/units";

const materials = buildMaterialLibrary(
  readdirSync("content/materials").filter((f) => f.endsWith(".yaml"))
    .map((f) => materialSchema.parse(parse(readFileSync(join("content/materials", f), "utf8")))),
);

// A 2x6 wall with only 25 mm of foam outboard in zone 6: its sheathing condenses in winter.
const layers: LayerInput[] = [
  { role: "cladding", material: "vinyl-siding", thickness_mm: 2 },
  { role: "insulation", material: "xps-board", thickness_mm: 25 },
  { role: "water-resistive-barrier", material: "polymeric-housewrap", thickness_mm: 0.2 },
  { role: "sheathing", material: "osb", thickness_mm: 11 },
  { role: "insulation", material: "fibreglass-batt", thickness_mm: 140, framing: { material: "softwood-lumber", fraction: 0.23 } },
  { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
  { role: "vapour-retarder", material: "latex-paint", thickness_mm: 0.1 },
];
const result = runSiteCheck({ kind: "above-grade-wall", layers }, { zone: "6A" }, materials);

function polyline(shapes: Shape[], tag: string): [number, number][] {
  const s = shapes.find((x) => x.tag === tag);
  if (!s || s.type !== "polyline") throw new Error(`no ${tag} line`);
  return s.points;
}

test("temperature and dew-point lines pass through every interface, inside the plot", () => {
  const winter = result.profiles.winter;
  const g = profileGeometry(winter, { units: "si" });
  const temperature = polyline(g.shapes, "temperature");
  const dew = polyline(g.shapes, "dew-point");
  expect(temperature).toHaveLength(winter.interfaces.length + 2); // outdoor air, interfaces, indoor air
  expect(dew).toHaveLength(winter.interfaces.length + 2);
  expect(g.interfaceX).toHaveLength(winter.interfaces.length);
  for (const [x, y] of [...temperature, ...dew]) {
    expect(x).toBeGreaterThanOrEqual(g.plot.x - 1e-9);
    expect(x).toBeLessThanOrEqual(g.plot.x + g.plot.w + 1e-9);
    expect(y).toBeGreaterThanOrEqual(g.plot.y - 1e-9);
    expect(y).toBeLessThanOrEqual(g.plot.y + g.plot.h + 1e-9);
  }
  // Interfaces sit at true relative positions.
  const first = winter.interfaces[0].position_mm;
  const span = winter.interfaces[winter.interfaces.length - 1].position_mm - first;
  const xs = g.interfaceX;
  winter.interfaces.forEach((p, i) => {
    expect((xs[i] - xs[0]) / (xs[xs.length - 1] - xs[0])).toBeCloseTo((p.position_mm - first) / span, 9);
  });
  // Warmer is higher: the indoor end of the temperature line is above the outdoor end.
  expect(temperature[temperature.length - 1][1]).toBeLessThan(temperature[0][1]);
});

test("axis ticks are round numbers in the chosen unit and cover every plotted value", () => {
  const winter = result.profiles.winter;
  for (const units of ["si", "ip"] as const) {
    const g = profileGeometry(winter, { units });
    expect(g.unitLabel).toBe(units === "si" ? "°C" : "°F");
    const values = g.ticks.map((t) => t.value);
    const step = values[1] - values[0];
    expect([1, 2, 2.5, 5, 10, 20, 25, 50]).toContain(Math.round(step * 1000) / 1000);
    const display = (c: number): number => (units === "ip" ? cToF(c) : c);
    expect(values[0]).toBeLessThanOrEqual(display(winter.exterior.t_c));
    expect(values[values.length - 1]).toBeGreaterThanOrEqual(display(winter.interior.t_c));
  }
  expect(niceStep(37)).toBe(10);
  expect(niceStep(9)).toBe(2);
});

test("condensation planes are marked where the engine found them", () => {
  const winter = result.profiles.winter;
  expect(winter.condensingPlanes.length).toBeGreaterThan(0); // thin foam in zone 6: the engine flags the sheathing
  const g = profileGeometry(winter, { units: "ip" });
  const markers = g.shapes.filter((s) => s.tag === "condensation" && s.type === "circle");
  expect(markers).toHaveLength(winter.condensingPlanes.length);
  winter.condensingPlanes.forEach((plane, i) => {
    const m = markers[i];
    expect(m.type === "circle" && m.cx).toBeCloseTo(g.interfaceX[plane.interfaceIndex], 9);
  });
  expect(g.shapes.some((s) => s.type === "text" && s.text === "first condensing surface")).toBe(true);
  const legend = g.shapes.filter((s) => s.type === "text" && s.tag === "legend").map((s) => s.type === "text" ? s.text : "");
  expect(legend).toEqual(["Temperature", "Dew point", "Condensation plane"]);
});

test("profile charts render as accessible SVG, written to test-results for review", () => {
  const winter = renderToStaticMarkup(createElement(ProfileChart, { profile: result.profiles.winter, units: "ip" }));
  const summer = renderToStaticMarkup(createElement(ProfileChart, { profile: result.profiles.summer, units: "si" }));
  expect(winter).toContain('role="img"');
  expect(winter).toContain("<title>Winter temperature and dew-point profile</title>");
  expect(winter).toMatch(/aria-label="Winter case: temperature from -?[\d.]+ °F outside/);
  mkdirSync("test-results", { recursive: true });
  writeFileSync("test-results/profile-sample.svg", `<svg xmlns="http://www.w3.org/2000/svg" width="760" height="600" style="background:#f7f2e8"><g transform="translate(20 10)">${winter.replace("<svg", '<svg width="720" height="280"')}</g><g transform="translate(20 300)">${summer.replace("<svg", '<svg width="720" height="280"')}</g></svg>`);
});
