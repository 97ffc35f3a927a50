// Drafting hatch for one region of a section, as explicit primitives clipped to the region.
// Conventions: diagonal lines for masonry, stipple with a few aggregate triangles for concrete,
// looping batt lines for fibrous insulation, lamination and grain lines for wood panels, a crossed
// box for lumber, fine dots for gypsum and loose fill, open stones for aggregate, a light cross-hatch for foam plastic,
// dashes for cladding and drainage layers; membranes are a solid thin band (their fill).
import { circleInsideBox, clipPolyline, clipSegment, type Box, type Point } from "./clip";
import type { HatchKind } from "./families";
import type { Shape } from "./shapes";

export interface HatchPaint {
  stroke: string;
  tag: string;
  /** Varies the stipple so neighbouring bands do not repeat the same pattern. */
  variant: number;
}

/** Small deterministic generator: the same layers always draw the same stipple. */
function random(variant: number): () => number {
  let s = (variant * 2654435761 + 1013904223) >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

function segments(lines: [Point, Point][], box: Box, paint: HatchPaint, width: number, dash?: number[]): Shape[] {
  const out: Shape[] = [];
  for (const [a, b] of lines) {
    const seg = clipSegment(a, b, box);
    if (!seg) continue;
    out.push({
      type: "line",
      x1: seg[0][0],
      y1: seg[0][1],
      x2: seg[1][0],
      y2: seg[1][1],
      stroke: paint.stroke,
      strokeWidth: width,
      dash,
      tag: paint.tag,
    });
  }
  return out;
}

function diagonals(box: Box, spacing: number, direction: 1 | -1): [Point, Point][] {
  const lines: [Point, Point][] = [];
  // Lines y = ±x + c swept across the whole box; clipping trims them.
  const span = box.w + box.h;
  for (let c = -span; c <= span; c += spacing) {
    if (direction === 1)
      lines.push([
        [box.x + c, box.y + box.h],
        [box.x + c + box.h, box.y],
      ]);
    else
      lines.push([
        [box.x + c, box.y],
        [box.x + c + box.h, box.y + box.h],
      ]);
  }
  return lines;
}

function polylines(points: Point[], box: Box, paint: HatchPaint, width: number): Shape[] {
  return clipPolyline(points, box).map((run) => ({
    type: "polyline" as const,
    points: run,
    stroke: paint.stroke,
    strokeWidth: width,
    tag: paint.tag,
  }));
}

function dots(box: Box, paint: HatchPaint, count: number, rMin: number, rMax: number, filled: boolean): Shape[] {
  const rnd = random(paint.variant);
  const out: Shape[] = [];
  for (let i = 0; i < count * 3 && out.length < count; i++) {
    const r = rMin + (rMax - rMin) * rnd();
    const cx = box.x + rnd() * box.w;
    const cy = box.y + rnd() * box.h;
    if (!circleInsideBox(cx, cy, r + 0.4, box)) continue;
    out.push(
      filled
        ? { type: "circle", cx, cy, r, fill: paint.stroke, tag: paint.tag }
        : { type: "circle", cx, cy, r, stroke: paint.stroke, strokeWidth: 0.6, tag: paint.tag },
    );
  }
  return out;
}

function batt(box: Box, paint: HatchPaint): Shape[] {
  // The usual batt symbol: a line swinging from face to face, curling into a loop at each face.
  const pitch = Math.min(Math.max(box.w * 0.45, 6), 36); // advance along the layer per full swing
  const r = Math.min(pitch * 0.3, box.w * 0.2);
  const xl = box.x + 1 + r;
  const xr = box.x + box.w - 1 - r;
  const centres: Point[] = [];
  const count = Math.ceil(box.h / (pitch / 2)) + 3;
  for (let k = 0; k < count; k++) centres.push([k % 2 === 0 ? xl : xr, box.y - pitch / 2 + (k * pitch) / 2]);
  const points: Point[] = [];
  centres.forEach((c, k) => {
    const prev = centres[k - 1] ?? [2 * c[0] - centres[k + 1][0], c[1] - pitch / 2];
    const next = centres[k + 1] ?? [2 * c[0] - prev[0], c[1] + pitch / 2];
    const aIn = Math.atan2(prev[1] - c[1], prev[0] - c[0]);
    const aOut = Math.atan2(next[1] - c[1], next[0] - c[0]);
    const turn = (((aOut - aIn) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
    // Loops curl outward: round the face, not back across the layer.
    const sweep = c[0] === xl ? turn - 2 * Math.PI : turn;
    for (let i = 0; i <= 24; i++) {
      const a = aIn + (sweep * i) / 24;
      points.push([c[0] + r * Math.cos(a), c[1] + r * Math.sin(a)]);
    }
  });
  return polylines(points, box, paint, 0.7);
}

function grain(box: Box, paint: HatchPaint): Shape[] {
  // Laminations parallel to the faces, with a gentle wave for the grain.
  const count = Math.max(1, Math.min(5, Math.floor(box.w / 5)));
  const out: Shape[] = [];
  for (let k = 1; k <= count; k++) {
    const x0 = box.x + (box.w * k) / (count + 1);
    const amp = Math.min(1.2, box.w / (count + 1) / 3);
    const points: Point[] = [];
    for (let y = box.y; y <= box.y + box.h + 0.01; y += 3) {
      points.push([x0 + amp * Math.sin((y - box.y) / 9 + k * 1.7), y]);
    }
    out.push(...polylines(points, box, paint, 0.5));
  }
  return out;
}

function stipple(box: Box, paint: HatchPaint): Shape[] {
  const area = box.w * box.h;
  const out = dots(box, paint, Math.round(area / 38), 0.35, 0.7, true);
  // A few small open triangles for coarse aggregate.
  const rnd = random(paint.variant + 97);
  const triangles = Math.round(area / 700);
  for (let i = 0; i < triangles; i++) {
    const size = 2.2 + rnd() * 1.6;
    const cx = box.x + size + rnd() * Math.max(0, box.w - 2 * size);
    const cy = box.y + size + rnd() * Math.max(0, box.h - 2 * size);
    const turn = rnd() * Math.PI;
    const points: Point[] = [0, 1, 2, 3].map((k) => {
      const a = turn + (k * 2 * Math.PI) / 3;
      return [cx + size * Math.cos(a), cy + size * Math.sin(a)];
    });
    out.push(...polylines(points, box, paint, 0.5));
  }
  return out;
}

function dashes(box: Box, paint: HatchPaint): Shape[] {
  const lines: [Point, Point][] = [];
  const columns = Math.max(1, Math.min(3, Math.floor(box.w / 8)));
  for (let k = 1; k <= columns; k++) {
    const x = box.x + (box.w * k) / (columns + 1);
    lines.push([
      [x, box.y],
      [x, box.y + box.h],
    ]);
  }
  return segments(lines, box, paint, 0.6, [5, 3]);
}

/** Primitives for one region; all of them lie inside `box`. */
export function hatchShapes(kind: HatchKind, box: Box, paint: HatchPaint): Shape[] {
  if (box.w <= 0.5 || box.h <= 0.5) return [];
  switch (kind) {
    case "diagonal":
      return segments(diagonals(box, 5, 1), box, paint, 0.6);
    case "foam":
      return [
        ...segments(diagonals(box, 9, 1), box, paint, 0.45),
        ...segments(diagonals(box, 9, -1), box, paint, 0.45),
      ];
    case "cross":
      return segments(
        [
          [
            [box.x, box.y],
            [box.x + box.w, box.y + box.h],
          ],
          [
            [box.x + box.w, box.y],
            [box.x, box.y + box.h],
          ],
        ],
        box,
        paint,
        0.7,
      );
    case "batt":
      return batt(box, paint);
    case "grain":
      return grain(box, paint);
    case "stipple":
      return stipple(box, paint);
    case "dots": {
      const area = box.w * box.h;
      return dots(box, paint, Math.round(area / 60), 0.5, 1.1, true);
    }
    case "gravel": {
      // Open rounded stones of mixed size: crushed stone and other drainage aggregate.
      const area = box.w * box.h;
      return dots(box, paint, Math.round(area / 45), 1.2, 2.8, false);
    }
    case "dash":
      return dashes(box, paint);
    case "solid":
    case "none":
      return [];
  }
}
