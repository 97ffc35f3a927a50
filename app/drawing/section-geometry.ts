// A section through an assembly as drawing primitives: layers from the exterior (left) to the
// interior (right) at true relative thickness, thin membranes widened to stay visible (and marked
// as not to scale), drafting hatch per material family, numbered callouts, a legend, side labels
// and a scale bar. Pure and framework-free: the SVG component and the PDF sheet both draw this.
import type { AssemblyKind } from "~/envelope/types";
import { formatThickness, inToMm, type UnitSystem } from "~/envelope/units";
import type { Box } from "./clip";
import { familyStyle } from "./families";
import { hatchShapes } from "./hatch";
import { estimateTextWidth, INK, type Drawing, type Shape } from "./shapes";

export interface SectionLayer {
  role: string;
  family: string;
  materialName: string;
  thickness_mm: number;
  framing?: { fraction: number; family: string; materialName?: string };
}

export interface SectionInput {
  kind: AssemblyKind;
  /** Exterior (soil side, top side for roofs) → interior. */
  layers: readonly SectionLayer[];
}

export interface SectionOptions {
  units: UnitSystem;
  /** Overall drawing width in drawing units (default 720). */
  width?: number;
  /** Narrowest band drawn; thinner layers are widened to this and marked not to scale. */
  minBandWidth?: number;
  /** Draw the numbered legend under the section (default true; the PDF sheet's layer table replaces it). */
  legend?: boolean;
}

export interface SectionBand {
  index: number;
  /** Callout and legend number (1-based, exterior first). */
  number: number;
  box: Box;
  /** Width at true scale, before widening. */
  trueWidth: number;
  drawnWiderThanScale: boolean;
  family: string;
  materialName: string;
  thickness_mm: number;
  /** The framing member drawn in a framed layer. */
  framingBox?: Box;
}

export interface ScaleBar {
  pxPerMm: number;
  length: number;
  unit: "mm" | "in";
  lengthPx: number;
  x: number;
  y: number;
}

export interface SectionGeometry extends Drawing {
  bands: SectionBand[];
  scale: ScaleBar;
  sideLabels: { exterior: string; interior: string };
  notToScale: boolean;
}

const MARGIN = 14;
const CALLOUT_R = 9;
const CALLOUT_Y = 22;
const SECTION_TOP = 70;
const SECTION_HEIGHT = 190;
const LEGEND_ROW = 17;
const FONT_SIZE = 10.5;
/** Nominal depth of a 2x framing member on its face (1.5 in): common practice. */
const FRAMING_FACE_MM = 38;

/** Side labels fitting the assembly kind. */
export function sideLabelsFor(kind: AssemblyKind): { exterior: string; interior: string } {
  switch (kind) {
    case "roof":
      return { exterior: "ROOF TOP", interior: "INTERIOR" };
    case "basement-wall":
    case "crawlspace-wall":
      return { exterior: "SOIL", interior: "INTERIOR" };
    case "slab":
    case "crawlspace-floor":
      return { exterior: "GROUND", interior: "INTERIOR" };
    case "floor":
      return { exterior: "UNDERSIDE", interior: "INTERIOR" };
    case "above-grade-wall":
    case "rim-joist":
      return { exterior: "EXTERIOR", interior: "INTERIOR" };
  }
}

/** Scale (drawing units per mm) so that the widened bands exactly fill `available`. */
export function fitBandWidths(
  thicknesses: readonly number[],
  available: number,
  minWidth: number,
): { widths: number[]; pxPerMm: number; widened: boolean[] } {
  const n = thicknesses.length;
  let widened = thicknesses.map(() => false);
  let pxPerMm =
    available /
    Math.max(
      thicknesses.reduce((s, t) => s + t, 0),
      1e-9,
    );
  // Widening a layer takes width from the others, which can push another under the minimum:
  // repeat until the set of widened layers stops changing.
  for (let pass = 0; pass <= n; pass++) {
    const next = thicknesses.map((t, i) => widened[i] || t * pxPerMm < minWidth);
    const fixedWidth = next.filter(Boolean).length * minWidth;
    const freeThickness = thicknesses.reduce((s, t, i) => (next[i] ? s : s + t), 0);
    const scale = freeThickness > 0 ? Math.max(available - fixedWidth, 0) / freeThickness : pxPerMm;
    const stable = next.every((w, i) => w === widened[i]);
    widened = next;
    pxPerMm = scale;
    if (stable) break;
  }
  const widths = thicknesses.map((t, i) => (widened[i] ? minWidth : t * pxPerMm));
  return { widths, pxPerMm, widened };
}

/** Centres for callouts at least `gap` apart, as close as possible to the desired ones. */
export function spreadCallouts(desired: readonly number[], gap: number, lo: number, hi: number): number[] {
  interface Group {
    members: number[];
    first: number;
  }
  const place = (g: Group): void => {
    const mean = g.members.reduce((s, i) => s + desired[i], 0) / g.members.length;
    const span = (g.members.length - 1) * gap;
    g.first = Math.min(Math.max(mean - span / 2, lo), Math.max(hi - span, lo));
  };
  const groups: Group[] = [];
  desired.forEach((_, i) => {
    const g: Group = { members: [i], first: 0 };
    place(g);
    groups.push(g);
    while (groups.length > 1) {
      const b = groups[groups.length - 1];
      const a = groups[groups.length - 2];
      if (a.first + a.members.length * gap <= b.first + 1e-9) break;
      groups.splice(groups.length - 2, 2, { members: [...a.members, ...b.members], first: 0 });
      place(groups[groups.length - 1]);
    }
  });
  return groups.flatMap((g) => g.members.map((_, k) => g.first + k * gap));
}

function niceBarLength(pxPerMm: number, units: UnitSystem, maxPx: number): { length: number; mm: number } {
  const candidates =
    units === "si" ? [5, 10, 20, 25, 50, 100, 200, 250, 500, 1000] : [0.25, 0.5, 1, 2, 3, 4, 6, 12, 24];
  let best = candidates[0];
  for (const c of candidates) {
    const mm = units === "si" ? c : inToMm(c);
    if (mm * pxPerMm <= maxPx) best = c;
  }
  return { length: best, mm: units === "si" ? best : inToMm(best) };
}

function truncate(text: string, size: number, maxWidth: number): string {
  if (estimateTextWidth(text, size) <= maxWidth) return text;
  let t = text;
  while (t.length > 4 && estimateTextWidth(`${t}…`, size) > maxWidth) t = t.slice(0, -1);
  return `${t.trimEnd()}…`;
}

function legendName(layer: SectionLayer): string {
  if (!layer.framing) return layer.materialName;
  const framing = layer.framing.materialName ?? familyStyle(layer.framing.family).label.toLowerCase();
  return `${layer.materialName}, ${framing.toLowerCase()} framing ${Math.round(layer.framing.fraction * 100)} %`;
}

function text(
  x: number,
  y: number,
  value: string,
  extra: Partial<Omit<Shape & { type: "text" }, "type" | "x" | "y" | "text">> = {},
): Shape {
  return {
    type: "text",
    x,
    y,
    text: value,
    size: FONT_SIZE,
    weight: "normal",
    anchor: "start",
    font: "sans",
    fill: INK.graphite,
    ...extra,
  };
}

export function sectionGeometry(input: SectionInput, options: SectionOptions): SectionGeometry {
  const width = options.width ?? 720;
  const minBand = options.minBandWidth ?? 6;
  const x0 = MARGIN + 10;
  const x1 = width - MARGIN - 10;
  const sectionWidth = x1 - x0;
  const top = SECTION_TOP;
  const bottom = SECTION_TOP + SECTION_HEIGHT;
  const shapes: Shape[] = [];

  const fit = fitBandWidths(
    input.layers.map((l) => l.thickness_mm),
    sectionWidth,
    minBand,
  );
  const bands: SectionBand[] = [];
  let x = x0;
  input.layers.forEach((layer, index) => {
    const w = fit.widths[index];
    const band: SectionBand = {
      index,
      number: index + 1,
      box: { x, y: top, w, h: SECTION_HEIGHT },
      trueWidth: layer.thickness_mm * fit.pxPerMm,
      drawnWiderThanScale: fit.widened[index],
      family: layer.family,
      materialName: layer.materialName,
      thickness_mm: layer.thickness_mm,
    };
    if (layer.framing) {
      const h = Math.min(Math.max(FRAMING_FACE_MM * fit.pxPerMm, 14), SECTION_HEIGHT * 0.3);
      // Low in the band, so the cavity fill reads as one field above it.
      band.framingBox = { x, y: bottom - h - SECTION_HEIGHT * 0.08, w, h };
    }
    bands.push(band);
    x += w;
  });

  // Bands: fill, hatch (clipped to the band, around any framing member), then outline.
  for (const band of bands) {
    const layer = input.layers[band.index];
    const style = familyStyle(layer.family);
    const tag = `band:${band.index}`;
    shapes.push({ type: "rect", ...band.box, fill: style.fill, tag });
    const regions: Box[] = band.framingBox
      ? [
          { x: band.box.x, y: top, w: band.box.w, h: band.framingBox.y - top },
          {
            x: band.box.x,
            y: band.framingBox.y + band.framingBox.h,
            w: band.box.w,
            h: bottom - band.framingBox.y - band.framingBox.h,
          },
        ]
      : [band.box];
    regions.forEach((region, k) => {
      shapes.push(
        ...hatchShapes(style.hatch, region, {
          stroke: style.stroke,
          tag: `hatch:${band.index}`,
          variant: band.index * 7 + k + 1,
        }),
      );
    });
    if (band.framingBox && layer.framing) {
      const framingStyle = familyStyle(layer.framing.family);
      shapes.push({
        type: "rect",
        ...band.framingBox,
        fill: framingStyle.fill,
        stroke: framingStyle.stroke,
        strokeWidth: 0.8,
        tag: `framing:${band.index}`,
      });
      shapes.push(
        ...hatchShapes(framingStyle.hatch, band.framingBox, {
          stroke: framingStyle.stroke,
          tag: `hatch:${band.index}`,
          variant: band.index * 7 + 5,
        }),
      );
    }
    shapes.push({ type: "rect", ...band.box, stroke: style.stroke, strokeWidth: 0.8, tag: `outline:${band.index}` });
  }

  // Break lines where the section is cut, top and bottom.
  const mid = (x0 + x1) / 2;
  for (const y of [top, bottom]) {
    shapes.push({
      type: "polyline",
      points: [
        [x0 - 8, y],
        [mid - 7, y],
        [mid - 3, y - 6],
        [mid + 3, y + 6],
        [mid + 7, y],
        [x1 + 8, y],
      ],
      stroke: INK.graphite,
      strokeWidth: 0.9,
      tag: "break",
    });
  }

  // Numbered callouts with leaders.
  const centres = bands.map((b) => b.box.x + b.box.w / 2);
  const calloutX = spreadCallouts(centres, CALLOUT_R * 2 + 5, x0 + CALLOUT_R, x1 - CALLOUT_R);
  bands.forEach((band, i) => {
    const cx = calloutX[i];
    const target = centres[i];
    const tag = `callout:${band.number}`;
    shapes.push({
      type: "polyline",
      points: [
        [cx, CALLOUT_Y + CALLOUT_R],
        [cx, CALLOUT_Y + CALLOUT_R + 8],
        [target, top - 10],
        [target, top + 14],
      ],
      stroke: INK.graphite,
      strokeWidth: 0.6,
      tag,
    });
    shapes.push({ type: "circle", cx: target, cy: top + 14, r: 1.6, fill: INK.graphite, tag });
    shapes.push({
      type: "circle",
      cx,
      cy: CALLOUT_Y,
      r: CALLOUT_R,
      fill: INK.sheet,
      stroke: INK.graphite,
      strokeWidth: 0.9,
      tag,
    });
    shapes.push(text(cx, CALLOUT_Y + 3.6, String(band.number), { anchor: "middle", weight: "bold", size: 10, tag }));
    if (band.drawnWiderThanScale)
      shapes.push(
        text(cx, CALLOUT_Y - CALLOUT_R - 2, "*", { size: 9, fill: INK.ochre, weight: "bold", anchor: "middle", tag }),
      );
  });

  // Side labels under the section.
  const labels = sideLabelsFor(input.kind);
  const labelY = bottom + 20;
  shapes.push(
    text(x0, labelY, labels.exterior, {
      weight: "bold",
      size: 9.5,
      tracking: 1.2,
      fill: INK.graphiteSoft,
      tag: "side:exterior",
    }),
  );
  shapes.push(
    text(x1, labelY, labels.interior, {
      weight: "bold",
      size: 9.5,
      tracking: 1.2,
      fill: INK.graphiteSoft,
      anchor: "end",
      tag: "side:interior",
    }),
  );

  // Scale bar: a round length in the chosen units, in four alternating segments.
  const bar = niceBarLength(fit.pxPerMm, options.units, Math.min(190, sectionWidth * 0.35));
  const barPx = bar.mm * fit.pxPerMm;
  const barX = mid - barPx / 2;
  const barY = labelY - 8;
  const unit = options.units === "si" ? "mm" : "in";
  for (let k = 0; k < 4; k++) {
    shapes.push({
      type: "rect",
      x: barX + (barPx * k) / 4,
      y: barY,
      w: barPx / 4,
      h: 5,
      fill: k % 2 === 0 ? INK.graphite : INK.sheet,
      stroke: INK.graphite,
      strokeWidth: 0.6,
      tag: "scalebar",
    });
  }
  shapes.push(text(barX, barY + 16, "0", { size: 8.5, anchor: "middle", fill: INK.graphiteSoft, tag: "scalebar" }));
  shapes.push(
    text(barX + barPx, barY + 16, `${bar.length} ${unit}`, {
      size: 8.5,
      anchor: "middle",
      fill: INK.graphiteSoft,
      tag: "scalebar",
    }),
  );
  shapes.push(
    text(barX - 10, barY + 5.5, "SCALE", {
      size: 7.5,
      anchor: "end",
      tracking: 1,
      fill: INK.graphiteSoft,
      tag: "scalebar",
    }),
  );

  // Legend: number, material, thickness; two columns when the stack is long.
  const showLegend = options.legend ?? true;
  const legendTop = barY + 40;
  const columnGap = 24;
  const thicknessWidth = 52;
  const nameRoom = (columns: number): number =>
    (x1 - x0 - columnGap * (columns - 1)) / columns - 34 - thicknessWidth - 6;
  // Two columns for long stacks, unless a name would have to be cut short.
  const namesFitTwo = input.layers.every((l) => estimateTextWidth(legendName(l), FONT_SIZE) <= nameRoom(2));
  const columns = bands.length > 5 && namesFitTwo ? 2 : 1;
  const perColumn = Math.ceil(bands.length / columns);
  const columnWidth = (x1 - x0 - columnGap * (columns - 1)) / columns;
  if (showLegend)
    shapes.push({
      type: "line",
      x1: x0,
      y1: legendTop - 14,
      x2: x1,
      y2: legendTop - 14,
      stroke: INK.rule,
      strokeWidth: 0.8,
      tag: "legend",
    });
  if (showLegend)
    bands.forEach((band, i) => {
      const col = Math.floor(i / perColumn);
      const row = i % perColumn;
      const cx = x0 + col * (columnWidth + columnGap);
      const y = legendTop + row * LEGEND_ROW;
      const tag = `legend:${band.number}`;
      const thickness = `${formatThickness(band.thickness_mm, options.units)}${band.drawnWiderThanScale ? " *" : ""}`;
      shapes.push({
        type: "circle",
        cx: cx + 7,
        cy: y - 3.6,
        r: 7,
        stroke: INK.graphite,
        strokeWidth: 0.7,
        fill: INK.sheet,
        tag,
      });
      shapes.push(text(cx + 7, y, String(band.number), { size: 8.5, weight: "bold", anchor: "middle", tag }));
      const swatch = familyStyle(band.family);
      shapes.push({
        type: "rect",
        x: cx + 19,
        y: y - 8,
        w: 9,
        h: 9,
        fill: swatch.fill,
        stroke: swatch.stroke,
        strokeWidth: 0.6,
        tag,
      });
      shapes.push(
        text(
          cx + 34,
          y,
          truncate(legendName(input.layers[band.index]), FONT_SIZE, columnWidth - 34 - thicknessWidth - 6),
          { tag },
        ),
      );
      shapes.push(text(cx + columnWidth, y, thickness, { anchor: "end", fill: INK.graphiteSoft, tag }));
    });
  let bottomY = showLegend ? legendTop + (perColumn - 1) * LEGEND_ROW + 6 : barY + 18;
  const notToScale = bands.some((b) => b.drawnWiderThanScale);
  if (notToScale) {
    bottomY += 16;
    shapes.push(
      text(x0, bottomY, "* Thin layer drawn wider than true scale so it stays visible.", {
        size: 9,
        fill: INK.graphiteSoft,
        tag: "note:not-to-scale",
      }),
    );
  }

  return {
    width,
    height: Math.ceil(bottomY + MARGIN),
    shapes,
    bands,
    scale: { pxPerMm: fit.pxPerMm, length: bar.length, unit, lengthPx: barPx, x: barX, y: barY },
    sideLabels: labels,
    notToScale,
  };
}
