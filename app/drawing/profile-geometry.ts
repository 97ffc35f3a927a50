// Temperature and dew-point chart through the layers for one site-check case, as drawing
// primitives (the same shapes the page and the PDF sheet draw). Positions are true thickness;
// the outdoor and indoor air sit in narrow bands at each end so the air-film drops show.
import { profileChartSeries } from "~/envelope/profile-series";
import { dewPointFromVapourPressure } from "~/envelope/psychrometrics";
import type { ProfileCase } from "~/envelope/types";
import { cToF, type UnitSystem } from "~/envelope/units";
import type { Box } from "./clip";
import { INK, type Drawing, type Shape } from "./shapes";

export interface ProfileOptions {
  units: UnitSystem;
  width?: number;
  height?: number;
}

export interface AxisTick {
  value: number;
  y: number;
  label: string;
}

export interface ProfileGeometry extends Drawing {
  plot: Box;
  ticks: AxisTick[];
  /** x of each interface (same order as profile.interfaces). */
  interfaceX: number[];
  unitLabel: "°C" | "°F";
}

const AIR_BAND = 34;
const PAD = { left: 46, right: 14, top: 30, bottom: 26 };

/** Round tick step giving about `target` intervals over the span. */
export function niceStep(span: number, target = 5): number {
  const raw = span / target;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * magnitude >= raw) return m * magnitude;
  return 10 * magnitude;
}

function label(x: number, y: number, text: string, extra: Partial<Extract<Shape, { type: "text" }>> = {}): Shape {
  return { type: "text", x, y, text, size: 9, weight: "normal", anchor: "start", font: "sans", fill: INK.graphiteSoft, ...extra };
}

export function profileGeometry(profile: ProfileCase, options: ProfileOptions): ProfileGeometry {
  const width = options.width ?? 720;
  const height = options.height ?? 280;
  const display = (c: number): number => (options.units === "ip" ? cToF(c) : c);
  const unitLabel = options.units === "ip" ? "°F" : "°C";
  const plot: Box = { x: PAD.left, y: PAD.top, w: width - PAD.left - PAD.right, h: height - PAD.top - PAD.bottom };
  const shapes: Shape[] = [];

  const series = profileChartSeries(profile);
  const outsideDew = dewPointFromVapourPressure(Math.max(profile.exterior.p_v_pa, 1e-3));
  const insideDew = dewPointFromVapourPressure(Math.max(profile.interior.p_v_pa, 1e-3));
  const total = series.length ? series[series.length - 1].position_mm - series[0].position_mm : 0;
  const start = series.length ? series[0].position_mm : 0;
  const assemblyLeft = plot.x + AIR_BAND;
  const assemblyWidth = plot.w - 2 * AIR_BAND;
  const xOf = (mm: number): number => assemblyLeft + (total > 0 ? ((mm - start) / total) * assemblyWidth : 0);
  const interfaceX = series.map((p) => xOf(p.position_mm));

  const temps = [profile.exterior.t_c, profile.interior.t_c, outsideDew, insideDew, ...series.flatMap((p) => [p.t_c, p.dew_point_c])].map(display);
  const lo = Math.min(...temps);
  const hi = Math.max(...temps);
  const step = niceStep(Math.max(hi - lo, 1));
  const yMin = Math.floor(lo / step) * step;
  const yMax = Math.ceil(hi / step) * step === yMin ? yMin + step : Math.ceil(hi / step) * step;
  const yOf = (c: number): number => plot.y + plot.h - ((display(c) - yMin) / (yMax - yMin)) * plot.h;
  const yOfDisplay = (v: number): number => plot.y + plot.h - ((v - yMin) / (yMax - yMin)) * plot.h;

  // Frame, air bands and grid.
  shapes.push({ type: "rect", ...plot, fill: INK.sheet, tag: "plot" });
  shapes.push({ type: "rect", x: plot.x, y: plot.y, w: AIR_BAND, h: plot.h, fill: "#efe8da", tag: "air:exterior" });
  shapes.push({ type: "rect", x: plot.x + plot.w - AIR_BAND, y: plot.y, w: AIR_BAND, h: plot.h, fill: "#efe8da", tag: "air:interior" });
  shapes.push(label(plot.x + AIR_BAND / 2, plot.y + plot.h + 13, "OUT", { anchor: "middle", size: 8, weight: "bold", tracking: 0.8 }));
  shapes.push(label(plot.x + plot.w - AIR_BAND / 2, plot.y + plot.h + 13, "IN", { anchor: "middle", size: 8, weight: "bold", tracking: 0.8 }));
  const ticks: AxisTick[] = [];
  const decimals = step < 1 ? 1 : 0;
  for (let v = yMin; v <= yMax + step / 1000; v += step) {
    const y = yOfDisplay(v);
    const text = `${v.toFixed(decimals)}`.replace(/^-0(\.0)?$/, "0");
    ticks.push({ value: v, y, label: text });
    shapes.push({ type: "line", x1: plot.x, y1: y, x2: plot.x + plot.w, y2: y, stroke: INK.rule, strokeWidth: 0.5, dash: [2, 3], tag: "grid" });
    shapes.push(label(plot.x - 5, y + 3, text, { anchor: "end", tag: "tick" }));
  }
  shapes.push(label(plot.x - 5, plot.y - 8, unitLabel, { anchor: "end", weight: "bold", tag: "unit" }));

  // Layer boundaries and layer numbers (where there is room for them).
  interfaceX.forEach((x, i) => {
    shapes.push({ type: "line", x1: x, y1: plot.y, x2: x, y2: plot.y + plot.h, stroke: "#c9bfa8", strokeWidth: 0.6, tag: `boundary:${i}` });
    if (i > 0 && x - interfaceX[i - 1] >= 12) {
      shapes.push(label((x + interfaceX[i - 1]) / 2, plot.y + plot.h + 13, String(i), { anchor: "middle", size: 8, tag: `layer:${i}` }));
    }
  });
  shapes.push({ type: "rect", ...plot, stroke: INK.graphiteSoft, strokeWidth: 0.7, tag: "frame" });

  // The two lines: temperature (heat red) and dew point of the local vapour pressure (vapour teal).
  const left = plot.x;
  const right = plot.x + plot.w;
  shapes.push({
    type: "polyline",
    points: [[left, yOf(outsideDew)], ...series.map((p, i): [number, number] => [interfaceX[i], yOf(p.dew_point_c)]), [right, yOf(insideDew)]],
    stroke: INK.vapour, strokeWidth: 1.6, dash: [5, 2.5], tag: "dew-point",
  });
  shapes.push({
    type: "polyline",
    points: [[left, yOf(profile.exterior.t_c)], ...series.map((p, i): [number, number] => [interfaceX[i], yOf(p.t_c)]), [right, yOf(profile.interior.t_c)]],
    stroke: INK.heat, strokeWidth: 1.8, tag: "temperature",
  });

  // Condensation planes: where vapour pressure reaches saturation.
  for (const plane of profile.condensingPlanes) {
    const x = interfaceX[plane.interfaceIndex];
    if (x === undefined) continue;
    shapes.push({ type: "line", x1: x, y1: plot.y, x2: x, y2: plot.y + plot.h, stroke: INK.vapour, strokeWidth: 1, dash: [3, 2], tag: "condensation" });
    shapes.push({ type: "circle", cx: x, cy: yOf(plane.t_c), r: 3.6, fill: INK.vapour, stroke: INK.sheet, strokeWidth: 1, tag: "condensation" });
  }
  const first = profile.firstCondensingSurface;
  if (first && interfaceX[first.interfaceIndex] !== undefined) {
    const x = interfaceX[first.interfaceIndex];
    const anchor = x > plot.x + plot.w * 0.7 ? "end" : "start";
    shapes.push(label(x + (anchor === "end" ? -5 : 5), plot.y + 11, "first condensing surface", { anchor, fill: INK.vapour, weight: "bold", tag: "condensation" }));
  }

  // Legend along the top.
  const ly = 12;
  let lx = plot.x;
  const entry = (draw: Shape[], text: string, gap: number): void => {
    shapes.push(...draw, label(lx + 22, ly + 3, text, { fill: INK.graphite, tag: "legend" }));
    lx += gap;
  };
  entry([{ type: "line", x1: lx, y1: ly, x2: lx + 16, y2: ly, stroke: INK.heat, strokeWidth: 1.8, tag: "legend" }], "Temperature", 100);
  entry([{ type: "line", x1: lx, y1: ly, x2: lx + 16, y2: ly, stroke: INK.vapour, strokeWidth: 1.6, dash: [5, 2.5], tag: "legend" }], "Dew point", 88);
  entry([{ type: "circle", cx: lx + 8, cy: ly, r: 3.6, fill: INK.vapour, tag: "legend" }], "Condensation plane", 130);
  shapes.push(label(plot.x + plot.w, ly + 3, profile.name === "winter" ? "WINTER CASE" : "SUMMER CASE", { anchor: "end", weight: "bold", size: 8.5, tracking: 1, tag: "case" }));

  return { width, height, shapes, plot, ticks, interfaceX, unitLabel };
}
