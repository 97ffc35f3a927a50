// Clipping of hatch primitives to the rectangle of their band, so hatch never spills into a
// neighbouring layer and both renderers need no clip paths.

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}
export type Point = [number, number];

const EPS = 1e-9;

/** Liang–Barsky: the part of segment a→b inside the box, or null. */
export function clipSegment(a: Point, b: Point, box: Box): [Point, Point] | null {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  let t0 = 0;
  let t1 = 1;
  const checks: [number, number][] = [
    [-dx, a[0] - box.x],
    [dx, box.x + box.w - a[0]],
    [-dy, a[1] - box.y],
    [dy, box.y + box.h - a[1]],
  ];
  for (const [p, q] of checks) {
    if (Math.abs(p) < EPS) {
      if (q < 0) return null;
      continue;
    }
    const r = q / p;
    if (p < 0) {
      if (r > t1) return null;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return null;
      if (r < t1) t1 = r;
    }
  }
  if (t1 - t0 < EPS) return null;
  return [
    [a[0] + t0 * dx, a[1] + t0 * dy],
    [a[0] + t1 * dx, a[1] + t1 * dy],
  ];
}

/** Splits a polyline into the runs that lie inside the box. */
export function clipPolyline(points: readonly Point[], box: Box): Point[][] {
  const runs: Point[][] = [];
  let current: Point[] = [];
  for (let i = 1; i < points.length; i++) {
    const seg = clipSegment(points[i - 1], points[i], box);
    if (!seg) {
      if (current.length > 1) runs.push(current);
      current = [];
      continue;
    }
    const [p, q] = seg;
    const last = current[current.length - 1];
    if (!last || Math.abs(last[0] - p[0]) > 1e-6 || Math.abs(last[1] - p[1]) > 1e-6) {
      if (current.length > 1) runs.push(current);
      current = [p];
    }
    current.push(q);
  }
  if (current.length > 1) runs.push(current);
  return runs;
}

export function insideBox(x: number, y: number, box: Box, tolerance = 1e-6): boolean {
  return (
    x >= box.x - tolerance && x <= box.x + box.w + tolerance && y >= box.y - tolerance && y <= box.y + box.h + tolerance
  );
}

export function circleInsideBox(cx: number, cy: number, r: number, box: Box): boolean {
  return cx - r >= box.x && cx + r <= box.x + box.w && cy - r >= box.y && cy + r <= box.y + box.h;
}
