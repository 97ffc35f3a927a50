// The profile chart: temperature against cumulative thermal resistance and vapour pressure against
// cumulative vapour resistance are straight lines where steady-state physics says they must be;
// condensing interfaces are marked in every panel; the type stays readable and clear of itself at
// phone width. Also writes sample charts to test-results/ for a person to look at.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, test } from "vitest";
import { parse } from "yaml";
import { PROFILE_CHART_WIDTHS, ProfileChart } from "~/components/profile-chart";
import { ShapeElements } from "~/components/section-drawing";
import { profileAxes } from "~/drawing/profile-axes";
import { MIN_TEXT_SIZE, niceStep, profileGeometry, type ProfileGeometry } from "~/drawing/profile-geometry";
import { estimateTextWidth, type Shape, type TextShape } from "~/drawing/shapes";
import {
  buildMaterialLibrary,
  materialSchema,
  runSiteCheck,
  type AssemblyInput,
  type LayerInput,
  type SiteInput,
} from "~/envelope";
import { cToF } from "~/envelope/units";

const materials = buildMaterialLibrary(
  readdirSync("content/materials")
    .filter((f) => f.endsWith(".yaml"))
    .map((f) => materialSchema.parse(parse(readFileSync(join("content/materials", f), "utf8")))),
);
const check = (assembly: AssemblyInput, site: SiteInput) => runSiteCheck(assembly, site, materials);

// A 2x6 wall with only 25 mm of foam outboard in zone 6: its sheathing condenses in winter.
const thinFoamLayers: LayerInput[] = [
  { role: "cladding", material: "vinyl-siding", thickness_mm: 2 },
  { role: "insulation", material: "xps-board", thickness_mm: 25 },
  { role: "water-resistive-barrier", material: "polymeric-housewrap", thickness_mm: 0.2 },
  { role: "sheathing", material: "osb", thickness_mm: 11 },
  {
    role: "insulation",
    material: "fibreglass-batt",
    thickness_mm: 140,
    framing: { material: "softwood-lumber", fraction: 0.23 },
  },
  { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
  { role: "vapour-retarder", material: "latex-paint", thickness_mm: 0.1 },
];
const thinFoam = check({ kind: "above-grade-wall", layers: thinFoamLayers }, { zone: "6A" });

// The same wall behind interior polyethylene: nothing condenses in a zone 5 winter.
const polyLayers: LayerInput[] = [
  ...thinFoamLayers.slice(0, 6),
  { role: "vapour-retarder", material: "polyethylene-sheet-6mil", thickness_mm: 0.15 },
];
const poly = check({ kind: "above-grade-wall", layers: polyLayers }, { zone: "5A" });

// A basement wall insulated on the inside: the soil face is held at the ground temperature.
const basement = check(
  {
    kind: "basement-wall",
    layers: [
      { role: "structure", material: "cast-concrete", thickness_mm: 200 },
      { role: "insulation", material: "xps-board", thickness_mm: 50 },
      {
        role: "insulation",
        material: "fibreglass-batt",
        thickness_mm: 89,
        framing: { material: "softwood-lumber", fraction: 0.2 },
      },
      { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
    ],
  },
  { zone: "5A" },
);

function polyline(g: ProfileGeometry, tag: string): [number, number][] {
  const s = g.shapes.find((x) => x.tag === tag);
  if (s?.type !== "polyline") throw new Error(`no ${tag} line`);
  return s.points;
}

/** Largest distance of any point from the chord between the first and last, in drawing units. */
function offLine(points: readonly [number, number][]): number {
  const [x0, y0] = points[0];
  const [x1, y1] = points[points.length - 1];
  const length = Math.hypot(x1 - x0, y1 - y0);
  return Math.max(...points.map(([x, y]) => Math.abs((x1 - x0) * (y0 - y) - (x0 - x) * (y1 - y0)) / length));
}

const texts = (shapes: readonly Shape[]): TextShape[] => shapes.filter((s): s is TextShape => s.type === "text");

/** A text's box from its baseline: ascent 0.8 and descent 0.25 of the size (Inter). */
function textBox(t: TextShape): { x0: number; x1: number; y0: number; y1: number } {
  const w = estimateTextWidth(t.text, t.size, t.weight) + (t.tracking ?? 0) * t.text.length;
  const x0 = t.anchor === "start" ? t.x : t.anchor === "middle" ? t.x - w / 2 : t.x - w;
  return { x0, x1: x0 + w, y0: t.y - 0.8 * t.size, y1: t.y + 0.25 * t.size };
}

describe("temperature against cumulative thermal resistance", () => {
  test("the temperature line is straight: steady-state conduction (ASHRAE Handbook of Fundamentals, ch. 25, series resistances)", () => {
    for (const result of [thinFoam, poly, basement]) {
      for (const profile of [result.profiles.winter, result.profiles.summer]) {
        const g = profileGeometry(profile, { units: "si" });
        expect(offLine(polyline(g, "temperature"))).toBeLessThan(0.01);
      }
    }
  });

  test("interfaces sit at their share of the resistances summed layer by layer, air films included", () => {
    // Winter, no vented cavity: the profile runs through the clear cavity, so its resistances are the
    // thermal result's films and layers, framed layers taken at their cavity resistance.
    expect(thinFoam.profiles.winter.path).toBe("clear-cavity");
    const { films, layers } = thinFoam.thermal;
    const exterior = films.find((f) => f.side === "exterior")?.rsi ?? 0;
    const interior = films.find((f) => f.side === "interior")?.rsi ?? 0;
    const cumulative = [exterior];
    for (const l of layers)
      cumulative.push(cumulative[cumulative.length - 1] + (l.framed ? l.framed.cavity_rsi : l.rsi));
    const total = cumulative[cumulative.length - 1] + interior;
    const g = profileGeometry(thinFoam.profiles.winter, { units: "si" });
    const { plot, interfaceX } = g.temperature;
    cumulative.forEach((r, k) => expect((interfaceX[k] - plot.x) / plot.w).toBeCloseTo(r / total, 6));
  });

  test("ticks are round numbers in the chosen unit and cover both air temperatures", () => {
    const winter = thinFoam.profiles.winter;
    for (const units of ["si", "ip"] as const) {
      const { ticks, unitLabel } = profileGeometry(winter, { units }).temperature;
      expect(unitLabel).toBe(units === "si" ? "°C" : "°F");
      const step = ticks[1].value - ticks[0].value;
      expect([1, 2, 2.5, 5, 10, 20, 25, 50]).toContain(Math.round(step * 1000) / 1000);
      const display = (c: number): number => (units === "ip" ? cToF(c) : c);
      expect(ticks[0].value).toBeLessThanOrEqual(display(winter.exterior.t_c));
      expect(ticks[ticks.length - 1].value).toBeGreaterThanOrEqual(display(winter.interior.t_c));
    }
    expect(niceStep(37)).toBe(10);
    expect(niceStep(9)).toBe(2);
  });
});

describe("vapour pressure against cumulative vapour resistance (Glaser method, ISO 13788 §6 / BS 5250 annex)", () => {
  test("with nothing condensing, the vapour-pressure line is straight and stays under saturation", () => {
    const winter = poly.profiles.winter;
    expect(winter.condensingPlanes).toHaveLength(0); // the poly keeps the sheathing dry in zone 5
    const g = profileGeometry(winter, { units: "si" });
    expect(offLine(polyline(g, "vapour-pressure"))).toBeLessThan(0.01);
    expect(g.shapes.some((s) => s.tag === "vapour-straight")).toBe(false);
    // Almost all the vapour resistance is the polyethylene: the last layer takes most of the axis.
    const { interfaceX, plot } = g.vapour;
    expect(interfaceX[interfaceX.length - 1] - interfaceX[interfaceX.length - 2]).toBeGreaterThan(0.8 * plot.w);
  });

  test("vapour shares are the layers' vapour resistances (1 / permeance) summed from the outside", () => {
    const winter = poly.profiles.winter;
    const resistance = winter.vapourLayers.map((l, i) => (i < winter.boundaryIndex ? 0 : 1 / l.case_perm_ng));
    const total = resistance.reduce((s, r) => s + r, 0);
    let sum = 0;
    profileAxes(winter).points.forEach((p, k) => {
      expect(p.vapour).toBeCloseTo(sum / total, 9);
      sum += resistance[k] ?? 0;
    });
  });

  test("when the straight line would rise above saturation, the real line bends down to it at the condensing interface", () => {
    const winter = thinFoam.profiles.winter;
    expect(winter.condensingPlanes.length).toBeGreaterThan(0); // thin foam in zone 6: the engine flags the sheathing
    const g = profileGeometry(winter, { units: "si" });
    expect(offLine(polyline(g, "vapour-straight"))).toBeLessThan(0.01);
    expect(offLine(polyline(g, "vapour-pressure"))).toBeGreaterThan(1);
    for (const plane of winter.condensingPlanes) {
      const k = plane.interfaceIndex;
      const p = winter.interfaces[k];
      expect(p.p_v_linear_pa).toBeGreaterThan(p.p_sat_pa);
      const marker = g.shapes.find((s) => s.tag === `condensing:vapour:${k}`);
      expect(marker?.type === "polyline" && marker.points[0][0]).toBeCloseTo(g.vapour.interfaceX[k], 9);
    }
  });
});

describe("margin above the dew point", () => {
  test("one row per interface; negative exactly where the straight vapour line exceeds saturation", () => {
    const winter = thinFoam.profiles.winter;
    const g = profileGeometry(winter, { units: "ip" });
    expect(g.margin.rows).toHaveLength(winter.interfaces.length);
    g.margin.rows.forEach((row, k) => {
      const p = winter.interfaces[k];
      expect(row.margin_c < 0).toBe(p.p_v_linear_pa > p.p_sat_pa);
      expect(row.x1 < row.x0).toBe(row.margin_c < 0);
    });
  });

  test("every condensing interface is marked in all three panels", () => {
    for (const profile of [
      thinFoam.profiles.winter,
      thinFoam.profiles.summer,
      basement.profiles.winter,
      basement.profiles.summer,
    ]) {
      const g = profileGeometry(profile, { units: "si" });
      for (const plane of profile.condensingPlanes) {
        for (const panel of ["temperature", "vapour", "margin"]) {
          expect(g.shapes.some((s) => s.tag === `condensing:${panel}:${plane.interfaceIndex}`)).toBe(true);
        }
      }
      const marked = g.shapes.filter((s) => s.tag?.startsWith("condensing:margin:")).length;
      expect(marked).toBe(profile.condensingPlanes.length);
    }
  });
});

describe("legible at phone width", () => {
  const cases = [
    thinFoam.profiles.winter,
    thinFoam.profiles.summer,
    poly.profiles.winter,
    basement.profiles.winter,
    basement.profiles.summer,
  ];

  test("in the phone layout (a 360 px screen draws it near 1:1) every label is at least 10 units and inside the drawing", () => {
    for (const profile of cases) {
      for (const units of ["si", "ip"] as const) {
        const g = profileGeometry(profile, { units, width: PROFILE_CHART_WIDTHS.narrow });
        expect(g.layout).toBe("narrow");
        for (const t of texts(g.shapes)) {
          expect(t.size).toBeGreaterThanOrEqual(MIN_TEXT_SIZE);
          const box = textBox(t);
          expect(box.x0, t.text).toBeGreaterThanOrEqual(0);
          expect(box.x1, t.text).toBeLessThanOrEqual(g.width);
          expect(box.y1, t.text).toBeLessThanOrEqual(g.height);
        }
      }
    }
  });

  test("no two labels overlap, narrow or wide", () => {
    for (const profile of cases) {
      for (const width of [PROFILE_CHART_WIDTHS.narrow, PROFILE_CHART_WIDTHS.wide]) {
        const labels = texts(profileGeometry(profile, { units: "ip", width }).shapes).map((t) => ({
          t,
          box: textBox(t),
        }));
        for (let i = 0; i < labels.length; i++) {
          for (let j = i + 1; j < labels.length; j++) {
            const a = labels[i].box;
            const b = labels[j].box;
            const overlap = a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
            expect(overlap, `"${labels[i].t.text}" and "${labels[j].t.text}" at width ${width}`).toBe(false);
          }
        }
      }
    }
  });
});

test("profile charts render as titled, accessible figures, written to test-results for review", () => {
  const html = renderToStaticMarkup(createElement(ProfileChart, { profile: thinFoam.profiles.winter, units: "ip" }));
  expect(html).toContain("<figcaption");
  expect(html).toContain("Winter profile");
  expect(html).toMatch(/aria-label="Winter case: temperature from -?[\d.]+ °F outside/);
  expect(html).toContain('data-layout="narrow"');
  expect(html).toContain('data-layout="wide"');
  mkdirSync("test-results", { recursive: true });
  const samples: [string, ProfileGeometry][] = [
    ["winter-condensing", profileGeometry(thinFoam.profiles.winter, { units: "si" })],
    ["winter-dry", profileGeometry(poly.profiles.winter, { units: "ip" })],
    ["summer", profileGeometry(thinFoam.profiles.summer, { units: "si" })],
    ["below-grade", profileGeometry(basement.profiles.winter, { units: "si" })],
    [
      "winter-condensing-phone",
      profileGeometry(thinFoam.profiles.winter, { units: "si", width: PROFILE_CHART_WIDTHS.narrow }),
    ],
  ];
  for (const [name, g] of samples) {
    const body = renderToStaticMarkup(createElement(ShapeElements, { shapes: g.shapes }));
    writeFileSync(
      `test-results/profile-${name}.svg`,
      `<svg xmlns="http://www.w3.org/2000/svg" width="${g.width}" height="${g.height}" viewBox="0 0 ${g.width} ${g.height}">${body}</svg>`,
    );
  }
});
