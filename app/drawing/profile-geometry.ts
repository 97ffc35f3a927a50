// The profile chart of one site-check case, as drawing primitives (the page, the desk and the PDF
// sheet draw the same shapes). Three panels:
// - temperature and dew point against cumulative thermal resistance, where the steady-state
//   temperature is a straight line;
// - vapour pressure and saturation pressure against cumulative vapour resistance, where the vapour
//   pressure is a straight line unless it would rise above saturation (the Glaser test: where the
//   straight line crosses the saturation curve, vapour condenses);
// - the margin above the dew point at each interface, one row per interface.
// Colour carries one idea throughout: ochre is what the temperature allows (temperature,
// saturation), teal is the vapour actually there (dew point, vapour pressure).
import { saturationPressure } from "~/envelope/psychrometrics";
import type { ProfileCase } from "~/envelope/types";
import { cToF, deltaCToF, formatTemperature, formatTemperatureDifference, type UnitSystem } from "~/envelope/units";
import type { Box } from "./clip";
import { profileAxes, type ProfilePoint } from "./profile-axes";
import { estimateTextWidth, INK, type Shape, type TextShape, type Drawing } from "./shapes";

export interface ProfileOptions {
  units: UnitSystem;
  /** Drawing width; below 640 the panels stack in one column (phones), else two side by side. */
  width?: number;
}

export interface AxisTick {
  value: number;
  y: number;
  label: string;
}

export interface ProfilePanel {
  plot: Box;
  /** x of each interface (same order as profile.interfaces). */
  interfaceX: number[];
  ticks: AxisTick[];
  unitLabel: string;
}

export interface MarginRow {
  k: number;
  y: number;
  margin_c: number;
  /** Bar ends (x of zero and of the value). */
  x0: number;
  x1: number;
}

export interface ProfileGeometry extends Drawing {
  layout: "wide" | "narrow";
  temperature: ProfilePanel;
  vapour: ProfilePanel;
  margin: { box: Box; rows: MarginRow[] };
}

/** Smallest type on the chart: the phone layout is drawn near 1:1, so it stays readable. */
export const MIN_TEXT_SIZE = 10;
const SIZE = { title: 12, panel: 11, text: 10 } as const;
const PLOT_HEIGHT = 150;
const ROW_HEIGHT = 18;
const TICK_COLUMN = 38;
const WIDE_FROM = 640;
const GAP = 24;

const COLOUR = {
  allowed: INK.ochre,
  vapour: INK.vapour,
  wet: INK.stop,
  text: INK.graphite,
  soft: INK.graphiteSoft,
  rule: INK.rule,
} as const;

/** Round tick step giving about `target` intervals over the span. */
export function niceStep(span: number, target = 5): number {
  const raw = span / target;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * magnitude >= raw) return m * magnitude;
  return 10 * magnitude;
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
    fill: COLOUR.soft,
    ...extra,
  };
}

function diamond(cx: number, cy: number, r: number, tag: string): Shape {
  return {
    type: "polyline",
    points: [
      [cx, cy - r],
      [cx + r, cy],
      [cx, cy + r],
      [cx - r, cy],
    ],
    closed: true,
    fill: COLOUR.wet,
    stroke: INK.sheet,
    strokeWidth: 1,
    tag,
  };
}

/** Words flowed into lines no wider than `width`. */
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

interface LegendEntry {
  swatch: (x: number, y: number) => Shape[];
  label: string;
}

/** Legend entries flowed into rows from (x, y); returns the y below the last row. */
function legend(shapes: Shape[], entries: LegendEntry[], x: number, y: number, width: number, tag: string): number {
  let lx = x;
  let ly = y;
  for (const entry of entries) {
    const w = 22 + estimateTextWidth(entry.label, SIZE.text);
    if (lx > x && lx + w > x + width) {
      lx = x;
      ly += 15;
    }
    shapes.push(...entry.swatch(lx, ly - 3.5), text(lx + 22, ly, entry.label, { fill: COLOUR.text, tag }));
    lx += w + 14;
  }
  return ly + 15;
}

const swatchLine =
  (stroke: string, strokeWidth: number, dash?: number[]) =>
  (x: number, y: number): Shape[] => [
    { type: "line", x1: x, y1: y, x2: x + 16, y2: y, stroke, strokeWidth, dash, tag: "legend" },
  ];
const swatchDiamond = (x: number, y: number): Shape[] => [diamond(x + 8, y, 4.5, "legend")];

function sideWord(profile: ProfileCase): string {
  if (profile.exterior.label === "soil") return "soil side";
  if (/cladding/.test(profile.exterior.label)) return "wet cladding";
  return "outside";
}

interface PanelSpec {
  tag: "temperature" | "vapour";
  title: string;
  legend: LegendEntry[];
  caption: string;
  /** Share along the axis of each interface. */
  share: (p: ProfilePoint) => number;
  /** Interfaces drawn (the vapour panel starts at the case's vapour boundary). */
  from: number;
  yRange: [number, number];
  unitLabel: string;
  tickTarget: number;
  decimals: (step: number) => number;
}

/** Where a panel goes; plotTop lines up the plots of panels side by side. */
interface PanelAt {
  x: number;
  y: number;
  w: number;
  plotTop?: number;
}

interface PanelFrame extends ProfilePanel {
  xOf: (share: number) => number;
  yOf: (v: number) => number;
  bottom: number;
}

/** Title, legend, grid, axes and layer numbers of one panel at (x, y), width w. */
function panelFrame(
  shapes: Shape[],
  spec: PanelSpec,
  points: ProfilePoint[],
  profile: ProfileCase,
  at: PanelAt,
): PanelFrame {
  const { x, y, w } = at;
  shapes.push(
    text(x, y + 12, spec.title, { size: SIZE.panel, weight: "bold", fill: COLOUR.text, tag: `title:${spec.tag}` }),
  );
  const legendBottom = legend(shapes, spec.legend, x, y + 30, w, `legend:${spec.tag}`);
  const plot: Box = {
    x: x + TICK_COLUMN,
    y: Math.max(legendBottom + 12, at.plotTop ?? 0),
    w: w - TICK_COLUMN - 8,
    h: PLOT_HEIGHT,
  };
  const [lo, hi] = spec.yRange;
  const step = niceStep(Math.max(hi - lo, 1e-6), spec.tickTarget);
  const yMin = Math.floor(lo / step + 1e-9) * step;
  const yMaxRaw = Math.ceil(hi / step - 1e-9) * step;
  const yMax = yMaxRaw <= yMin ? yMin + step : yMaxRaw;
  const yOf = (v: number): number => plot.y + plot.h - ((v - yMin) / (yMax - yMin)) * plot.h;
  const xOf = (share: number): number => plot.x + share * plot.w;

  shapes.push({ type: "rect", ...plot, fill: INK.sheet, tag: `plot:${spec.tag}` });
  const ticks: AxisTick[] = [];
  const decimals = spec.decimals(step);
  for (let v = yMin; v <= yMax + step / 1000; v += step) {
    const ty = yOf(v);
    const label = v
      .toFixed(decimals)
      .replace(/^-0(\.0+)?$/, "0")
      .replace(/^-/, "−");
    ticks.push({ value: v, y: ty, label });
    shapes.push({
      type: "line",
      x1: plot.x,
      y1: ty,
      x2: plot.x + plot.w,
      y2: ty,
      stroke: COLOUR.rule,
      strokeWidth: 0.6,
      tag: `grid:${spec.tag}`,
    });
    shapes.push(text(plot.x - 5, ty + 3.5, label, { anchor: "end", tag: `tick:${spec.tag}` }));
  }
  shapes.push(
    text(plot.x - 5, plot.y - 10, spec.unitLabel, { anchor: "end", weight: "bold", tag: `unit:${spec.tag}` }),
  );

  // Layer boundaries: hairlines in the plot, ticks below it, layer numbers where the span has room.
  const interfaceX = points.map((p) => xOf(spec.share(p)));
  const bottom = plot.y + plot.h;
  interfaceX.forEach((ix, k) => {
    if (k < spec.from) return;
    shapes.push({
      type: "line",
      x1: ix,
      y1: plot.y,
      x2: ix,
      y2: bottom,
      stroke: COLOUR.rule,
      strokeWidth: 0.5,
      dash: [1.5, 2.5],
      tag: `boundary:${spec.tag}:${k}`,
    });
    shapes.push({
      type: "line",
      x1: ix,
      y1: bottom,
      x2: ix,
      y2: bottom + 4,
      stroke: COLOUR.soft,
      strokeWidth: 0.8,
      tag: `boundary:${spec.tag}:${k}`,
    });
    if (k > spec.from) {
      const number = String(k);
      const span = ix - interfaceX[k - 1];
      if (span >= estimateTextWidth(number, SIZE.text) + 4)
        shapes.push(
          text((ix + interfaceX[k - 1]) / 2, bottom + 14, number, {
            anchor: "middle",
            fill: COLOUR.text,
            tag: `layer:${spec.tag}:${k}`,
          }),
        );
    }
  });
  shapes.push({
    type: "line",
    x1: plot.x,
    y1: bottom,
    x2: plot.x + plot.w,
    y2: bottom,
    stroke: COLOUR.soft,
    strokeWidth: 0.8,
    tag: `axis:${spec.tag}`,
  });
  shapes.push({
    type: "line",
    x1: plot.x,
    y1: plot.y,
    x2: plot.x,
    y2: bottom,
    stroke: COLOUR.soft,
    strokeWidth: 0.8,
    tag: `axis:${spec.tag}`,
  });

  // Ends of the axis in words, the axis caption centred in the room between them.
  const left = sideWord(profile);
  const endY = bottom + 29;
  const leftEnd = plot.x + estimateTextWidth(left, SIZE.text, "bold");
  const rightStart = plot.x + plot.w - estimateTextWidth("inside", SIZE.text, "bold");
  shapes.push(text(plot.x, endY, left, { weight: "bold", fill: COLOUR.text, tag: `end:${spec.tag}` }));
  shapes.push(
    text(plot.x + plot.w, endY, "inside", { anchor: "end", weight: "bold", fill: COLOUR.text, tag: `end:${spec.tag}` }),
  );
  const captionWidth = estimateTextWidth(spec.caption, SIZE.text);
  if (captionWidth + 12 <= rightStart - leftEnd)
    shapes.push(text((leftEnd + rightStart) / 2, endY, spec.caption, { anchor: "middle", tag: `caption:${spec.tag}` }));
  else shapes.push(text(plot.x, endY + 14, spec.caption, { tag: `caption:${spec.tag}` }));
  const below = captionWidth + 12 <= rightStart - leftEnd ? endY + 8 : endY + 22;

  return { plot, interfaceX, ticks, unitLabel: spec.unitLabel, xOf, yOf, bottom: below };
}

function temperaturePanel(
  shapes: Shape[],
  profile: ProfileCase,
  points: ProfilePoint[],
  units: UnitSystem,
  thermalFromTemperature: boolean,
  at: PanelAt,
): PanelFrame {
  const display = (c: number): number => (units === "ip" ? cToF(c) : c);
  const condensing = points.some((p) => p.condensing);
  const values = [profile.exterior.t_c, profile.interior.t_c, ...points.flatMap((p) => [p.t_c, p.dewPoint_c])].map(
    display,
  );
  const entries: LegendEntry[] = [
    { swatch: swatchLine(COLOUR.allowed, 2.4), label: "temperature" },
    { swatch: swatchLine(COLOUR.vapour, 1.8), label: "dew point of the vapour present" },
  ];
  if (condensing) entries.push({ swatch: swatchDiamond, label: "condenses here" });
  const frame = panelFrame(
    shapes,
    {
      tag: "temperature",
      title: "Temperature by thermal resistance",
      legend: entries,
      caption: thermalFromTemperature ? "cumulative thermal resistance →" : "thickness (no temperature difference) →",
      share: (p) => p.thermal,
      from: 0,
      yRange: [Math.min(...values), Math.max(...values)],
      unitLabel: units === "ip" ? "°F" : "°C",
      tickTarget: 4,
      decimals: (step) => (step < 1 ? 1 : 0),
    },
    points,
    profile,
    at,
  );
  const { xOf, yOf } = frame;
  const yT = (c: number): number => yOf(display(c));

  const temperature: [number, number][] = [
    [xOf(0), yT(profile.exterior.t_c)],
    ...points.map((p): [number, number] => [xOf(p.thermal), yT(p.t_c)]),
    [xOf(1), yT(profile.interior.t_c)],
  ];
  const first = points[0];
  const last = points[points.length - 1];
  const dew: [number, number][] = [
    [xOf(0), yT(first.dewPoint_c)],
    ...points.map((p): [number, number] => [xOf(p.thermal), yT(p.dewPoint_c)]),
    [xOf(1), yT(last.dewPoint_c)],
  ];
  // The margin between the two lines, lightly filled: where it closes, the vapour condenses.
  shapes.push({
    type: "polyline",
    points: [...temperature, ...dew.slice().reverse()],
    closed: true,
    fill: COLOUR.allowed,
    opacity: 0.12,
    tag: "margin-fill",
  });
  shapes.push({ type: "polyline", points: dew, stroke: COLOUR.vapour, strokeWidth: 1.8, tag: "dew-point" });
  shapes.push({ type: "polyline", points: temperature, stroke: COLOUR.allowed, strokeWidth: 2.4, tag: "temperature" });
  for (const p of points)
    if (p.condensing) shapes.push(diamond(xOf(p.thermal), yT(p.t_c), 5, `condensing:temperature:${p.k}`));
  return frame;
}

function vapourPanel(shapes: Shape[], profile: ProfileCase, points: ProfilePoint[], at: PanelAt): PanelFrame {
  const from = Math.min(profile.boundaryIndex, points.length - 1);
  const drawn = points.slice(from);
  const condensing = drawn.some((p) => p.condensing);
  const values = [
    0,
    profile.interior.p_v_pa,
    profile.exterior.p_v_pa,
    ...drawn.flatMap((p) => [p.p_sat_pa, p.p_v_linear_pa, p.p_v_pa]),
  ];
  const entries: LegendEntry[] = [
    { swatch: swatchLine(COLOUR.allowed, 2), label: "saturation pressure" },
    { swatch: swatchLine(COLOUR.vapour, 2.2), label: "vapour pressure" },
  ];
  if (condensing) {
    entries.push({ swatch: swatchLine(COLOUR.vapour, 1.2, [4, 3]), label: "straight line, were nothing to condense" });
    entries.push({ swatch: swatchDiamond, label: "condenses here" });
  }
  const frame = panelFrame(
    shapes,
    {
      tag: "vapour",
      title: "Vapour pressure by vapour resistance",
      legend: entries,
      caption: "cumulative vapour resistance →",
      share: (p) => p.vapour,
      from,
      yRange: [Math.min(...values), Math.max(...values)],
      unitLabel: "Pa",
      tickTarget: 4,
      decimals: () => 0,
    },
    points,
    profile,
    at,
  );
  const { xOf, yOf } = frame;

  // Saturation within each layer: temperature and vapour resistance both run linearly through a
  // uniform layer, so the curve between two interfaces is p_sat of the interpolated temperature.
  const saturation: [number, number][] = [];
  drawn.forEach((p, i) => {
    const next = drawn[i + 1];
    saturation.push([xOf(p.vapour), yOf(p.p_sat_pa)]);
    if (!next || next.vapour - p.vapour < 1e-4) return;
    for (let s = 1; s < 8; s++) {
      const f = s / 8;
      saturation.push([
        xOf(p.vapour + f * (next.vapour - p.vapour)),
        yOf(saturationPressure(p.t_c + f * (next.t_c - p.t_c))),
      ]);
    }
  });
  const actual = drawn.map((p): [number, number] => [xOf(p.vapour), yOf(p.p_v_pa)]);
  const straight = drawn.map((p): [number, number] => [xOf(p.vapour), yOf(p.p_v_linear_pa)]);
  if (condensing) {
    // Between the straight line and the real one: the vapour that would exceed saturation.
    shapes.push({
      type: "polyline",
      points: [...straight, ...actual.slice().reverse()],
      closed: true,
      fill: COLOUR.wet,
      opacity: 0.16,
      tag: "excess-fill",
    });
    shapes.push({
      type: "polyline",
      points: straight,
      stroke: COLOUR.vapour,
      strokeWidth: 1.2,
      dash: [4, 3],
      tag: "vapour-straight",
    });
  }
  shapes.push({ type: "polyline", points: saturation, stroke: COLOUR.allowed, strokeWidth: 2, tag: "saturation" });
  shapes.push({ type: "polyline", points: actual, stroke: COLOUR.vapour, strokeWidth: 2.2, tag: "vapour-pressure" });
  for (const p of drawn)
    if (p.condensing) shapes.push(diamond(xOf(p.vapour), yOf(p.p_sat_pa), 5, `condensing:vapour:${p.k}`));
  return frame;
}

function interfaceName(k: number, n: number): string {
  if (k === 0) return "outer face";
  if (k === n) return "inner face";
  return `layer ${k} / ${k + 1}`;
}

function marginStrip(
  shapes: Shape[],
  points: ProfilePoint[],
  units: UnitSystem,
  x: number,
  y: number,
  w: number,
): { box: Box; rows: MarginRow[]; bottom: number } {
  shapes.push(
    text(x, y + 12, "Margin above the dew point at each interface", {
      size: SIZE.panel,
      weight: "bold",
      fill: COLOUR.text,
      tag: "title:margin",
    }),
  );
  const note = wrap(
    "Interface temperature minus the dew point of the vapour that would reach it were nothing to condense. Below zero the vapour condenses on its way; the diamond marks where.",
    SIZE.text,
    w,
  );
  note.forEach((line, i) => shapes.push(text(x, y + 28 + i * 13, line, { tag: "note:margin" })));
  const top = y + 28 + note.length * 13;
  const labelColumn = 84;
  const valueColumn = 62;
  const box: Box = { x: x + labelColumn, y: top, w: w - labelColumn - valueColumn, h: points.length * ROW_HEIGHT };
  const display = (d: number): number => (units === "ip" ? deltaCToF(d) : d);
  const values = points.map((p) => display(p.margin_c));
  const lo = Math.min(0, ...values);
  const hi = Math.max(0, ...values);
  const span = hi - lo || 1;
  const xOf = (v: number): number => box.x + 4 + ((v - lo) / span) * (box.w - 8);
  const zero = xOf(0);
  const n = points.length - 1;
  const rows: MarginRow[] = points.map((p, i) => {
    const ry = top + i * ROW_HEIGHT;
    const v = display(p.margin_c);
    // A twentieth of a kelvin is rounding (a soil face at 100 % RH sits on its own dew point).
    const wet = p.margin_c < -0.05;
    if (i % 2 === 0)
      shapes.push({ type: "rect", x, y: ry, w, h: ROW_HEIGHT, fill: INK.paper, opacity: 0.6, tag: "row-band" });
    if (p.condensing) shapes.push(diamond(x + 5, ry + ROW_HEIGHT / 2, 4.5, `condensing:margin:${p.k}`));
    shapes.push(
      text(x + 14, ry + 12.5, interfaceName(p.k, n), {
        fill: p.condensing ? COLOUR.wet : COLOUR.text,
        weight: p.condensing ? "bold" : "normal",
        tag: `row:${p.k}`,
      }),
    );
    const x1 = xOf(v);
    shapes.push({
      type: "rect",
      x: Math.min(zero, x1),
      y: ry + 4.5,
      w: Math.max(Math.abs(x1 - zero), 0.8),
      h: ROW_HEIGHT - 9,
      fill: wet ? COLOUR.wet : COLOUR.vapour,
      opacity: wet ? 0.9 : 0.7,
      tag: `bar:${p.k}`,
    });
    const value = formatTemperatureDifference(p.margin_c, units).replace(/^-/, "−");
    shapes.push(
      text(x + w, ry + 12.5, wet || value.startsWith("0") ? value : `+${value}`, {
        anchor: "end",
        fill: wet ? COLOUR.wet : COLOUR.text,
        weight: wet ? "bold" : "normal",
        tag: `value:${p.k}`,
      }),
    );
    return { k: p.k, y: ry, margin_c: p.margin_c, x0: zero, x1 };
  });
  shapes.push({
    type: "line",
    x1: zero,
    y1: top - 2,
    x2: zero,
    y2: top + box.h + 2,
    stroke: COLOUR.soft,
    strokeWidth: 1,
    tag: "margin-zero",
  });
  return { box, rows, bottom: top + box.h };
}

export function profileGeometry(profile: ProfileCase, options: ProfileOptions): ProfileGeometry {
  const width = options.width ?? 720;
  const layout = width >= WIDE_FROM ? "wide" : "narrow";
  const { units } = options;
  const { points, thermalFromTemperature } = profileAxes(profile);
  const shapes: Shape[] = [];
  const pad = 10;
  const inner = width - 2 * pad;

  // Heading: the case and its two boundary conditions.
  shapes.push(
    text(pad, 18, `${profile.name === "winter" ? "WINTER" : "SUMMER"} CASE`, {
      size: SIZE.title,
      weight: "bold",
      fill: INK.ochre,
      tracking: 0.6,
      tag: "case",
    }),
  );
  // No-break spaces keep "at 40 % RH" together when the line wraps on a phone.
  const state = (t_c: number, rh: number): string =>
    `${formatTemperature(t_c, units)} at ${Math.round(rh)} % RH`.replace(/ /g, "\u00a0");
  const conditions = `${sideWord(profile)} ${state(profile.exterior.t_c, profile.exterior.rh)} · inside ${state(profile.interior.t_c, profile.interior.rh)}`;
  const conditionLines = wrap(conditions.replace(/-/g, "−"), SIZE.text, inner);
  conditionLines.forEach((line, i) =>
    shapes.push(text(pad, 34 + i * 13, line, { fill: COLOUR.text, tag: "conditions" })),
  );
  let y = 34 + conditionLines.length * 13 + 6;

  let temperature: PanelFrame;
  let vapour: PanelFrame;
  if (layout === "wide") {
    const half = (inner - GAP) / 2;
    const left: PanelAt = { x: pad, y, w: half };
    const right: PanelAt = { x: pad + half + GAP, y, w: half };
    // A dry run finds where each legend ends, so both plots can start at the same height.
    const plotTop = Math.max(
      temperaturePanel([], profile, points, units, thermalFromTemperature, left).plot.y,
      vapourPanel([], profile, points, right).plot.y,
    );
    temperature = temperaturePanel(shapes, profile, points, units, thermalFromTemperature, { ...left, plotTop });
    vapour = vapourPanel(shapes, profile, points, { ...right, plotTop });
    y = Math.max(temperature.bottom, vapour.bottom) + 14;
  } else {
    temperature = temperaturePanel(shapes, profile, points, units, thermalFromTemperature, { x: pad, y, w: inner });
    vapour = vapourPanel(shapes, profile, points, { x: pad, y: temperature.bottom + 14, w: inner });
    y = vapour.bottom + 14;
  }
  const margin = marginStrip(shapes, points, units, pad, y, inner);
  const height = Math.ceil(margin.bottom + pad);
  shapes.unshift({ type: "rect", x: 0, y: 0, w: width, h: height, fill: INK.sheet, tag: "sheet" });

  const panel = (f: PanelFrame): ProfilePanel => ({
    plot: f.plot,
    interfaceX: f.interfaceX,
    ticks: f.ticks,
    unitLabel: f.unitLabel,
  });
  return {
    width,
    height,
    shapes,
    layout,
    temperature: panel(temperature),
    vapour: panel(vapour),
    margin: { box: margin.box, rows: margin.rows },
  };
}
