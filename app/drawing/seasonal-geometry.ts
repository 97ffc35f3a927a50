// The 12-month chart of the seasonal balance (ISO 13788 monthly method), as drawing primitives: the
// page draws them to SVG and the PDF sheet through drawShapes, so both show the same figure.
// Two panels over the calendar months, January to December:
// - water held at the critical interface at the end of each month (bars, g/m²);
// - each month's margin: the temperature of the interface closest to saturation minus the dew point
//   of the vapour that would reach it were nothing to condense (dots joined by a line; below zero it
//   condenses).
// Colour as on the profile chart: the stop colour is condensed water, teal the vapour's margin.
// Water is in g/m² in both unit systems (the engine's figure; no inch-pound mass formatter yet).
import type { SeasonalResult } from "~/envelope/types";
import { deltaCToF, formatTemperatureDifference, type UnitSystem } from "~/envelope/units";
import type { Box } from "./clip";
import { niceStep } from "./profile-geometry";
import { estimateTextWidth, INK, type Drawing, type Shape, type TextShape } from "./shapes";

export interface SeasonalOptions {
  units: UnitSystem;
  /** Drawing width: 300 for phones, 720 elsewhere (as the profile chart). */
  width?: number;
}

export interface SeasonalTick {
  value: number;
  y: number;
  label: string;
}

/** One calendar month's column. */
export interface MonthSlot {
  month: number;
  name: string;
  /** Centre of the month's column. */
  x: number;
  water_g_m2: number;
  /** Bar top and bottom (equal when nothing is held). */
  barTop: number;
  barBottom: number;
  margin_c: number;
  /** y of the month's margin dot. */
  marginY: number;
  condenses: boolean;
}

export interface SeasonalGeometry extends Drawing {
  layout: "wide" | "narrow";
  verdict: string;
  water: { plot: Box; ticks: SeasonalTick[] };
  margin: { plot: Box; ticks: SeasonalTick[]; zeroY: number };
  slots: MonthSlot[];
}

/** Phone layout near 1:1 on a 360 px screen (as the profile chart). */
export const SEASONAL_CHART_WIDTHS = { narrow: 300, wide: 720 } as const;
const SIZE = { title: 12, panel: 11, text: 10 } as const;
const WIDE_FROM = 640;
const TICK_COLUMN = 42;
/** Smaller than a twentieth of a kelvin is rounding (as on the profile chart). */
const WET_MARGIN_C = -0.05;

const VERDICT_LABEL: Readonly<Record<SeasonalResult["verdict"], string>> = {
  "no-condensation": "Stays dry all year",
  "dries-within-year": "Dries within the year",
  accumulates: "Accumulates year on year",
};

/** The verdict in Dryside's words, for the chart, the page and the sheet alike. */
export function seasonalVerdictLabel(seasonal: SeasonalResult): string {
  return VERDICT_LABEL[seasonal.verdict];
}

/** The engine's method strings may or may not end with a full stop; print each with exactly one. */
export function asSentence(text: string): string {
  const t = text.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}

const grams = (v: number): string => `${v < 10 ? v.toFixed(1) : Math.round(v).toString()} g/m²`;

function monthName(seasonal: SeasonalResult, month: number | null): string {
  return month === null ? "" : (seasonal.months.find((m) => m.month === month)?.name ?? String(month));
}

/** Peak, where and when, and when it is gone (or what is left): one line for every output. */
export function seasonalFigures(seasonal: SeasonalResult, units: UnitSystem): string {
  if (seasonal.verdict === "no-condensation") {
    const closest = seasonal.months.reduce((a, b) => (b.margin_c < a.margin_c ? b : a), seasonal.months[0]);
    return closest
      ? `No month condenses; the smallest margin is ${signed(closest.margin_c, units)} in ${closest.name}, at ${closest.marginInterface}.`
      : "No month condenses.";
  }
  const at = seasonal.criticalInterface ? ` at ${seasonal.criticalInterface.label}` : "";
  const peak = `Peak ${grams(seasonal.peak_g_m2)} in ${monthName(seasonal, seasonal.peakMonth)}${at}`;
  if (seasonal.verdict === "dries-within-year")
    return `${peak}; gone by the end of ${seasonal.driesOutMonth === null ? "the year" : monthName(seasonal, seasonal.driesOutMonth)}.`;
  return `${peak}; ${grams(seasonal.endOfYear_g_m2)} still held twelve months after it starts in ${monthName(seasonal, seasonal.startMonth)}.`;
}

/** The interior-surface mould check in one line. */
export function surfaceCheckLine(seasonal: SeasonalResult): string {
  const s = seasonal.surface;
  if (s.fRsiMax === null)
    return `Inside surface: temperature factor ${s.fRsi.toFixed(2)}; no month loses heat through it, so no mould risk from a cold surface.`;
  return `Inside surface: temperature factor ${s.fRsi.toFixed(2)} on the coldest path; ${monthName(seasonal, s.criticalMonth)} needs more than ${s.fRsiMax.toFixed(2)} — ${s.pass ? "passes" : "fails: cold enough for mould"}.`;
}

function signed(marginC: number, units: UnitSystem): string {
  const value = formatTemperatureDifference(marginC, units).replace(/^-/, "−");
  return marginC < WET_MARGIN_C || value.startsWith("0") ? value : `+${value}`;
}

function text(x: number, y: number, value: string, extra: Partial<TextShape> = {}): TextShape {
  return {
    type: "text",
    x,
    y,
    text: value,
    size: SIZE.text,
    weight: "normal",
    anchor: "start",
    font: "sans",
    fill: INK.graphiteSoft,
    ...extra,
  };
}

function wrap(words: string, size: number, width: number, weight: "normal" | "bold" = "normal"): string[] {
  const lines: string[] = [];
  let line = "";
  for (const word of words.split(" ")) {
    const next = line ? `${line} ${word}` : word;
    if (line && estimateTextWidth(next, size, weight) > width) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/** Grid, tick labels and unit of a value axis over [lo, hi] in the plot; returns the value → y map. */
function valueAxis(
  shapes: Shape[],
  plot: Box,
  lo: number,
  hi: number,
  target: number,
  unit: string,
  tag: string,
): { yOf: (v: number) => number; ticks: SeasonalTick[] } {
  const step = niceStep(Math.max(hi - lo, 1e-6), target);
  const yMin = Math.floor(lo / step + 1e-9) * step;
  const yMaxRaw = Math.ceil(hi / step - 1e-9) * step;
  const yMax = yMaxRaw <= yMin ? yMin + step : yMaxRaw;
  const yOf = (v: number): number => plot.y + plot.h - ((v - yMin) / (yMax - yMin)) * plot.h;
  const decimals = step < 1 ? 1 : 0;
  const ticks: SeasonalTick[] = [];
  shapes.push({ type: "rect", ...plot, fill: INK.sheet, tag: `plot:${tag}` });
  for (let v = yMin; v <= yMax + step / 1000; v += step) {
    const y = yOf(v);
    const label = v
      .toFixed(decimals)
      .replace(/^-0(\.0+)?$/, "0")
      .replace(/^-/, "−");
    ticks.push({ value: v, y, label });
    shapes.push({
      type: "line",
      x1: plot.x,
      y1: y,
      x2: plot.x + plot.w,
      y2: y,
      stroke: INK.rule,
      strokeWidth: 0.6,
      tag: `grid:${tag}`,
    });
    shapes.push(text(plot.x - 5, y + 3.5, label, { anchor: "end", tag: `tick:${tag}` }));
  }
  shapes.push(text(plot.x - 5, plot.y - 8, unit, { anchor: "end", weight: "bold", tag: `unit:${tag}` }));
  shapes.push({
    type: "line",
    x1: plot.x,
    y1: plot.y,
    x2: plot.x,
    y2: plot.y + plot.h,
    stroke: INK.graphiteSoft,
    strokeWidth: 0.8,
    tag: `axis:${tag}`,
  });
  return { yOf, ticks };
}

export function seasonalGeometry(seasonal: SeasonalResult, options: SeasonalOptions): SeasonalGeometry {
  const width = options.width ?? SEASONAL_CHART_WIDTHS.wide;
  const layout = width >= WIDE_FROM ? "wide" : "narrow";
  const { units } = options;
  const pad = 10;
  const inner = width - 2 * pad;
  const shapes: Shape[] = [];
  const verdict = seasonalVerdictLabel(seasonal);
  const verdictColour =
    seasonal.verdict === "accumulates" ? INK.stop : seasonal.verdict === "dries-within-year" ? INK.caution : INK.vapour;

  // Heading: what this is, the verdict, and the figures behind it.
  shapes.push(
    text(pad, 18, "THE YEAR, MONTH BY MONTH", {
      size: SIZE.title,
      weight: "bold",
      fill: INK.ochre,
      tracking: 0.6,
      tag: "heading",
    }),
  );
  shapes.push(text(pad, 36, verdict, { size: SIZE.panel + 2, weight: "bold", fill: verdictColour, tag: "verdict" }));
  let y = 36;
  for (const line of wrap(seasonalFigures(seasonal, units), SIZE.text, inner))
    shapes.push(text(pad, (y += 14), line, { fill: INK.graphite, tag: "figures" }));
  const source =
    seasonal.climate.source === "generated"
      ? "generated year (see its note)"
      : seasonal.climate.source === "csv"
        ? "year from the uploaded file"
        : "year as typed";
  for (const line of wrap(`Monthly means, ${source}.`, SIZE.text, inner))
    shapes.push(text(pad, (y += 13), line, { tag: "climate" }));

  const plotX = pad + TICK_COLUMN;
  const plotW = inner - TICK_COLUMN;
  const column = plotW / 12;
  const xOf = (i: number): number => plotX + column * (i + 0.5);

  // Panel 1: water held at the critical interface at each month's end.
  y += 14;
  const where = seasonal.criticalInterface ? `, at ${seasonal.criticalInterface.label}` : "";
  const waterTitle = wrap(`Water held at the end of each month${where}`, SIZE.panel, inner, "bold");
  for (const line of waterTitle)
    shapes.push(
      text(pad, (y += 14), line, { size: SIZE.panel, weight: "bold", fill: INK.graphite, tag: "title:water" }),
    );
  const waterPlot: Box = { x: plotX, y: y + 20, w: plotW, h: layout === "wide" ? 120 : 110 };
  const water = seasonal.months.map((m) => m.critical_g_m2);
  const water_axis = valueAxis(shapes, waterPlot, 0, Math.max(...water, 1), 4, "g/m²", "water");
  const bottom = waterPlot.y + waterPlot.h;

  // Panel 2: the margin of each month.
  const marginTitleY = bottom + 30;
  shapes.push(
    text(pad, marginTitleY, "Margin above the dew point, each month", {
      size: SIZE.panel,
      weight: "bold",
      fill: INK.graphite,
      tag: "title:margin",
    }),
  );
  const marginPlot: Box = { x: plotX, y: marginTitleY + 20, w: plotW, h: layout === "wide" ? 90 : 80 };
  const display = (c: number): number => (units === "ip" ? deltaCToF(c) : c);
  const margins = seasonal.months.map((m) => display(m.margin_c));
  const margin_axis = valueAxis(
    shapes,
    marginPlot,
    Math.min(0, ...margins),
    Math.max(0, ...margins),
    3,
    units === "ip" ? "°F" : "K",
    "margin",
  );
  const zeroY = margin_axis.yOf(0);
  shapes.push({
    type: "line",
    x1: marginPlot.x,
    y1: zeroY,
    x2: marginPlot.x + marginPlot.w,
    y2: zeroY,
    stroke: INK.graphiteSoft,
    strokeWidth: 1,
    tag: "margin-zero",
  });

  const slots: MonthSlot[] = seasonal.months.map((m, i) => {
    const x = xOf(i);
    const barTop = water_axis.yOf(m.critical_g_m2);
    const condenses = m.condensed_g_m2 > 0;
    if (m.critical_g_m2 > 0) {
      shapes.push({
        type: "rect",
        x: x - column * 0.32,
        y: barTop,
        w: column * 0.64,
        h: bottom - barTop,
        fill: INK.stop,
        opacity: condenses ? 0.85 : 0.45,
        tag: `bar:${m.month}`,
      });
    }
    // Month names under both panels; the start of the balance is marked.
    const start = seasonal.startMonth === m.month;
    shapes.push(
      text(x, bottom + 13, m.name, {
        anchor: "middle",
        fill: start ? INK.graphite : INK.graphiteSoft,
        weight: start ? "bold" : "normal",
        tag: `month:${m.month}`,
      }),
    );
    shapes.push(
      text(x, marginPlot.y + marginPlot.h + 13, m.name, { anchor: "middle", tag: `month-margin:${m.month}` }),
    );
    return {
      month: m.month,
      name: m.name,
      x,
      water_g_m2: m.critical_g_m2,
      barTop,
      barBottom: bottom,
      margin_c: m.margin_c,
      marginY: margin_axis.yOf(display(m.margin_c)),
      condenses,
    };
  });
  shapes.push({
    type: "line",
    x1: plotX,
    y1: bottom,
    x2: plotX + plotW,
    y2: bottom,
    stroke: INK.graphiteSoft,
    strokeWidth: 0.8,
    tag: "axis:water-months",
  });
  shapes.push({
    type: "polyline",
    points: slots.map((s): [number, number] => [s.x, s.marginY]),
    stroke: INK.vapour,
    strokeWidth: 1.8,
    tag: "margin-line",
  });
  for (const s of slots) {
    const wet = s.margin_c < WET_MARGIN_C;
    shapes.push({
      type: "circle",
      cx: s.x,
      cy: s.marginY,
      r: 3.2,
      fill: wet ? INK.stop : INK.vapour,
      stroke: INK.sheet,
      strokeWidth: 1,
      tag: `margin:${s.month}`,
    });
  }

  // Legend and the interior-surface check below the panels.
  y = marginPlot.y + marginPlot.h + 32;
  const legend: { swatch: Shape; label: string }[] = [
    {
      swatch: { type: "rect", x: pad, y: y - 8, w: 12, h: 9, fill: INK.stop, opacity: 0.85, tag: "legend" },
      label: "water held (darker: still condensing that month)",
    },
    {
      swatch: { type: "circle", cx: pad + 6, cy: y - 3.5, r: 3.2, fill: INK.vapour, tag: "legend" },
      label: "margin (stop colour below zero: condenses)",
    },
  ];
  let lx = pad;
  for (const entry of legend) {
    const w = 18 + estimateTextWidth(entry.label, SIZE.text);
    if (lx > pad && lx + w > pad + inner) {
      lx = pad;
      y += 15;
    }
    const dx = lx - pad;
    const swatch: Shape =
      entry.swatch.type === "rect"
        ? { ...entry.swatch, x: entry.swatch.x + dx, y: y - 8 }
        : entry.swatch.type === "circle"
          ? { ...entry.swatch, cx: entry.swatch.cx + dx, cy: y - 3.5 }
          : entry.swatch;
    shapes.push(swatch, text(lx + 18, y, entry.label, { fill: INK.graphite, tag: "legend" }));
    lx += w + 14;
  }
  const surface = seasonal.surface;
  for (const line of wrap(surfaceCheckLine(seasonal), SIZE.text, inner)) {
    shapes.push(
      text(pad, (y += 16), line, {
        fill: surface.pass ? INK.graphite : INK.stop,
        weight: surface.pass ? "normal" : "bold",
        tag: "surface",
      }),
    );
  }
  const height = Math.ceil(y + pad + 4);
  shapes.unshift({ type: "rect", x: 0, y: 0, w: width, h: height, fill: INK.sheet, tag: "sheet" });
  return {
    width,
    height,
    shapes,
    layout,
    verdict,
    water: { plot: waterPlot, ticks: water_axis.ticks },
    margin: { plot: marginPlot, ticks: margin_axis.ticks, zeroY },
    slots,
  };
}
