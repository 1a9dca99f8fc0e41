// Test helpers: sections made of stacked rectangles, with properties worked out independently of
// the library by the parallel-axis theorem (composite areas; elementary statics).
import type { DepthBand } from "../../src/stress/index.js";

/** A rectangle: width b, height h, bottom at y0 (from an arbitrary datum), modular ratio n. */
export interface Rect {
  readonly b: number;
  readonly h: number;
  readonly y0: number;
  readonly z0?: number;
  readonly n?: number;
}

/** Centroid and second moment of a stack of rectangles about the horizontal centroidal axis (transformed by n). */
export function stackProperties(rects: readonly Rect[]): { area: number; centroid: number; inertia: number; top: number; bottom: number } {
  let area = 0;
  let moment = 0;
  for (const r of rects) {
    const a = (r.n ?? 1) * r.b * r.h;
    area += a;
    moment += a * (r.y0 + r.h / 2);
  }
  const centroid = moment / area;
  let inertia = 0;
  for (const r of rects) {
    const n = r.n ?? 1;
    const d = r.y0 + r.h / 2 - centroid;
    inertia += n * ((r.b * r.h ** 3) / 12 + r.b * r.h * d * d);
  }
  const top = Math.max(...rects.map((r) => r.y0 + r.h)) - centroid;
  const bottom = Math.min(...rects.map((r) => r.y0)) - centroid;
  return { area, centroid, inertia, top, bottom };
}

/** The same stack as depth bands about its centroid. */
export function stackBands(rects: readonly Rect[]): DepthBand[] {
  const { centroid } = stackProperties(rects);
  return rects.map((r) => ({
    kind: "trapezoid",
    yBottom: r.y0 - centroid,
    yTop: r.y0 + r.h - centroid,
    widthBottom: r.b,
    widthTop: r.b,
    ...(r.n === undefined ? {} : { modularRatio: r.n }),
  }));
}

/** Simpson's rule on [a, b] with m (even) intervals: exact for cubics. */
export function simpson(f: (x: number) => number, a: number, b: number, m = 2): number {
  const h = (b - a) / m;
  let s = f(a) + f(b);
  for (let i = 1; i < m; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

/** Relative closeness. */
export function close(actual: number, expected: number, rel = 1e-9, abs = 1e-12): boolean {
  return Math.abs(actual - expected) <= rel * Math.abs(expected) + abs;
}
