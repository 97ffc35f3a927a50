// The 12-month chart of the seasonal balance: bars and the margin line sit at the right months, the
// verdict is labelled in words, type stays readable, and both widths lay out. The balance itself is
// the hand-derived two-layer case of tests/unit/envelope/monthly-balance.test.ts (derived there:
// 1578.4 g/m² held at the end of February, 735.7 at the end of March, dry by the end of April).
import { mkdirSync, writeFileSync } from "node:fs";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, test } from "vitest";
import { SeasonalChart } from "~/components/seasonal-chart";
import { seasonalFigures, seasonalGeometry, seasonalVerdictLabel, surfaceCheckLine } from "~/drawing/seasonal-geometry";
import { runSiteCheck } from "~/envelope";
import type { MaterialFamily } from "~/envelope/material-schema";
import { estimateTextWidth, type TextShape } from "~/drawing/shapes";
import type { MonthInput, SeasonalResult } from "~/envelope/types";
import { fixedRsiMaterial, libraryOf, loadLibrary } from "../envelope/library";

const layerMaterial = (slug: string, rsi: number, perm: number, family: MaterialFamily = "membrane") =>
  fixedRsiMaterial(slug, rsi, { family, vapour: { permeance_ng: perm, source: "fixture, D" } });
const twoLayer = libraryOf(
  layerMaterial("outer-board", 0.5, 10),
  layerMaterial("fill", 3.0, 500, "fibrous-insulation"),
);
const wall = {
  kind: "above-grade-wall" as const,
  layers: [
    { role: "sheathing", material: "outer-board", thickness_mm: 10 },
    { role: "insulation", material: "fill", thickness_mm: 100 },
  ],
};
const cold: MonthInput = { t_c: -5, rh: 80 };
const mild: MonthInput = { t_c: 15, rh: 70 };

function seasonalOf(months: MonthInput[], rh = 50): SeasonalResult {
  const seasonal = runSiteCheck(wall, { zone: "5A", indoor: { t_c: 20, rh }, year: { months } }, twoLayer).seasonal;
  if (!seasonal) throw new Error("no seasonal balance");
  return seasonal;
}

const dries = seasonalOf([cold, cold, ...Array<MonthInput>(10).fill(mild)]);
const accumulates = seasonalOf([...Array<MonthInput>(11).fill(cold), mild]);
const dry = seasonalOf(Array<MonthInput>(12).fill(mild), 20);

describe("a wall that dries within the year (condenses in Jan and Feb, dry by the end of Apr)", () => {
  const chart = seasonalGeometry(dries, { units: "si", width: 720 });

  test("twelve month columns, January to December, left to right", () => {
    expect(chart.slots.map((s) => s.name)).toEqual([
      "Jan",
      "Feb",
      "Mar",
      "Apr",
      "May",
      "Jun",
      "Jul",
      "Aug",
      "Sep",
      "Oct",
      "Nov",
      "Dec",
    ]);
    for (let i = 1; i < 12; i++) expect(chart.slots[i].x).toBeGreaterThan(chart.slots[i - 1].x);
  });

  test("bars stand at Jan, Feb and Mar only, the tallest at Feb, heights in proportion to the water held", () => {
    const bars = chart.shapes.filter((s) => s.tag?.startsWith("bar:")).map((s) => s.tag);
    expect(bars).toEqual(["bar:1", "bar:2", "bar:3"]);
    const height = (m: number) => chart.slots[m - 1].barBottom - chart.slots[m - 1].barTop;
    expect(height(2)).toBeGreaterThan(height(1));
    expect(height(4)).toBe(0);
    // 735.65 / 1578.41 (hand figures of the two-layer case).
    expect(height(3) / height(2)).toBeCloseTo(735.65 / 1578.41, 2);
  });

  test("the margin dots are below zero in the condensing months and above it in the mild ones", () => {
    const { zeroY } = chart.margin;
    expect(chart.slots[0].marginY).toBeGreaterThan(zeroY);
    expect(chart.slots[1].marginY).toBeGreaterThan(zeroY);
    expect(chart.slots[5].marginY).toBeLessThan(zeroY);
    const dots = chart.shapes.filter((s) => s.type === "circle" && s.tag?.startsWith("margin:"));
    expect(dots).toHaveLength(12);
  });

  test("the verdict, the peak, its month and the month it is gone are written on the chart", () => {
    expect(chart.verdict).toBe("Dries within the year");
    const texts = chart.shapes.filter((s): s is TextShape => s.type === "text").map((s) => s.text);
    expect(texts).toContain("Dries within the year");
    expect(texts.join(" ")).toMatch(/Peak 1578 g\/m² in Feb .*gone by the end of Apr/);
  });
});

test("verdict labels for the three outcomes", () => {
  expect(seasonalVerdictLabel(dries)).toBe("Dries within the year");
  expect(seasonalVerdictLabel(accumulates)).toBe("Accumulates year on year");
  expect(seasonalVerdictLabel(dry)).toBe("Stays dry all year");
  expect(seasonalFigures(accumulates, "si")).toMatch(/still held twelve months after it starts in Jan/);
  expect(seasonalFigures(dry, "si")).toMatch(/^No month condenses/);
  expect(seasonalGeometry(dry, { units: "si" }).shapes.some((s) => s.tag?.startsWith("bar:"))).toBe(false);
});

test("the interior-surface mould check is on the chart, in words", () => {
  const chart = seasonalGeometry(dries, { units: "ip", width: 300 });
  const surface = chart.shapes
    .filter((s): s is TextShape => s.type === "text" && s.tag === "surface")
    .map((s) => s.text)
    .join(" ");
  expect(surface).toBe(surfaceCheckLine(dries));
  expect(surface).toMatch(/^Inside surface: temperature factor 0\.\d\d/);
});

test("both widths: type at 10 units or more, everything inside the drawing, inch-pound margins in °F", () => {
  for (const width of [300, 720]) {
    const chart = seasonalGeometry(accumulates, { units: "ip", width });
    expect(chart.layout).toBe(width === 300 ? "narrow" : "wide");
    for (const s of chart.shapes) {
      if (s.type !== "text") continue;
      expect(s.size).toBeGreaterThanOrEqual(10);
      expect(s.y).toBeLessThanOrEqual(chart.height);
      if (s.anchor === "start") expect(s.x).toBeLessThan(width);
    }
    expect(chart.shapes.some((s) => s.type === "text" && s.tag === "unit:margin" && s.text === "°F")).toBe(true);
    // Month names do not touch their neighbours.
    const months = chart.shapes.filter((s): s is TextShape => s.type === "text" && /^month:/.test(s.tag ?? ""));
    for (let i = 1; i < months.length; i++) {
      const gap = months[i].x - months[i - 1].x;
      expect(gap).toBeGreaterThan(
        (estimateTextWidth(months[i].text, months[i].size) +
          estimateTextWidth(months[i - 1].text, months[i - 1].size)) /
          2 +
          1,
      );
    }
  }
});

test("renders to SVG with its accessible name (saved to test-results/ to look at)", () => {
  const library = loadLibrary();
  const realWall = runSiteCheck(
    {
      kind: "above-grade-wall",
      layers: [
        { role: "cladding", material: "fibre-cement-lap-siding", thickness_mm: 8 },
        { role: "water-resistive-barrier", material: "polymeric-housewrap", thickness_mm: 0.2 },
        { role: "sheathing", material: "osb", thickness_mm: 11 },
        {
          role: "insulation",
          material: "fibreglass-batt",
          thickness_mm: 140,
          framing: { material: "softwood-lumber", fraction: 0.23 },
        },
        { role: "interior-finish", material: "gypsum-board", thickness_mm: 12.7 },
      ],
    },
    { country: "CA", province: "MB" },
    library,
  ).seasonal;
  const html = [dries, accumulates, ...(realWall ? [realWall] : [])]
    .map((s) => renderToStaticMarkup(createElement(SeasonalChart, { seasonal: s, units: "si" })))
    .join("\n");
  expect(html).toContain('aria-label="Dries within the year. Peak 1578 g/m² in Feb');
  mkdirSync("test-results", { recursive: true });
  writeFileSync(
    "test-results/seasonal-chart.html",
    `<!doctype html><meta charset="utf-8"><body style="background:#f7f2e8;width:760px;font-family:Inter,sans-serif">${html}</body>`,
  );
});
