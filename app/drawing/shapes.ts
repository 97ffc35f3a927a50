// The drawing primitives shared by the SVG components and the PDF sheet. Geometry modules emit
// only these, in abstract drawing units (1 unit = 1 CSS px on screen, scaled to fit on paper), so
// the page and the printed sheet draw exactly the same lines.

export interface Paint {
  stroke?: string;
  strokeWidth?: number;
  fill?: string;
  /** Dash pattern in drawing units, e.g. [4, 3]. */
  dash?: number[];
  opacity?: number;
  /** What the shape belongs to, e.g. "band:2", "hatch:2", "callout:3"; for tests and hit-testing. */
  tag?: string;
}

export interface RectShape extends Paint {
  type: "rect";
  x: number;
  y: number;
  w: number;
  h: number;
}
export interface LineShape extends Paint {
  type: "line";
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}
export interface PolylineShape extends Paint {
  type: "polyline";
  points: [number, number][];
  closed?: boolean;
}
export interface CircleShape extends Paint {
  type: "circle";
  cx: number;
  cy: number;
  r: number;
}

export type TextAnchor = "start" | "middle" | "end";
export type FontFace = "sans" | "serif";
export interface TextShape {
  type: "text";
  x: number;
  /** Baseline. */
  y: number;
  text: string;
  size: number;
  weight: "normal" | "bold";
  anchor: TextAnchor;
  font: FontFace;
  fill: string;
  /** Letter spacing in drawing units (small caps labels read better spaced). */
  tracking?: number;
  tag?: string;
}

export type Shape = RectShape | LineShape | PolylineShape | CircleShape | TextShape;

export interface Drawing {
  width: number;
  height: number;
  shapes: Shape[];
}

/** Palette shared with app/app.css (kept literal: the PDF has no CSS). */
export const INK = {
  paper: "#f7f2e8",
  sheet: "#fffdf8",
  graphite: "#2c2c2a",
  graphiteSoft: "#5d5b55",
  rule: "#d6ccb6",
  ochre: "#b0761a",
  vapour: "#1d7474",
  heat: "#b23a2a",
  stop: "#9f1f1f",
  caution: "#9a6a00",
  note: "#3d5a80",
} as const;

/** Rough advance width of a string in Inter, for layout only (renderers measure exactly). */
export function estimateTextWidth(text: string, size: number, weight: "normal" | "bold" = "normal"): number {
  const perChar = weight === "bold" ? 0.58 : 0.54;
  return text.length * size * perChar;
}
